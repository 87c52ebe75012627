import 'server-only';
import { ForeignKeyConstraintError, UniqueConstraintError, type Transaction } from 'sequelize';
import { conflict } from '@/lib/errors';
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
  return sameNameIsConflict(() =>
    LampType.create(
      {
        organisationId,
        ...toColumns(input),
        presetKey: opts.presetKey ?? null,
        createdById: userId,
        updatedById: userId,
      },
      { transaction: opts.transaction },
    ),
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
  await sameNameIsConflict(() => row.update({ ...toColumns(merged), updatedById: userId }));
  return row;
}

/** Refused (a conflict, `in_use`) while lamps in the lamp log use this type: their history depends on it. */
export async function deleteLampType(row: LampType): Promise<void> {
  try {
    await row.destroy();
  } catch (e) {
    if (e instanceof ForeignKeyConstraintError) {
      throw conflict('Lamps in the lamp log use this lamp type, so it cannot be removed.', 'in_use');
    }
    throw e;
  }
}

/** Names are unique within an organisation: a second entry of one name is a conflict the person can fix. */
async function sameNameIsConflict<T>(write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (e) {
    if (e instanceof UniqueConstraintError) throw conflict('Another lamp type already has that name.');
    throw e;
  }
}
