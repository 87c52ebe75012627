import 'server-only';
import type { CurrentUser } from '@/lib/auth/session-user';
import { getSequelize } from '@/lib/db';
import { measurementColumns } from '@/lib/lamp-log/csv-reading';
import { lampFacts, readingFacts } from '@/lib/lamp-log/facts';
import { toDto as lampTypeDto } from '@/lib/lamp-types/queries';
import { CounterLamp, CounterReading, Customer, LampType } from '@/models';
import { assessCounterLamp } from './assess';
import { parseCounterCsv, type CounterCsvResult, type CounterCsvRow } from './csv';

/**
 * The import of past counter tests in two steps, as the lamp log's readings import: a preview (every row
 * checked, nothing saved, and who would be added) and the import, which checks again and then saves
 * every row in one transaction, or nothing. A customer is found by name (case and spacing aside) or added
 * without consent to e-mails; a lamp is found under its customer by type and first use, or added; each
 * reading is stored with the verdict the counter gives for the readings up to that day, as at the counter.
 */

export type CounterCsvPreview = CounterCsvResult & {
  ok: boolean;
  total: number;
  /** Names in the file no customer has yet: the import adds them. */
  newCustomers: string[];
};

const key = (name: string) => name.trim().replace(/\s+/g, ' ').toLowerCase();

async function context(organisationId: number) {
  const [types, customers] = await Promise.all([
    LampType.findAll({ where: { organisationId }, order: [['id', 'ASC']] }),
    Customer.findAll({ where: { organisationId }, attributes: ['id', 'name'], order: [['id', 'ASC']] }),
  ]);
  // The oldest customer of a name, when two share it.
  const byName = new Map<string, number>();
  for (const c of customers) if (!byName.has(key(c.name))) byName.set(key(c.name), c.id);
  return { types, byName };
}

export async function previewCounterCsv(
  organisationId: number,
  csv: string,
  tzOffsetMinutes: number,
): Promise<CounterCsvPreview> {
  const { types, byName } = await context(organisationId);
  const result = parseCounterCsv(csv, types, tzOffsetMinutes);
  const newCustomers = [
    ...new Map(
      result.rows
        .filter((r) => r.customerName && !byName.has(key(r.customerName)))
        .map((r) => [key(r.customerName!), r.customerName!]),
    ).values(),
  ];
  return {
    ...result,
    ok: result.errors.length === 0,
    total: result.rows.length + result.errors.length,
    newCustomers,
  };
}

/** All rows imported, or none: then every row's problem, for the route to answer. */
export type CounterImportOutcome =
  | { ok: true; imported: number; customersAdded: number; lampsAdded: number }
  | { ok: false; errors: CounterCsvResult['errors'] };

export async function importCounterCsv(
  user: CurrentUser,
  organisationId: number,
  csv: string,
  tzOffsetMinutes: number,
): Promise<CounterImportOutcome> {
  const preview = await previewCounterCsv(organisationId, csv, tzOffsetMinutes);
  if (preview.errors.length > 0) return { ok: false, errors: preview.errors };
  const { types, byName } = await context(organisationId);
  const typeOf = new Map(types.map((t) => [t.id, t]));
  // One lamp per customer (or walk-in row group), type and first use.
  const groups = new Map<string, CounterCsvRow[]>();
  for (const r of preview.rows) {
    const k = `${r.customerName ? key(r.customerName) : ''}|${r.lampTypeId}|${r.firstUsedOn}`;
    groups.set(k, [...(groups.get(k) ?? []), r]);
  }
  const counts = await getSequelize().transaction(async (transaction) => {
    let customersAdded = 0;
    let lampsAdded = 0;
    for (const rows of groups.values()) {
      const first = rows[0]!;
      let customerId: number | null = null;
      if (first.customerName) {
        customerId = byName.get(key(first.customerName)) ?? null;
        if (customerId === null) {
          const made = await Customer.create(
            {
              organisationId,
              name: first.customerName,
              notes: 'Added by the import of past counter tests.',
              createdById: user.id,
            },
            { transaction },
          );
          customerId = made.id;
          byName.set(key(first.customerName), made.id);
          customersAdded++;
        }
      }
      const found = customerId
        ? await CounterLamp.findOne({
            where: {
              organisationId,
              customerId,
              lampTypeId: first.lampTypeId,
              firstUsedOn: first.firstUsedOn,
            },
            order: [['id', 'ASC']],
            transaction,
          })
        : null;
      const lamp =
        found ??
        (await CounterLamp.create(
          {
            organisationId,
            customerId,
            lampTypeId: first.lampTypeId,
            firstUsedOn: first.firstUsedOn,
            firstUsedEstimated: false,
            hoursPerDay: 12,
            createdById: user.id,
          },
          { transaction },
        ));
      if (!found) lampsAdded++;
      const type = lampTypeDto(typeOf.get(first.lampTypeId)!);
      const facts = lampFacts({ ...lamp.get(), retiredOn: null, label: lamp.label ?? type.name }, type);
      const taken = found
        ? await CounterReading.findAll({
            where: { counterLampId: lamp.id },
            order: [['takenAt', 'ASC']],
            transaction,
          })
        : [];
      for (const r of [...rows].sort((a, b) => a.takenAt.localeCompare(b.takenAt))) {
        const row = { counterLampId: lamp.id, ...measurementColumns(r) };
        // The verdict the counter gives that day, from this lamp's readings up to then. No species: the
        // file does not say where the lamp hangs at home.
        const earlier = taken.filter((t) => t.takenAt <= row.takenAt);
        const { verdict } = assessCounterLamp({
          lamp: facts,
          readings: [...earlier.map(readingFacts), { ...row, id: 0 }],
          species: null,
          today: r.takenAt.slice(0, 10),
          ageEstimated: false,
        });
        taken.push(
          await CounterReading.create(
            { ...row, verdict: verdict.kind, testAgainOn: verdict.testAgainOn, takenById: user.id },
            { transaction },
          ),
        );
      }
    }
    return { customersAdded, lampsAdded };
  });
  return { ok: true, imported: preview.rows.length, ...counts };
}
