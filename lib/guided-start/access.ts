import 'server-only';
import { loadOwned } from '@/lib/access';
import type { CurrentUser } from '@/lib/auth/session-user';
import { forbidden, notFound } from '@/lib/errors';
import { can } from '@/lib/permissions';
import { toDto } from '@/lib/species/queries';
import type { GuidedStartInput } from './input';

/**
 * May this person start an enclosure in the organisation for that keeper, with that species sheet: the
 * keeper (themselves, unless they are staff), and the sheet of this organisation, or "not found".
 */
export async function authorised(user: CurrentUser, input: GuidedStartInput) {
  const organisationId = input.organisationId;
  if (!can(user, 'read', { kind: 'species', organisationId })) throw notFound('That organisation');
  const keeperId = input.keeperId ?? user.id;
  if (!can(user, 'create', { kind: 'enclosure', organisationId, keeperId })) {
    throw forbidden('You can only start enclosures of your own.');
  }
  const row = await loadOwned('species', input.speciesId, user, 'read');
  // A sheet of another organisation the person belongs to is still not this enclosure's to use.
  if (row.organisationId !== organisationId) throw notFound('That species sheet');
  return { keeperId, sheet: toDto(row) };
}
