import 'server-only';
import type { Transaction } from 'sequelize';
import { LampType } from '@/models';
import { toDto } from './queries';
import { lampTypeInputSchema, type LampTypeInput, type LampTypePatch } from './schema';

/** Writes of the lamp catalogue. Callers check permissions first (lib/permissions.ts). */

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
