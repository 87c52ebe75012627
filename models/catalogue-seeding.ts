import { date, ref, table } from './columns';

/**
 * Marks that an organisation received the starting species sheets and lamp types, so entries it deleted
 * on purpose are not brought back by lazy seeding.
 */
export class CatalogueSeeding extends table(
  'catalogue_seedings',
  { organisationId: ref().primaryKey(), seededAt: date() },
  { timestamps: false },
) {}
