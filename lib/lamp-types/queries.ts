import 'server-only';
import { Op } from 'sequelize';
import { z } from 'zod';
import { LampType } from '@/models';
import { LAMP_TYPE_FIELDS, type LampTypeDto } from './schema';

/** Reads of the lamp catalogue. Callers check permissions first (lib/permissions.ts). */

const storedSources = z.partialRecord(z.enum(LAMP_TYPE_FIELDS), z.string());
const storedDecay = z.object({ points: z.array(z.tuple([z.number(), z.number()])) });
const storedAdoption = z.object({
  points: z.array(z.tuple([z.number(), z.number()])).min(1),
  lamps: z.number(),
  readings: z.number(),
  adoptedAt: z.string(),
});

function parseJson<T>(json: string | null, schema: z.ZodType<T>, fallback: T): T {
  if (!json) return fallback;
  try {
    const r = schema.safeParse(JSON.parse(json));
    return r.success ? r.data : fallback;
  } catch {
    return fallback;
  }
}

export function toDto(row: LampType): LampTypeDto {
  return {
    id: row.id,
    organisationId: row.organisationId,
    name: row.name,
    tech: row.tech,
    form: row.form,
    lengthCm: row.lengthCm,
    uvbAt30: row.uvbAt30,
    uviPerUvb: row.uviPerUvb,
    radiantFraction: row.radiantFraction,
    beamDeg: row.beamDeg,
    reflectorGain: row.reflectorGain,
    watts: row.watts,
    halfLifeMonths: row.halfLifeMonths,
    decayPoints:
      parseJson(row.decayJson, storedDecay, null as null | { points: [number, number][] })?.points ?? null,
    replaceAfterMonths: row.replaceAfterMonths,
    notes: row.notes,
    sources: parseJson(row.sourcesJson, storedSources, {}),
    presetKey: row.presetKey,
    adoptedCurve: parseJson(row.adoptedCurveJson ?? null, storedAdoption, null),
    updatedAt: row.updatedAt.toISOString(),
  };
}

export async function listLampTypes(
  organisationId: number,
  opts: { cursor?: number; limit: number; tech?: string },
): Promise<LampType[]> {
  const where: Record<string, unknown> = { organisationId };
  if (opts.cursor) where.id = { [Op.gt]: opts.cursor };
  if (opts.tech) where.tech = opts.tech;
  return LampType.findAll({ where, order: [['id', 'ASC']], limit: opts.limit + 1 });
}

/** The whole catalogue of an organisation (for pickers and the guided start). */
export async function allLampTypes(organisationId: number): Promise<LampTypeDto[]> {
  const rows = await LampType.findAll({ where: { organisationId }, order: [['id', 'ASC']], limit: 1000 });
  return rows.map(toDto);
}

/** The organisation's types whose measured curve was adopted, for the design studio's catalogue choice. */
export async function adoptedLampTypes(organisationId: number): Promise<LampTypeDto[]> {
  const rows = await LampType.findAll({
    where: { organisationId, adoptedCurveJson: { [Op.ne]: null } },
    order: [['id', 'ASC']],
    limit: 1000,
  });
  return rows.map(toDto);
}

export async function findLampType(id: number): Promise<LampType | null> {
  return LampType.findByPk(id);
}
