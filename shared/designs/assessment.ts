import { assess, type Assessment, type Design, type SpeciesSheet } from '@/simulation';

/** The engine's species check of a design at a lamp age `months` from now. */
export function assessFor(design: Design, species: SpeciesSheet, months = 0): Assessment {
  return assess(design, species, { addMonths: months });
}
