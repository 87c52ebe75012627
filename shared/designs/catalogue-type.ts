import type { LampObject } from '@/simulation';

/**
 * A type of the organisation's lamp catalogue whose shop-measured decay curve was adopted, as the studio
 * offers it: `lamp` is the type's lamp object (lib/lamp-types/to-engine.ts) with the adopted curve as its
 * decay table, so a lamp made from it ages in the preview as the shop's own lamps of this type do.
 */
export type StudioCatalogueType = {
  id: string;
  name: string;
  /** How many of the shop's lamps the adopted curve was measured on. */
  lamps: number;
  lamp: LampObject;
};
