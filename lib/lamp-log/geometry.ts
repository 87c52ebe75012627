import { pointIrradiance, tubeBelowCentre } from '@/simulation';

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
