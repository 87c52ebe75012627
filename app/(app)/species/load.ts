import { notFound } from 'next/navigation';
import { loadOwnedForPage } from '@/lib/access';
import type { CurrentUser } from '@/lib/auth/session-user';
import { toDto } from '@/lib/species/queries';

/** A sheet the user may read (else the page 404s, hiding other organisations' sheets). */
export async function loadSheet(user: CurrentUser, rawId: string) {
  const found = await loadOwnedForPage('species', rawId, user);
  if (!found) notFound();
  return { sheet: toDto(found.record), mayEdit: found.canEdit };
}
