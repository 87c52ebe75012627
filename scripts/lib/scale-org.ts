// A generated organisation of a chosen size for the scale benchmark (`npm run bench:scale`): invented
// keepers, enclosures, lamps with meter readings, designs with variants, all named "Example" and marked as
// example data. Rows go in with multi-row INSERTs in chunks (100,000 readings in seconds, not minutes),
// then the lamps' outlooks are computed by the app's own computation and writer, once per distinct
// lamp history (scale-outlooks.ts), so the lamp log reads them as it would on a real organisation.
//
// Deterministic: the same size gives the same rows (a seeded pseudo-random sequence), so two runs compare.
import bcrypt from 'bcryptjs';
import { QueryTypes, type Sequelize } from 'sequelize';
import { addDays, todayIso } from '@/lib/lamp-log/dates';
import { seedStartingCatalogue } from '@/lib/species/seed';
import { defaultDesignFor } from '@/lib/variants/default-design';
import { LampType, Membership, Organisation, SpeciesSheet, User } from '@/models';
import type { Design } from '@/simulation';
import { seedOutlooks } from './scale-outlooks';

export type ScaleSize = { enclosures: number; lamps: number; readings: number; designs: number };

/** The organisation the benchmark is about: a zoo's reptile house or a busy shop over a few years. */
export const DEFAULT_SCALE_SIZE: ScaleSize = {
  enclosures: 2000,
  lamps: 8000,
  readings: 100_000,
  designs: 200,
};

/** `size` times `factor`, whole numbers. */
export function scaledSize(size: ScaleSize, factor: number): ScaleSize {
  const times = (n: number) => Math.round(n * factor);
  return {
    enclosures: times(size.enclosures),
    lamps: times(size.lamps),
    readings: times(size.readings),
    designs: times(size.designs),
  };
}

/** One keeper for every this many enclosures (a shop's customers, a zoo's keepers). */
const ENCLOSURES_PER_KEEPER = 10;
const VARIANTS_PER_DESIGN = 2;
/** Rows per INSERT: well under MariaDB's packet limit, few round trips. */
const CHUNK = 2000;
/** UV lamp technologies the example lamps cycle through; heat lamps get no UV readings. */
const UV_TECHS = ['t5', 't8', 'compact', 'mercury-vapour', 'metal-halide', 'led-uvb'];
const HEAT_TECHS = ['halogen', 'ceramic'];
const ROOMS = ['Desert room', 'Forest room', 'Rack', 'Quarantine', 'Shop floor', 'Nursery'];

export const SCALE_OWNER_PASSWORD = 'example-scale-owner-pass';

export type ScaleOrganisation = {
  organisationId: number;
  ownerEmail: string;
  ownerPassword: string;
};

export type AddedRows = ScaleSize & {
  keepers: number;
  variants: number;
  outlooks: number;
  /** Distinct computations the outlooks took (the rest share a history: scale-outlooks.ts). */
  computedOutlooks: number;
  seconds: { rows: number; outlooks: number };
};

/**
 * Distinct UV lamp histories per species. A real organisation's lamps are each their own, but the
 * benchmark measures reading stored outlooks, not fitting them: drawing the UV lamps from a bounded set
 * of histories (type, age, hours, basking distance, retirement and the readings' scatter) lets the
 * seeding fit each distinct history once (scale-outlooks.ts) instead of once a lamp, while the lamp log
 * still shows every status and a spread of dates.
 */
const HISTORIES_PER_SPECIES = 12;

type LampHistory = {
  typeIndex: number;
  ageDays: number;
  retiredDaysAgo: number | null;
  hoursPerDay: number;
  baskingCm: number | null;
  seed: number;
};

/** History `j` of the species at `speciesIndex`: the same numbers every run and at every size. */
function lampHistory(speciesIndex: number, j: number, typeCount: number): LampHistory {
  const seed = 1 + speciesIndex * HISTORIES_PER_SPECIES + j;
  const rand = random(seed * 7919);
  return {
    typeIndex: Math.floor(rand() * typeCount),
    ageDays: Math.floor(rand() * 730),
    retiredDaysAgo: rand() < 0.02 ? Math.floor(rand() * 60) : null,
    hoursPerDay: [10, 12, 14][j % 3]!,
    baskingCm: [25, 30, 35][(j + speciesIndex) % 3]!,
    seed,
  };
}

/** A small linear congruential generator: the same sequence every run. */
function random(seed: number) {
  let s = seed >>> 0 || 1;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

/** Splits `total` into `parts` whole shares that differ by at most one. */
function shares(total: number, parts: number): number[] {
  if (parts === 0) return [];
  const base = Math.floor(total / parts);
  const extra = total - base * parts;
  return Array.from({ length: parts }, (_, i) => base + (i < extra ? 1 : 0));
}

const sqlDate = (d: Date) => d.toISOString().slice(0, 19).replace('T', ' ');

/**
 * Inserts rows in chunks. Every value is generated here (numbers, dates, our own names), and still goes
 * through the driver's escaping.
 */
async function insertRows(
  sequelize: Sequelize,
  table: string,
  columns: string[],
  rows: unknown[][],
): Promise<void> {
  for (let i = 0; i < rows.length; i += CHUNK) {
    const chunk = rows.slice(i, i + CHUNK);
    const values = chunk
      .map(
        (r) =>
          `(${r.map((v) => (v instanceof Date ? `'${sqlDate(v)}'` : sequelize.escape(v as string))).join(',')})`,
      )
      .join(',');
    await sequelize.query(`INSERT INTO ${table} (${columns.join(',')}) VALUES ${values}`);
  }
}

async function idsAfter(
  sequelize: Sequelize,
  sql: string,
  replacements: Record<string, unknown>,
): Promise<number[]> {
  const rows = await sequelize.query<{ id: number }>(sql, { replacements, type: QueryTypes.SELECT });
  return rows.map((r) => Number(r.id));
}

/** The highest id in `table` so far (0 when empty): rows added after it are this run's. */
async function maxId(sequelize: Sequelize, table: 'enclosures' | 'lamps' | 'designs'): Promise<number> {
  const [row] = await sequelize.query<{ n: number | null }>(`SELECT MAX(id) AS n FROM ${table}`, {
    type: QueryTypes.SELECT,
  });
  return Number(row?.n ?? 0);
}

/** A new organisation with its starting catalogue and an owner who can sign in; no enclosures yet. */
export async function createScaleOrganisation(label: string): Promise<ScaleOrganisation> {
  const organisation = await Organisation.create({ name: `Example data: ${label}` });
  await seedStartingCatalogue(organisation.id);
  const ownerEmail = `scale.owner.${organisation.id}@example.com`;
  const owner = await User.create({
    email: ownerEmail,
    name: 'Example owner (scale benchmark)',
    passwordHash: await bcrypt.hash(SCALE_OWNER_PASSWORD, 10),
    // The benchmark signs in as this owner: an address no one confirms would be refused at sign-in.
    emailConfirmedAt: new Date(),
  });
  await Membership.create({ organisationId: organisation.id, userId: owner.id, role: 'owner' });
  return { organisationId: organisation.id, ownerEmail, ownerPassword: SCALE_OWNER_PASSWORD };
}

/** The organisation an earlier run made (the newest), its owner and how many rows it has. */
export async function findScaleOrganisation(
  sequelize: Sequelize,
): Promise<(ScaleOrganisation & { size: ScaleSize }) | null> {
  const [row] = await sequelize.query<{ id: number; email: string }>(
    `SELECT o.id, u.email FROM organisations o
       JOIN memberships m ON m.organisation_id = o.id AND m.role = 'owner'
       JOIN users u ON u.id = m.user_id AND u.email LIKE 'scale.owner.%'
      ORDER BY o.id DESC LIMIT 1`,
    { type: QueryTypes.SELECT },
  );
  if (!row) return null;
  const size = await countScaleRows(sequelize, Number(row.id));
  return {
    organisationId: Number(row.id),
    ownerEmail: row.email,
    ownerPassword: SCALE_OWNER_PASSWORD,
    size: {
      enclosures: size.enclosures,
      lamps: size.lamps,
      readings: size.readings,
      designs: size.designs,
    },
  };
}

/** How many rows of each kind the organisation holds: its size, and what it was made with. */
export async function countScaleRows(sequelize: Sequelize, organisationId: number) {
  const [row] = await sequelize.query<Record<ScaleRowKind, number | string>>(
    `SELECT (SELECT COUNT(*) FROM enclosures WHERE organisation_id = :org) AS enclosures,
            (SELECT COUNT(*) FROM lamps l JOIN enclosures e ON e.id = l.enclosure_id
              WHERE e.organisation_id = :org) AS lamps,
            (SELECT COUNT(*) FROM readings r JOIN lamps l ON l.id = r.lamp_id
               JOIN enclosures e ON e.id = l.enclosure_id WHERE e.organisation_id = :org) AS readings,
            (SELECT COUNT(*) FROM designs d JOIN enclosures e ON e.id = d.enclosure_id
              WHERE e.organisation_id = :org) AS designs,
            (SELECT COUNT(*) FROM variants v JOIN designs d ON d.id = v.design_id
               JOIN enclosures e ON e.id = d.enclosure_id WHERE e.organisation_id = :org) AS variants,
            (SELECT COUNT(*) FROM memberships WHERE organisation_id = :org AND role = 'keeper') AS keepers,
            (SELECT COUNT(*) FROM lamp_outlooks WHERE organisation_id = :org) AS outlooks`,
    { replacements: { org: organisationId }, type: QueryTypes.SELECT },
  );
  return Object.fromEntries(Object.entries(row!).map(([k, v]) => [k, Number(v)])) as Record<
    ScaleRowKind,
    number
  >;
}
type ScaleRowKind = keyof ScaleSize | 'variants' | 'keepers' | 'outlooks';

function designWithLamps(
  size: { widthCm: number; heightCm: number; depthCm: number },
  improved: boolean,
): Design {
  const base = defaultDesignFor(size);
  const w = base.enclosure.width;
  const h = base.enclosure.height;
  const lamps = [
    {
      type: 'lamp',
      id: 'uv1',
      name: 'UV tube',
      tech: 't5',
      form: 'tube',
      x: w * 0.4,
      y: h + 2,
      length: Math.min(55, w * 0.6),
      uvbAt30: 60,
    },
    ...(improved
      ? [
          {
            type: 'lamp',
            id: 'heat1',
            name: 'Basking lamp',
            tech: 'halogen',
            form: 'bulb',
            x: w * 0.4,
            y: h + 2,
            uvbAt30: 0,
            watts: 75,
          },
        ]
      : []),
  ];
  return { ...base, objects: [...base.objects, ...lamps] } as Design;
}

/**
 * Adds `size` more rows to the organisation: keepers, enclosures, lamps, readings, designs with
 * variants; then computes the new lamps' outlooks. `offset` numbers the new rows after earlier ones
 * (growing an organisation from 1× to 4× adds 3× with offset 1×).
 */
export async function addToOrganisation(
  sequelize: Sequelize,
  org: ScaleOrganisation,
  size: ScaleSize,
  { offset = 0, seed = 1 }: { offset?: number; seed?: number } = {},
): Promise<AddedRows> {
  const t0 = performance.now();
  const rand = random(seed + offset * 7919);
  const today = todayIso();
  const now = new Date();
  const organisationId = org.organisationId;

  // Keepers: no one signs in as them, so one throw-away hash for all.
  const keeperCount = Math.max(1, Math.ceil(size.enclosures / ENCLOSURES_PER_KEEPER));
  const keeperHash = await bcrypt.hash(`example-keeper-${organisationId}-not-for-sign-in`, 4);
  const emailPrefix = `scale.keeper.${organisationId}.`;
  await insertRows(
    sequelize,
    'users',
    ['email', 'name', 'password_hash', 'created_at', 'updated_at'],
    Array.from({ length: keeperCount }, (_, k) => [
      `${emailPrefix}${offset + k + 1}@example.com`,
      `Example keeper ${offset + k + 1}`,
      keeperHash,
      now,
      now,
    ]),
  );
  const keeperIds = await idsAfter(
    sequelize,
    `SELECT u.id FROM users u LEFT JOIN memberships m ON m.user_id = u.id AND m.organisation_id = :org
      WHERE u.email LIKE :prefix AND m.id IS NULL ORDER BY u.id`,
    { org: organisationId, prefix: `${emailPrefix}%` },
  );
  await insertRows(
    sequelize,
    'memberships',
    ['organisation_id', 'user_id', 'role', 'created_at', 'updated_at'],
    keeperIds.map((id) => [organisationId, id, 'keeper', now, now]),
  );

  // Enclosures, each with a species the starting catalogue has a sheet for (so outlooks check a need).
  const species = (await SpeciesSheet.findAll({ where: { organisationId }, order: [['id', 'ASC']] })).map(
    (s) => s.commonName,
  );
  const enclosuresBefore = await maxId(sequelize, 'enclosures');
  const sizes = [
    [60, 45, 45],
    [90, 45, 45],
    [120, 60, 60],
    [180, 60, 60],
  ] as const;
  const enclosureSize: { widthCm: number; heightCm: number; depthCm: number }[] = [];
  await insertRows(
    sequelize,
    'enclosures',
    [
      'organisation_id',
      'keeper_id',
      'name',
      'width_cm',
      'height_cm',
      'depth_cm',
      'species_name',
      'animal_name',
      'notes',
      'created_at',
      'updated_at',
    ],
    Array.from({ length: size.enclosures }, (_, i) => {
      const n = offset + i + 1;
      const [w, h, d] = sizes[n % sizes.length]!;
      enclosureSize.push({ widthCm: w, heightCm: h, depthCm: d });
      const updated = new Date(now.getTime() - Math.floor(rand() * 365 * 86_400_000));
      return [
        organisationId,
        keeperIds[i % keeperIds.length]!,
        `${ROOMS[n % ROOMS.length]} ${Math.ceil(n / 40)} tub ${n}`,
        w,
        h,
        d,
        species[n % species.length] ?? null,
        n % 3 === 0 ? `Example animal ${n}` : null,
        'Example data for the scale benchmark.',
        updated,
        updated,
      ];
    }),
  );
  const enclosureIds = await idsAfter(
    sequelize,
    'SELECT id FROM enclosures WHERE organisation_id = :org AND id > :after ORDER BY id',
    { org: organisationId, after: enclosuresBefore },
  );

  // Lamps: every fourth a heat lamp, the rest UV; started up to two years ago; a few retired.
  const types = await LampType.findAll({ where: { organisationId }, order: [['id', 'ASC']] });
  const uvTypes = types.filter((t) => UV_TECHS.includes(t.tech));
  const heatTypes = types.filter((t) => HEAT_TECHS.includes(t.tech));
  const lampsBefore = await maxId(sequelize, 'lamps');
  const perEnclosure = shares(size.lamps, enclosureIds.length);
  const lampRows: unknown[][] = [];
  const lampPlan: { uv: boolean; startDay: number; typeIndex: number; seed: number }[] = [];
  perEnclosure.forEach((count, e) => {
    for (let k = 0; k < count; k++) {
      const n = offset + e + 1;
      const uv = k % 4 !== 3 || heatTypes.length === 0;
      // A UV lamp follows one of a bounded set of histories of its enclosure's species (see lampHistory).
      const h = uv
        ? lampHistory(
            n % Math.max(1, species.length),
            Math.floor(rand() * HISTORIES_PER_SPECIES),
            uvTypes.length,
          )
        : {
            typeIndex: Math.floor(rand() * heatTypes.length),
            ageDays: Math.floor(rand() * 730),
            retiredDaysAgo: rand() < 0.02 ? Math.floor(rand() * 60) : null,
            hoursPerDay: [10, 12, 14][n % 3]!,
            baskingCm: null,
            seed: 0,
          };
      const list = uv ? uvTypes : heatTypes;
      lampPlan.push({ uv, startDay: -h.ageDays, typeIndex: h.typeIndex, seed: h.seed });
      lampRows.push([
        enclosureIds[e]!,
        list[h.typeIndex]!.id,
        uv ? `UV lamp ${n}.${k + 1}` : `Heat lamp ${n}.${k + 1}`,
        // The first UV lamp of a designed enclosure is the design's tube (see the designs below).
        k === 0 ? 'uv1' : null,
        addDays(today, -h.ageDays),
        h.hoursPerDay,
        h.baskingCm,
        h.retiredDaysAgo === null ? null : addDays(today, -Math.min(h.retiredDaysAgo, h.ageDays)),
        now,
        now,
      ]);
    }
  });
  await insertRows(
    sequelize,
    'lamps',
    [
      'enclosure_id',
      'lamp_type_id',
      'label',
      'design_object_id',
      'first_used_on',
      'hours_per_day',
      'basking_distance_cm',
      'retired_on',
      'created_at',
      'updated_at',
    ],
    lampRows,
  );
  const lampIds = await idsAfter(
    sequelize,
    `SELECT l.id FROM lamps l JOIN enclosures e ON e.id = l.enclosure_id
      WHERE e.organisation_id = :org AND l.id > :after ORDER BY l.id`,
    { org: organisationId, after: lampsBefore },
  );

  // Readings on the UV lamps only, spread over each lamp's life, declining as a lamp does.
  const uvLamps = lampIds.map((id, i) => ({ id, ...lampPlan[i]! })).filter((l) => l.uv);
  const perLamp = shares(uvLamps.length ? size.readings : 0, uvLamps.length);
  const readingRows: unknown[][] = [];
  uvLamps.forEach((lamp, i) => {
    const type = uvTypes[lamp.typeIndex]!;
    const halfLifeDays = (type.halfLifeMonths ?? 12) * 30.4;
    const count = perLamp[i]!;
    // The same history and count give the same readings: the meter's scatter is part of the history.
    const rand = random(lamp.seed * 131 + count);
    for (let r = 0; r < count; r++) {
      const day = Math.round(lamp.startDay + ((r + 0.5) / count) * -lamp.startDay);
      const age = day - lamp.startDay;
      const value = type.uvbAt30 * (0.55 + 0.45 * 0.5 ** (age / halfLifeDays)) * (0.94 + 0.12 * rand());
      const takenAt = new Date(`${addDays(today, Math.min(0, day))}T10:00:00Z`);
      readingRows.push([
        lamp.id,
        takenAt,
        30,
        Math.round(value * 10) / 10,
        'uvb',
        'Example meter',
        takenAt,
        takenAt,
      ]);
    }
  });
  await insertRows(
    sequelize,
    'readings',
    ['lamp_id', 'taken_at', 'distance_cm', 'value', 'unit', 'meter', 'created_at', 'updated_at'],
    readingRows,
  );

  // Designs, each with a current set-up and an improved variant, on evenly spread enclosures.
  const designsBefore = await maxId(sequelize, 'designs');
  const designCount = Math.min(size.designs, enclosureIds.length);
  const designed = Array.from({ length: designCount }, (_, i) =>
    Math.floor((i * enclosureIds.length) / Math.max(1, designCount)),
  );
  await insertRows(
    sequelize,
    'designs',
    ['enclosure_id', 'name', 'created_at', 'updated_at'],
    designed.map((e) => [enclosureIds[e]!, `Example design ${offset + e + 1}`, now, now]),
  );
  const designRows = await sequelize.query<{ id: number; enclosureId: number }>(
    `SELECT d.id, d.enclosure_id AS enclosureId FROM designs d JOIN enclosures e ON e.id = d.enclosure_id
      WHERE e.organisation_id = :org AND d.id > :after ORDER BY d.id`,
    { replacements: { org: organisationId, after: designsBefore }, type: QueryTypes.SELECT },
  );
  const sizeOf = new Map(enclosureIds.map((id, i) => [id, enclosureSize[i]!]));
  await insertRows(
    sequelize,
    'variants',
    ['design_id', 'name', 'design_json', 'version', 'created_at', 'updated_at'],
    designRows.flatMap((d) =>
      Array.from({ length: VARIANTS_PER_DESIGN }, (_, v) => [
        d.id,
        v === 0 ? 'Current set-up' : 'Improved',
        JSON.stringify(designWithLamps(sizeOf.get(Number(d.enclosureId))!, v > 0)),
        1,
        now,
        now,
      ]),
    ),
  );
  const rowsSeconds = (performance.now() - t0) / 1000;

  // The outlooks, by the app's own computation once per distinct lamp history (scale-outlooks.ts).
  const t1 = performance.now();
  const { stored: outlooks, computed } = await seedOutlooks(lampIds, today);
  return {
    enclosures: enclosureIds.length,
    lamps: lampIds.length,
    readings: readingRows.length,
    designs: designRows.length,
    variants: designRows.length * VARIANTS_PER_DESIGN,
    keepers: keeperIds.length,
    outlooks,
    computedOutlooks: computed,
    seconds: { rows: rowsSeconds, outlooks: (performance.now() - t1) / 1000 },
  };
}
