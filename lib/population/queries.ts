import 'server-only';
import { QueryTypes } from 'sequelize';
import { loadOwnedForPage } from '@/lib/access';
import type { CurrentUser } from '@/lib/auth/session-user';
import { getSequelize } from '@/lib/db';
import { runEngineTask } from '@/lib/engine-pool';
import { lampFacts, readingFacts } from '@/lib/lamp-log/facts';
import { toDto as lampTypeDto } from '@/lib/lamp-types/queries';
import { isExampleData } from '@/lib/organisations/queries';
import { CounterLamp, CounterReading, Lamp, LampCurveAdoption, LampType, Reading, User } from '@/models';
import type { PopulationCurve, PopulationInput, PopulationLamp } from './fit';

/**
 * The population curve of one lamp type from the database: every reading of the organisation's lamps of
 * that type, in enclosures and at the counter. The fit runs on an engine thread (its cost grows with the
 * readings, and a page view must not hold up anyone else's request), and its result is kept per type
 * under a version of the readings it came from, so a page view refits only after a reading, a lamp or the
 * type changed.
 */

/**
 * A fingerprint of everything the curve is computed from: count, newest id and newest change of the
 * type's readings and lamps in both tables, and the type's own row. A deleted reading lowers a count, an
 * edited one moves a newest change.
 */
export async function readingsVersion(type: LampType): Promise<string> {
  const [row] = await getSequelize().query<Record<string, string | number | null>>(
    `SELECT
       (SELECT CONCAT(COUNT(*), '/', COALESCE(MAX(r.id), 0), '/', COALESCE(MAX(r.updated_at), ''))
          FROM readings r JOIN lamps l ON l.id = r.lamp_id WHERE l.lamp_type_id = :id) AS enclosure_readings,
       (SELECT CONCAT(COUNT(*), '/', COALESCE(MAX(l.updated_at), '')) FROM lamps l WHERE l.lamp_type_id = :id)
         AS enclosure_lamps,
       (SELECT CONCAT(COUNT(*), '/', COALESCE(MAX(r.id), 0), '/', COALESCE(MAX(r.updated_at), ''))
          FROM counter_readings r JOIN counter_lamps l ON l.id = r.counter_lamp_id
         WHERE l.lamp_type_id = :id AND l.organisation_id = :org) AS counter_readings,
       (SELECT CONCAT(COUNT(*), '/', COALESCE(MAX(l.updated_at), '')) FROM counter_lamps l
         WHERE l.lamp_type_id = :id AND l.organisation_id = :org) AS counter_lamps`,
    { replacements: { id: type.id, org: type.organisationId }, type: QueryTypes.SELECT },
  );
  return [type.id, type.updatedAt.toISOString(), ...Object.values(row ?? {})].join('|');
}

/** The type (its catalogue curve, never an adopted one: the curve is measured against the catalogue). */
function typeFacts(type: LampType): PopulationInput['type'] {
  const dto = { ...lampTypeDto(type), adoptedCurve: null };
  return lampFacts(
    {
      id: 0,
      label: dto.name,
      firstUsedOn: '2000-01-01',
      hoursPerDay: 12,
      retiredOn: null,
      baskingDistanceCm: null,
      baskingTransmission: null,
    },
    dto,
  ).type;
}

const READING_FIELDS = [
  'id',
  'takenAt',
  'distanceCm',
  'value',
  'unit',
  'through',
  'throughTransmission',
  'warmedUp',
  'updatedAt',
] as const;

/** Every lamp of the type with its readings, as the fit takes them. */
export async function populationInput(type: LampType): Promise<PopulationInput> {
  const [lamps, counterLamps] = await Promise.all([
    Lamp.findAll({ where: { lampTypeId: type.id }, attributes: ['id', 'firstUsedOn', 'hoursPerDay'] }),
    CounterLamp.findAll({
      where: { lampTypeId: type.id, organisationId: type.organisationId },
      attributes: ['id', 'firstUsedOn', 'hoursPerDay'],
    }),
  ]);
  const [readings, counterReadings] = await Promise.all([
    lamps.length
      ? Reading.findAll({
          where: { lampId: lamps.map((l) => l.id) },
          attributes: [...READING_FIELDS, 'lampId'],
        })
      : [],
    counterLamps.length
      ? CounterReading.findAll({
          where: { counterLampId: counterLamps.map((l) => l.id) },
          attributes: [...READING_FIELDS, 'counterLampId'],
        })
      : [],
  ]);
  const group = <T>(rows: T[], key: (r: T) => number) => {
    const out = new Map<number, T[]>();
    for (const r of rows) (out.get(key(r)) ?? out.set(key(r), []).get(key(r))!).push(r);
    return out;
  };
  const entries = <R extends Parameters<typeof readingFacts>[0]>(
    rows: { id: number; firstUsedOn: string; hoursPerDay: number }[],
    source: PopulationLamp['source'],
    keyPrefix: string,
    readingsOf: Map<number, R[]>,
  ): PopulationLamp[] =>
    rows.map((l) => ({
      key: `${keyPrefix}-${l.id}`,
      source,
      firstUsedOn: l.firstUsedOn,
      hoursPerDay: l.hoursPerDay,
      readings: (readingsOf.get(l.id) ?? []).map(readingFacts),
    }));
  const population = [
    ...entries(
      lamps,
      'enclosure',
      'lamp',
      group(readings, (r) => r.lampId),
    ),
    ...entries(
      counterLamps,
      'counter',
      'counter',
      group(counterReadings, (r) => r.counterLampId),
    ),
  ];
  return { type: typeFacts(type), lamps: population };
}

type Cached = { version: string; result: Promise<PopulationCurve> };
const holder = globalThis as unknown as { __baskwellPopulationCache?: Map<number, Cached> };
/** Curves kept, one per lamp type; the oldest goes first. */
const CACHE_TYPES = 200;

/**
 * The type's population curve, fitted once per version of its readings. Shared by every viewer, so it is
 * not tied to one request's signal (a closed tab must not cancel another person's view); the pool's time
 * limit still bounds it.
 */
export async function populationFor(type: LampType): Promise<PopulationCurve> {
  const cache = (holder.__baskwellPopulationCache ??= new Map());
  const version = await readingsVersion(type);
  const hit = cache.get(type.id);
  if (hit && hit.version === version) return hit.result;
  const result = populationInput(type).then((input) => runEngineTask('populationCurve', input));
  cache.delete(type.id);
  cache.set(type.id, { version, result });
  while (cache.size > CACHE_TYPES) cache.delete(cache.keys().next().value as number);
  // A failed or cancelled fit is not kept: the next view tries again.
  result.catch(() => {
    if (cache.get(type.id)?.result === result) cache.delete(type.id);
  });
  return result;
}

export type AdoptionView = {
  id: number;
  lamps: number;
  readings: number;
  adoptedAt: string;
  adoptedBy: string | null;
  withdrawnAt: string | null;
  withdrawnBy: string | null;
  halfLifeMonths: number | null;
  startShare: number | null;
};

/** The fit as it stood when adopted, kept with the adoption. */
export type FrozenFit = {
  kind: string;
  note: string;
  startShare: number;
  halfLifeMonths: number | null;
  fit: unknown;
  points: [number, number][];
};

/** The type's adoptions, newest first (the one in force, if any, has no withdrawal). */
export async function adoptionHistory(lampTypeId: number, limit = 10): Promise<AdoptionView[]> {
  const rows = await LampCurveAdoption.findAll({
    where: { lampTypeId },
    order: [
      ['adoptedAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit,
  });
  const ids = [...new Set(rows.flatMap((r) => [r.adoptedById, r.withdrawnById]))].filter(
    (id): id is number => typeof id === 'number',
  );
  const users = ids.length ? await User.findAll({ where: { id: ids }, attributes: ['id', 'name'] }) : [];
  const name = (id: number | null) => (id ? (users.find((u) => u.id === id)?.name ?? null) : null);
  return rows.map((r) => {
    let frozen: Partial<FrozenFit> = {};
    try {
      frozen = JSON.parse(r.fitJson) as FrozenFit;
    } catch {
      // A row that cannot be read still shows who and when.
    }
    return {
      id: r.id,
      lamps: r.lamps,
      readings: r.readings,
      adoptedAt: r.adoptedAt.toISOString(),
      adoptedBy: name(r.adoptedById),
      withdrawnAt: r.withdrawnAt ? r.withdrawnAt.toISOString() : null,
      withdrawnBy: name(r.withdrawnById ?? null),
      halfLifeMonths: typeof frozen.halfLifeMonths === 'number' ? frozen.halfLifeMonths : null,
      startShare: typeof frozen.startShare === 'number' ? frozen.startShare : null,
    };
  });
}

/**
 * What a lamp type's page shows of the shop's measured curve, or null for someone who may not see the
 * shop's figures (a keeper: they see only which curve is in force, from the type itself).
 */
export async function populationPage(user: CurrentUser, lampTypeId: number) {
  const found = await loadOwnedForPage('lamp-type-figures', lampTypeId, user);
  if (!found) return null;
  const { record: type, canEdit: mayAdopt } = found;
  const [view, history, example] = await Promise.all([
    // A busy or failed engine thread leaves the rest of the type's page readable, with a message.
    populationFor(type).catch(() => null),
    adoptionHistory(type.id),
    isExampleData(type.organisationId),
  ]);
  return {
    view,
    history,
    example,
    mayAdopt,
  };
}
