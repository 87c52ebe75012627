import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { z } from 'zod';
import { LampType } from '@/models';
import {
  LAMP_TYPE_FIELDS,
  lampTypeInputSchema,
  type LampTypeDto,
  type LampTypeInput,
  type LampTypePatch,
} from './schema';

/** Database access for the lamp catalogue. Callers check permissions first (lib/permissions.ts). */

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

export function toColumns(v: LampTypeInput) {
  return {
    name: v.name,
    tech: v.tech,
    form: v.form,
    lengthCm: v.form === 'tube' ? v.lengthCm : null,
    uvbAt30: v.uvbAt30,
    uviPerUvb: v.uviPerUvb,
    radiantFraction: v.radiantFraction,
    beamDeg: v.beamDeg,
    reflectorGain: v.reflectorGain,
    watts: v.watts,
    halfLifeMonths: v.halfLifeMonths,
    decayJson: v.decayPoints ? JSON.stringify({ points: v.decayPoints }) : null,
    replaceAfterMonths: v.replaceAfterMonths,
    notes: v.notes,
    sourcesJson: JSON.stringify(v.sources),
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

export async function findLampType(id: number): Promise<LampType | null> {
  return LampType.findByPk(id);
}

export async function createLampType(
  organisationId: number,
  input: LampTypeInput,
  userId: number | null,
  opts: { presetKey?: string; transaction?: Transaction } = {},
): Promise<LampType> {
  return LampType.create(
    {
      organisationId,
      ...toColumns(input),
      presetKey: opts.presetKey ?? null,
      createdById: userId,
      updatedById: userId,
    },
    { transaction: opts.transaction },
  );
}

/** Applies a partial change, validating the merged entry as a whole (e.g. a tube keeps a length). */
export async function updateLampType(row: LampType, patch: LampTypePatch, userId: number): Promise<LampType> {
  const current = toDto(row);
  const merged = lampTypeInputSchema.parse({
    name: current.name,
    tech: current.tech,
    form: current.form,
    lengthCm: current.lengthCm,
    uvbAt30: current.uvbAt30,
    uviPerUvb: current.uviPerUvb,
    radiantFraction: current.radiantFraction,
    beamDeg: current.beamDeg,
    reflectorGain: current.reflectorGain,
    watts: current.watts,
    halfLifeMonths: current.halfLifeMonths,
    decayPoints: current.decayPoints,
    replaceAfterMonths: current.replaceAfterMonths,
    notes: current.notes,
    sources: current.sources,
    ...patch,
  });
  await row.update({ ...toColumns(merged), updatedById: userId });
  return row;
}
