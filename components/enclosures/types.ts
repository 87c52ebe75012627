import type { EnclosureJson } from '@/lib/enclosures/queries';

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

export type PersonOption = { id: number; name: string; role: string };
