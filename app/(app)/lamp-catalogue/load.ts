import { notFound } from 'next/navigation';
import { loadOwnedForPage } from '@/lib/access';
import type { CurrentUser } from '@/lib/auth/session-user';
import { toDto } from '@/lib/lamp-types/queries';

/** A catalogue entry the user may read (else the page 404s, hiding other organisations' entries). */
export async function loadLampType(user: CurrentUser, rawId: string) {
  const found = await loadOwnedForPage('lamp-type', rawId, user);
  if (!found) notFound();
  return { lampType: toDto(found.record), mayEdit: found.canEdit };
}
