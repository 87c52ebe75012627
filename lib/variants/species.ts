import { allSheets } from '@/lib/species/queries';
import { toEngineSheet } from '@/lib/species/to-engine';
import type { SpeciesSheet } from '@/simulation';

export type SpeciesOption = { id: number; name: string; scientificName: string; sheet: SpeciesSheet };

/**
 * The organisation's species sheets, ready for the engine's assessment. A read: the starting sheets were
 * added when the organisation was created (lib/species/seed.ts), so the public share page writes nothing.
 */
export async function speciesOptions(organisationId: number): Promise<SpeciesOption[]> {
  const sheets = await allSheets(organisationId);
  return sheets.map((s) => ({
    id: s.id,
    name: s.commonName,
    scientificName: s.scientificName,
    sheet: toEngineSheet(s),
  }));
}

/**
 * The species attached to an enclosure: its species name matched (ignoring case) to one of the
 * organisation's sheets by common or scientific name. None when the enclosure names no species or
 * the organisation has no sheet for it.
 */
export function attachedSpecies(
  options: SpeciesOption[],
  speciesName: string | null | undefined,
): SpeciesOption | null {
  const wanted = speciesName?.trim().toLowerCase();
  if (!wanted) return null;
  return (
    options.find((o) => o.name.toLowerCase() === wanted || o.scientificName.toLowerCase() === wanted) ?? null
  );
}
