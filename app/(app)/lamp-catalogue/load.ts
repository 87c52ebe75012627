import { notFound } from 'next/navigation';
import type { CurrentUser } from '@/lib/auth/session-user';
import { findLampType, toDto } from '@/lib/lamp-types/queries';
import { can } from '@/lib/permissions';

/** A catalogue entry the user may read (else the page 404s, hiding other organisations' entries). */
export async function loadLampType(user: CurrentUser, rawId: string) {
  const id = Number(rawId);
  if (!Number.isInteger(id) || id <= 0) notFound();
  const row = await findLampType(id);
  if (!row || !can(user, 'read', { kind: 'lamp-type', organisationId: row.organisationId })) notFound();
  return {
    lampType: toDto(row),
    mayEdit: can(user, 'update', { kind: 'lamp-type', organisationId: row.organisationId }),
  };
}
