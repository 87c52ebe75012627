import 'server-only';
import { Op, UniqueConstraintError } from 'sequelize';
import { conflict, invalid } from '@/lib/errors';
import { Customer, Enclosure, Lamp, LampType, Membership, Reading, User } from '@/models';

/**
 * A customer linked to the keeper account they became (a member of the shop with the keeper role). The
 * link copies nothing: the customer page lists the keeper's enclosure lamps as they are in the lamp log,
 * and a counter test of one of them adds its reading to that lamp. Callers check access to the customer
 * first (access.ts); the keeper is checked here against the customer's own organisation.
 */

export type KeeperChoice = { id: number; name: string; email: string; linkedCustomerId: number | null };

/** The organisation's keepers, by name, each with the customer already linked to them (if any). */
export async function keeperChoices(organisationId: number): Promise<KeeperChoice[]> {
  const [members, linked] = await Promise.all([
    Membership.findAll({
      where: { organisationId, role: 'keeper' },
      include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'], required: true }],
    }) as Promise<(Membership & { user: User })[]>,
    Customer.findAll({
      where: { organisationId, keeperUserId: { [Op.ne]: null } },
      attributes: ['id', 'keeperUserId'],
    }),
  ]);
  const byKeeper = new Map(linked.map((c) => [c.keeperUserId!, c.id]));
  return members
    .map((m) => ({
      id: m.user.id,
      name: m.user.name,
      email: m.user.email,
      linkedCustomerId: byKeeper.get(m.user.id) ?? null,
    }))
    .sort((a, b) => a.name.localeCompare(b.name) || a.id - b.id);
}

/** Whether `userId` is a keeper of the organisation now (a link outlives a change of role or a removal). */
export async function isKeeperOf(organisationId: number, userId: number): Promise<boolean> {
  return (await Membership.count({ where: { organisationId, userId, role: 'keeper' } })) > 0;
}

/** Links the customer to a keeper of their organisation; one keeper is linked to one customer at most. */
export async function linkKeeper(customer: Customer, keeperId: number): Promise<Customer> {
  if (!(await isKeeperOf(customer.organisationId, keeperId))) {
    throw invalid('keeperId', 'Choose a keeper of this organisation (a member with the keeper role).');
  }
  const other = await Customer.findOne({
    where: { organisationId: customer.organisationId, keeperUserId: keeperId, id: { [Op.ne]: customer.id } },
  });
  if (other) throw alreadyLinked(other.name);
  try {
    return await customer.update({ keeperUserId: keeperId });
  } catch (e) {
    // Two links made at once: the unique index keeps one.
    if (e instanceof UniqueConstraintError) throw alreadyLinked('another customer');
    throw e;
  }
}

const alreadyLinked = (name: string) =>
  conflict(`That keeper is already linked to ${name}: unlink them there first.`, 'keeper_linked');

/** Drops the link; the customer's counter lamps and the keeper's enclosure lamps stay as they are. */
export async function unlinkKeeper(customer: Customer): Promise<Customer> {
  return customer.update({ keeperUserId: null });
}

export type KeeperLampRef = {
  id: number;
  label: string;
  enclosureId: number;
  enclosureName: string;
  lampTypeName: string;
  firstUsedOn: string;
  hoursPerDay: number;
  retiredOn: string | null;
  readings: number;
  lastReadingAt: string | null;
};

export type LinkedKeeper = {
  id: number;
  name: string;
  email: string;
  /** False when the account is no longer a keeper of the organisation: its lamps are then not listed. */
  isKeeper: boolean;
  lamps: KeeperLampRef[];
};

/**
 * The keeper linked to the customer with the lamps of their enclosures in the customer's organisation, as
 * references to the lamp log (nothing is copied); null without a link.
 */
export async function linkedKeeper(customer: Customer): Promise<LinkedKeeper | null> {
  if (!customer.keeperUserId) return null;
  const [user, isKeeper] = await Promise.all([
    User.findByPk(customer.keeperUserId, { attributes: ['id', 'name', 'email'] }),
    isKeeperOf(customer.organisationId, customer.keeperUserId),
  ]);
  if (!user) return null;
  const lamps = isKeeper ? await keeperLamps(customer.organisationId, user.id) : [];
  return { id: user.id, name: user.name, email: user.email, isKeeper, lamps };
}

type LampRow = Lamp & { enclosure: Enclosure; lampType: LampType };

async function keeperLamps(organisationId: number, keeperId: number): Promise<KeeperLampRef[]> {
  const lamps = (await Lamp.findAll({
    include: [
      { model: Enclosure, as: 'enclosure', required: true, where: { organisationId, keeperId } },
      { model: LampType, as: 'lampType', required: true, attributes: ['id', 'name'] },
    ],
    order: [
      [{ model: Enclosure, as: 'enclosure' }, 'name', 'ASC'],
      ['label', 'ASC'],
      ['id', 'ASC'],
    ],
  })) as LampRow[];
  if (lamps.length === 0) return [];
  const counts = (await Reading.findAll({
    attributes: [
      'lampId',
      [Reading.sequelize!.fn('COUNT', Reading.sequelize!.col('id')), 'n'],
      [Reading.sequelize!.fn('MAX', Reading.sequelize!.col('taken_at')), 'last'],
    ],
    where: { lampId: lamps.map((l) => l.id) },
    group: ['lampId'],
    raw: true,
  })) as unknown as { lampId: number; n: number | string; last: Date | string | null }[];
  const byLamp = new Map(counts.map((c) => [Number(c.lampId), c]));
  return lamps.map((l) => {
    const c = byLamp.get(l.id);
    return {
      id: l.id,
      label: l.label,
      enclosureId: l.enclosure.id,
      enclosureName: l.enclosure.name,
      lampTypeName: l.lampType.name,
      firstUsedOn: l.firstUsedOn,
      hoursPerDay: l.hoursPerDay,
      retiredOn: l.retiredOn ?? null,
      readings: c ? Number(c.n) : 0,
      lastReadingAt: c?.last ? new Date(c.last).toISOString() : null,
    };
  });
}

/** The customer linked to a keeper of the organisation, while that account is still a keeper there. */
export async function customerLinkedTo(organisationId: number, keeperId: number): Promise<Customer | null> {
  const customer = await Customer.findOne({ where: { organisationId, keeperUserId: keeperId } });
  return customer && (await isKeeperOf(organisationId, keeperId)) ? customer : null;
}
