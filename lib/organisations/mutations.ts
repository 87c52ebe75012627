import 'server-only';
import { conflict, notFound } from '@/lib/errors';
import type { Transaction } from 'sequelize';
import { endAllSessions } from '@/lib/account/mutations';

import { getSequelize } from '@/lib/db';
import { seedStartingCatalogue } from '@/lib/species/seed';
import { Membership, Organisation, User, type Role } from '@/models';
import { contactLine, type OrganisationContact } from './schemas';
import { memberJson, type MemberRow } from './queries';

/** Changes to an organisation and its members. Access is checked by the caller (a route's allow()). */

/**
 * A new organisation with `ownerId` as its owner and the starting species sheets and lamp catalogue,
 * all in one transaction: an organisation never exists without its owner or its catalogue.
 */
export async function createOrganisation(name: string, ownerId: number): Promise<Organisation> {
  return getSequelize().transaction(async (transaction) => {
    const org = await Organisation.create({ name }, { transaction });
    await Membership.create({ organisationId: org.id, userId: ownerId, role: 'owner' }, { transaction });
    await seedStartingCatalogue(org.id, { transaction });
    return org;
  });
}

/** Changes a member's role; an organisation always keeps at least one owner. */
export async function changeMemberRole(organisationId: number, userId: number, role: Role) {
  return getSequelize().transaction(async (transaction) => {
    const owners = await lockOwners(organisationId, transaction);
    const member: MemberRow | null = await Membership.findOne({
      where: { organisationId, userId },
      include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'] }],
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    if (!member) throw notFound('That member');
    if (member.role === 'owner' && role !== 'owner') assertAnotherOwner(owners);
    member.role = role;
    await member.save({ transaction });
    return memberJson(member);
  });
}

/** Removes a member. Their sessions end at once: the session version is bumped. */
export async function removeMember(organisationId: number, userId: number): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    const owners = await lockOwners(organisationId, transaction);
    const member = await Membership.findOne({
      where: { organisationId, userId },
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    if (!member) throw notFound('That member');
    if (member.role === 'owner') assertAnotherOwner(owners);
    await member.destroy({ transaction });
    await endAllSessions(userId, transaction);
  });
}

/** Locks the owner rows first (always in this order), so two owners cannot demote each other at once. */
function lockOwners(organisationId: number, transaction: Transaction) {
  return Membership.findAll({
    where: { organisationId, role: 'owner' },
    lock: transaction.LOCK.UPDATE,
    transaction,
  });
}

function assertAnotherOwner(owners: Membership[]) {
  if (owners.length < 2) {
    throw conflict(
      'An organisation needs at least one owner. Make someone else an owner first.',
      'last_owner',
    );
  }
}

/** Changes how customers reach the organisation (what the patch names); returns the contact as stored. */
export async function updateOrganisationContact(id: number, patch: Partial<OrganisationContact>) {
  const org = await Organisation.findByPk(id);
  if (!org) throw notFound('That organisation');
  await org.update(patch);
  const contact: OrganisationContact = {
    contactPhone: org.contactPhone ?? null,
    contactEmail: org.contactEmail ?? null,
    contactAddress: org.contactAddress ?? null,
  };
  return { ...contact, line: contactLine(contact) };
}
