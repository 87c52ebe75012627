import 'server-only';
import type { Transaction } from 'sequelize';
import { SpeciesSheet } from '@/models';
import { toDto } from './queries';
import { speciesInputSchema, type SpeciesInput, type SpeciesPatch } from './schema';

/** Writes of species sheets. Callers check permissions first (lib/permissions.ts). */

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

/** Enclosures name their species in text, so removing a sheet leaves them (and their designs) intact. */
export async function deleteSheet(row: SpeciesSheet): Promise<void> {
  await row.destroy();
}
