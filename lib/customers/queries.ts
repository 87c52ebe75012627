import 'server-only';
import { Op } from 'sequelize';
import { likeContains } from '@/lib/api/like';
import { CounterLamp, CounterReading, Customer, LampType } from '@/models';

/** Reads of the shop's customers. Callers check access first (access.ts). */

export type CustomerDto = {
  id: number;
  organisationId: number;
  name: string;
  email: string | null;
  phone: string | null;
  notes: string | null;
  /** When consent to reminder e-mails was given (ISO); null without consent. */
  reminderConsentAt: string | null;
  reminderConsentWithdrawnAt: string | null;
  /** The keeper account the customer is linked to (a member of the organisation), if any. */
  keeperUserId: number | null;
  createdAt: string;
  updatedAt: string;
};

export function customerDto(c: Customer): CustomerDto {
  return {
    id: c.id,
    organisationId: c.organisationId,
    name: c.name,
    email: c.email ?? null,
    phone: c.phone ?? null,
    notes: c.notes ?? null,
    reminderConsentAt: c.reminderConsentAt ? c.reminderConsentAt.toISOString() : null,
    reminderConsentWithdrawnAt: c.reminderConsentWithdrawnAt
      ? c.reminderConsentWithdrawnAt.toISOString()
      : null,
    keeperUserId: c.keeperUserId ?? null,
    createdAt: c.createdAt.toISOString(),
    updatedAt: c.updatedAt.toISOString(),
  };
}

/** Customers of an organisation by name, searched in name, e-mail and phone; `limit + 1` rows (paging). */
export async function listCustomers(
  organisationId: number,
  opts: { q?: string; cursor?: number; limit: number },
): Promise<Customer[]> {
  const where: Record<string | symbol, unknown> = { organisationId };
  if (opts.cursor) where.id = { [Op.gt]: opts.cursor };
  if (opts.q) {
    const like = likeContains(opts.q);
    where[Op.or] = [
      { name: { [Op.like]: like } },
      { email: { [Op.like]: like } },
      { phone: { [Op.like]: like } },
    ];
  }
  return Customer.findAll({ where, order: [['id', 'ASC']], limit: opts.limit + 1 });
}

/** For the list page: customers by name (a shop's customer list fits a page; the search narrows it). */
export async function customersByName(organisationId: number, q: string | undefined, limit = 200) {
  const where: Record<string | symbol, unknown> = { organisationId };
  if (q) {
    const like = likeContains(q);
    where[Op.or] = [
      { name: { [Op.like]: like } },
      { email: { [Op.like]: like } },
      { phone: { [Op.like]: like } },
    ];
  }
  const rows = await Customer.findAll({
    where,
    order: [
      ['name', 'ASC'],
      ['id', 'ASC'],
    ],
    limit: limit + 1,
  });
  return { items: rows.slice(0, limit).map(customerDto), more: rows.length > limit };
}

export type CounterLampSummary = {
  id: number;
  label: string | null;
  lampTypeId: number;
  lampTypeName: string;
  firstUsedOn: string;
  firstUsedEstimated: boolean;
  hoursPerDay: number;
  tests: number;
  lastTest: { takenAt: string; verdict: string; testAgainOn: string | null } | null;
};

/** A customer's counter lamps, newest first, with their number of tests and the last verdict. */
export async function lampsOfCustomer(customerId: number): Promise<CounterLampSummary[]> {
  const lamps = (await CounterLamp.findAll({
    where: { customerId },
    include: [
      { model: LampType, as: 'lampType', required: true },
      { model: CounterReading, as: 'readings', required: false },
    ],
    order: [['id', 'DESC']],
  })) as (CounterLamp & { lampType: LampType; readings: CounterReading[] })[];
  return lamps.map((l) => {
    const readings = [...l.readings].sort((a, b) => b.takenAt.getTime() - a.takenAt.getTime());
    const last = readings[0];
    return {
      id: l.id,
      label: l.label ?? null,
      lampTypeId: l.lampTypeId,
      lampTypeName: l.lampType.name,
      firstUsedOn: l.firstUsedOn,
      firstUsedEstimated: l.firstUsedEstimated,
      hoursPerDay: l.hoursPerDay,
      tests: readings.length,
      lastTest: last
        ? {
            takenAt: last.takenAt.toISOString(),
            verdict: last.verdict,
            testAgainOn: last.testAgainOn ?? null,
          }
        : null,
    };
  });
}
