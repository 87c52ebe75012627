import { assess, type Assessment, type Design, type SpeciesSheet } from '@/simulation';

/**
 * The engine's species check of a design at a lamp age `months` from now; without a sheet, the safety
 * checks with general limits (lamps in reach, UV near the eyes, surfaces too hot to touch).
 */
export function assessFor(design: Design, species: SpeciesSheet | null, months = 0): Assessment {
  return assess(design, species ?? undefined, { addMonths: months });
}
