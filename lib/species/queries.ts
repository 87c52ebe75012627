import 'server-only';
import { Op } from 'sequelize';
import { SpeciesSheet } from '@/models';
import { sourceSchema, type SpeciesSheetDto, type SpeciesSource } from './schema';

/** Reads of species sheets. Callers check permissions first (lib/permissions.ts). */

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
