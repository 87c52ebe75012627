import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { SpeciesSheet } from '@/models';
import {
  sourceSchema,
  speciesInputSchema,
  type SpeciesInput,
  type SpeciesPatch,
  type SpeciesSheetDto,
  type SpeciesSource,
} from './schema';

/** Database access for species sheets. Callers check permissions first (lib/permissions.ts). */

function parseSources(json: string): SpeciesSource[] {
  try {
    const raw: unknown = JSON.parse(json);
    if (!Array.isArray(raw)) return [];
    return raw.flatMap((s) => {
      const r = sourceSchema.safeParse(s);
      return r.success ? [r.data] : [];
    });
  } catch {
    return [];
  }
}

const pair = (min: number | null, max: number | null) => (min === null || max === null ? null : { min, max });

export function toDto(row: SpeciesSheet): SpeciesSheetDto {
  return {
    id: row.id,
    organisationId: row.organisationId,
    commonName: row.commonName,
    scientificName: row.scientificName,
    uvZone: row.uvZone,
    uvbTargetUw: pair(row.uvbTargetMinUw, row.uvbTargetMaxUw),
    baskingSurfaceC: { min: row.baskingSurfaceMinC, max: row.baskingSurfaceMaxC },
    warmAirC: { min: row.warmAirMinC, max: row.warmAirMaxC },
    coolAirC: { min: row.coolAirMinC, max: row.coolAirMaxC },
    nightMinC: row.nightMinC,
    photoperiodH: pair(row.photoperiodMinH, row.photoperiodMaxH),
    adultLengthCm: row.adultLengthCm,
    climbs: row.climbs,
    lowMelanin: row.lowMelanin,
    notes: row.notes,
    sources: parseSources(row.sourcesJson),
    seedKey: row.seedKey,
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** Column values for a whole sheet. */
export function toColumns(s: SpeciesInput) {
  return {
    commonName: s.commonName,
    scientificName: s.scientificName,
    uvZone: s.uvZone,
    uvbTargetMinUw: s.uvbTargetUw?.min ?? null,
    uvbTargetMaxUw: s.uvbTargetUw?.max ?? null,
    baskingSurfaceMinC: s.baskingSurfaceC.min,
    baskingSurfaceMaxC: s.baskingSurfaceC.max,
    warmAirMinC: s.warmAirC.min,
    warmAirMaxC: s.warmAirC.max,
    coolAirMinC: s.coolAirC.min,
    coolAirMaxC: s.coolAirC.max,
    nightMinC: s.nightMinC,
    photoperiodMinH: s.photoperiodH?.min ?? null,
    photoperiodMaxH: s.photoperiodH?.max ?? null,
    adultLengthCm: s.adultLengthCm,
    climbs: s.climbs,
    lowMelanin: s.lowMelanin,
    notes: s.notes,
    sourcesJson: JSON.stringify(s.sources),
  };
}

export async function listSheets(
  organisationId: number,
  opts: { cursor?: number; limit: number; q?: string },
): Promise<SpeciesSheet[]> {
  const where: Record<string | symbol, unknown> = { organisationId };
  if (opts.cursor) where.id = { [Op.gt]: opts.cursor };
  if (opts.q) {
    const like = `%${opts.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    where[Op.or] = [{ commonName: { [Op.like]: like } }, { scientificName: { [Op.like]: like } }];
  }
  return SpeciesSheet.findAll({ where, order: [['id', 'ASC']], limit: opts.limit + 1 });
}

/** Every sheet of an organisation, by common name (for pickers; a few dozen rows at most in practice). */
export async function allSheets(organisationId: number): Promise<SpeciesSheetDto[]> {
  const rows = await SpeciesSheet.findAll({
    where: { organisationId },
    order: [
      ['commonName', 'ASC'],
      ['id', 'ASC'],
    ],
    limit: 1000,
  });
  return rows.map(toDto);
}

export async function findSheet(id: number): Promise<SpeciesSheet | null> {
  return SpeciesSheet.findByPk(id);
}

export async function createSheet(
  organisationId: number,
  input: SpeciesInput,
  userId: number | null,
  opts: { seedKey?: string; transaction?: Transaction } = {},
): Promise<SpeciesSheet> {
  return SpeciesSheet.create(
    {
      organisationId,
      ...toColumns(input),
      seedKey: opts.seedKey ?? null,
      createdById: userId,
      updatedById: userId,
    },
    { transaction: opts.transaction },
  );
}

/**
 * Applies a partial change; the merged sheet is validated as a whole, so a patch cannot leave it
 * inconsistent (e.g. a cool side warmer than the warm side). Throws the ZodError for the route to turn
 * into a 400.
 */
export async function updateSheet(
  row: SpeciesSheet,
  patch: SpeciesPatch,
  userId: number,
): Promise<SpeciesSheet> {
  const current = toDto(row);
  const merged = speciesInputSchema.parse({
    commonName: patch.commonName ?? current.commonName,
    scientificName: patch.scientificName ?? current.scientificName,
    uvZone: patch.uvZone ?? current.uvZone,
    uvbTargetUw: patch.uvbTargetUw !== undefined ? patch.uvbTargetUw : current.uvbTargetUw,
    baskingSurfaceC: patch.baskingSurfaceC ?? current.baskingSurfaceC,
    warmAirC: patch.warmAirC ?? current.warmAirC,
    coolAirC: patch.coolAirC ?? current.coolAirC,
    nightMinC: patch.nightMinC !== undefined ? patch.nightMinC : current.nightMinC,
    photoperiodH: patch.photoperiodH !== undefined ? patch.photoperiodH : current.photoperiodH,
    adultLengthCm: patch.adultLengthCm !== undefined ? patch.adultLengthCm : current.adultLengthCm,
    climbs: patch.climbs ?? current.climbs,
    lowMelanin: patch.lowMelanin ?? current.lowMelanin,
    notes: patch.notes !== undefined ? patch.notes : current.notes,
    sources: patch.sources ?? current.sources,
  });
  await row.update({ ...toColumns(merged), updatedById: userId });
  return row;
}
