import type { EnclosureJson, EnclosureRowJson } from '@/lib/enclosures/queries';

/** What the enclosure screens read of the API's enclosure (plain data, safe to pass to client components). */
export type EnclosureView = Pick<
  EnclosureJson,
  | 'id'
  | 'name'
  | 'keeperId'
  | 'keeperName'
  | 'widthCm'
  | 'heightCm'
  | 'depthCm'
  | 'speciesName'
  | 'animalName'
  | 'notes'
  | 'updatedAt'
>;

/** A row of the enclosures table: what the list shows of an enclosure. */
export type EnclosureRow = EnclosureRowJson;

export type PersonOption = { id: number; name: string; role: string };
