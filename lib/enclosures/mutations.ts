import 'server-only';
import type { z } from 'zod';
import { invalid } from '@/lib/errors';
import { Enclosure, Membership, User } from '@/models';
import { enclosureWithKeeper, type EnclosureWithKeeper } from './queries';
import type { createEnclosureBody, updateEnclosureBody } from './schemas';

/** Writes of enclosures. Callers check permissions first (lib/permissions.ts). */

/** An enclosure's keeper must belong to the organisation (any role: staff may keep the shop's own animals). */
export async function assertKeeperInOrganisation(organisationId: number, keeperId: number): Promise<void> {
  const member = await Membership.findOne({
    where: { organisationId, userId: keeperId },
    attributes: ['id'],
  });
  if (!member) throw invalid('keeperId', 'That keeper is not a member of this organisation.');
}

/** A new enclosure kept by `keeperId`, who must belong to the organisation. */
export async function createEnclosure(
  fields: Omit<z.output<typeof createEnclosureBody>, 'keeperId'> & { keeperId: number },
): Promise<EnclosureWithKeeper> {
  await assertKeeperInOrganisation(fields.organisationId, fields.keeperId);
  const enclosure = await Enclosure.create(fields);
  const keeper = await User.findByPk(fields.keeperId, { attributes: ['id', 'name'] });
  return Object.assign(enclosure, { keeper });
}

/** Changes an enclosure; a new keeper must belong to its organisation. */
export async function updateEnclosure(
  enclosure: Enclosure,
  body: z.output<typeof updateEnclosureBody>,
): Promise<EnclosureWithKeeper> {
  if (body.keeperId !== undefined && body.keeperId !== enclosure.keeperId) {
    await assertKeeperInOrganisation(enclosure.organisationId, body.keeperId);
  }
  await enclosure.update(body);
  return enclosureWithKeeper(enclosure.id);
}

/** Its designs and lamps go with it: the foreign keys cascade. */
export async function deleteEnclosure(enclosure: Enclosure): Promise<void> {
  await enclosure.destroy();
}
