import { QueryTypes, type Transaction } from 'sequelize';
import { Enclosure } from './enclosure';
import { Lamp } from './lamp';
import { LampType } from './lamp-type';
import { Reading } from './reading';
import { SpeciesSheet } from './species';

/**
 * Keeps stored lamp outlooks honest: every write to what an outlook is computed from (a reading, the
 * lamp's settings, its lamp type, its enclosure's species or name, a species sheet the enclosure names)
 * adds one to the affected lamps' `outlook_version` in the same transaction, so a stored outlook of an
 * older version reads as out of date at once. Then the refresher (lib/lamp-log/stored-outlooks.ts, which
 * registers itself) recomputes them: awaited inside the write when it is small and outside a
 * transaction, after the commit otherwise. Hooks rather than calls in each route, so no write path —
 * the API, the CSV import, the demo seed, a script — can forget it.
 */

type Refresher = (lampIds: number[]) => Promise<void>;
const holder = globalThis as unknown as { __baskwellOutlookRefresher?: Refresher };

/** Up to this many lamps are recomputed before the write answers; more (a species sheet shared by
 * hundreds of enclosures) are recomputed in the background while pages say so. */
export const INLINE_REFRESH_MAX = 50;

export function setOutlookRefresher(fn: Refresher): void {
  holder.__baskwellOutlookRefresher = fn;
}

async function refresh(lampIds: number[], transaction: Transaction | null | undefined): Promise<void> {
  const fn = holder.__baskwellOutlookRefresher;
  if (!fn || lampIds.length === 0) return;
  const run = () =>
    fn(lampIds).catch((e: unknown) => {
      // The rows stay marked out of date; the periodic pass and the next page view try again.
      console.error('lamp outlook: recompute failed', e instanceof Error ? e.message : e);
    });
  if (transaction) transaction.afterCommit(() => void run());
  else if (lampIds.length <= INLINE_REFRESH_MAX) await run();
  else void run();
}

type HookOptions = { transaction?: Transaction | null };

/** Marks the lamps out of date (in the write's transaction) and has them recomputed. */
export async function invalidateLamps(lampIds: number[], options: HookOptions = {}): Promise<void> {
  const ids = [...new Set(lampIds)].filter((id) => Number.isInteger(id) && id > 0);
  if (ids.length === 0) return;
  await Lamp.sequelize!.query('UPDATE lamps SET outlook_version = outlook_version + 1 WHERE id IN (:ids)', {
    replacements: { ids },
    transaction: options.transaction ?? null,
  });
  await refresh(ids, options.transaction);
}

async function lampIdsWhere(
  sql: string,
  replacements: Record<string, unknown>,
  options: HookOptions,
): Promise<number[]> {
  const rows = await Lamp.sequelize!.query<{ id: number }>(sql, {
    replacements,
    type: QueryTypes.SELECT,
    transaction: options.transaction ?? null,
  });
  return rows.map((r) => r.id);
}

const OLD_NAMES = Symbol('species names before the update');
type WithOldNames = SpeciesSheet & { [OLD_NAMES]?: string[] };

async function invalidateSpecies(sheet: WithOldNames, options: HookOptions): Promise<void> {
  const names = [sheet.commonName, sheet.scientificName, ...(sheet[OLD_NAMES] ?? [])]
    .map((n) => n?.trim())
    .filter((n): n is string => Boolean(n));
  if (names.length === 0) return;
  // The enclosure names its species in free text; the lamp log matches it to a sheet's common or
  // scientific name ignoring case (the column collation does the same here).
  const ids = await lampIdsWhere(
    `SELECT l.id FROM lamps l JOIN enclosures e ON e.id = l.enclosure_id
      WHERE e.organisation_id = :organisationId AND TRIM(e.species_name) IN (:names)`,
    { organisationId: sheet.organisationId, names },
    options,
  );
  await invalidateLamps(ids, options);
}

export function registerOutlookInvalidation(): void {
  const ofReading = (r: Reading, o: HookOptions) => invalidateLamps([r.lampId], o);
  Reading.addHook('afterCreate', 'outlook', ofReading);
  Reading.addHook('afterUpdate', 'outlook', ofReading);
  Reading.addHook('afterDestroy', 'outlook', ofReading);
  Reading.addHook('afterBulkCreate', 'outlook', (rows: Reading[], o: HookOptions) =>
    invalidateLamps(
      rows.map((r) => r.lampId),
      o,
    ),
  );

  // A new lamp has no stored outlook yet: computing it is all there is to do.
  Lamp.addHook('afterCreate', 'outlook', (lamp: Lamp, o: HookOptions) => refresh([lamp.id], o.transaction));
  Lamp.addHook('afterUpdate', 'outlook', (lamp: Lamp, o: HookOptions) => invalidateLamps([lamp.id], o));

  Enclosure.addHook('afterUpdate', 'outlook', async (e: Enclosure, o: HookOptions) => {
    const ids = await lampIdsWhere('SELECT id FROM lamps WHERE enclosure_id = :id', { id: e.id }, o);
    await invalidateLamps(ids, o);
  });

  LampType.addHook('afterUpdate', 'outlook', async (t: LampType, o: HookOptions) => {
    const ids = await lampIdsWhere('SELECT id FROM lamps WHERE lamp_type_id = :id', { id: t.id }, o);
    await invalidateLamps(ids, o);
  });

  SpeciesSheet.addHook('beforeUpdate', 'outlook', (sheet: WithOldNames) => {
    sheet[OLD_NAMES] = [sheet.previous('commonName'), sheet.previous('scientificName')].filter(
      (n): n is string => typeof n === 'string',
    );
  });
  for (const hook of ['afterCreate', 'afterUpdate', 'afterDestroy'] as const) {
    SpeciesSheet.addHook(hook, 'outlook', (sheet: WithOldNames, o: HookOptions) =>
      invalidateSpecies(sheet, o),
    );
  }
}
