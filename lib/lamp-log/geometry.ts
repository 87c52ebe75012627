import { pointIrradiance, tubeBelowCentre } from '@/simulation';
import { bareShare, type ReadingSetup } from '@/shared/reading-setup';

/**
 * Readings are taken straight below a lamp at whatever distance the meter fitted; to compare them over
 * time they are brought to one distance with the engine's own geometry (the same formulas the fields
 * use), so a reading and the studio agree about what "30 cm" means.
 */
export const REFERENCE_CM = 30;

export type LampShape = { form: 'tube' | 'bulb'; lengthCm: number | null };

/** On-axis irradiance per unit intensity at distance d below the lamp (engine formulas). */
function onAxis(shape: LampShape, d: number): number {
  if (shape.form === 'tube' && shape.lengthCm && shape.lengthCm > 0)
    return tubeBelowCentre(shape.lengthCm, d);
  return pointIrradiance(1, d, 0);
}

/** Factor that turns a reading at `fromCm` into the reading the same lamp would give at `toCm`. */
export function distanceFactor(shape: LampShape, fromCm: number, toCm: number): number {
  if (!(fromCm > 0) || !(toCm > 0)) throw new RangeError('distances must be positive');
  return onAxis(shape, toCm) / onAxis(shape, fromCm);
}

/** A reading at `distanceCm`, expressed at the reference distance of 30 cm. */
export function toReference(shape: LampShape, value: number, distanceCm: number): number {
  return value * distanceFactor(shape, distanceCm, REFERENCE_CM);
}

export type ReadingForReference = { value: number; distanceCm: number } & Partial<ReadingSetup>;

export type Referenced =
  { ok: true; value: number; transmission: number; assumedBare: boolean } | { ok: false; reason: string };

/**
 * A reading as the bare lamp would read at 30 cm: divided by the share of UVB passing whatever lay
 * between lamp and meter, then brought to 30 cm. The one place readings are referenced: the outlook,
 * the fit, the chart and calibration all go through it, so a lid is taken out exactly once (and the
 * basking estimate puts it back exactly once). A reading without its set-up is read as a bare lamp.
 */
export function toBareReference(shape: LampShape, r: ReadingForReference): Referenced {
  const share = bareShare({
    through: r.through ?? 'not-recorded',
    throughTransmission: r.throughTransmission ?? null,
    warmedUp: r.warmedUp ?? 'not-recorded',
  });
  if (!share.ok) return share;
  return {
    ok: true,
    value: toReference(shape, r.value / share.transmission, r.distanceCm),
    transmission: share.transmission,
    assumedBare: share.assumedBare,
  };
}
