import { notFound } from 'next/navigation';
import type { CurrentUser } from '@/lib/auth/session-user';
import { can } from '@/lib/permissions';
import { findSheet, toDto } from '@/lib/species/queries';

/** A sheet the user may read (else the page 404s, hiding other organisations' sheets). */
export async function loadSheet(user: CurrentUser, rawId: string) {
  const id = Number(rawId);
  if (!Number.isInteger(id) || id <= 0) notFound();
  const row = await findSheet(id);
  if (!row || !can(user, 'read', { kind: 'species', organisationId: row.organisationId })) notFound();
  const sheet = toDto(row);
  return {
    sheet,
    mayEdit: can(user, 'update', { kind: 'species', organisationId: row.organisationId }),
  };
}
