import { double, id, ref, string, table, text, timestamps } from './columns';

/** A real enclosure of a keeper (a customer of the organisation, or the organisation's own animal). */
export class Enclosure extends table('enclosures', {
  id: id(),
  organisationId: ref(),
  keeperId: ref(),
  name: string(120),
  widthCm: double(),
  heightCm: double(),
  depthCm: double(),
  speciesName: string(160).nullable(),
  animalName: string(120).nullable(),
  notes: text().nullable(),
  ...timestamps(),
}) {}
