// Studio-side names for the engine's design types, imported in one place so the studio follows
// the engine's schema (the single source of truth) without repeating it.
export type {
  Backdrop,
  Design,
  DesignObject,
  Enclosure,
  FoliageObject,
  GlassObject,
  HideObject,
  LampObject,
  LedgeObject,
  PerchObject,
  ProbePoint,
  ScreenObject,
} from '@/simulation';
export type { SpeciesSheet } from '@/simulation';

import type { SpeciesSheet } from '@/simulation';

export type { BoxObject, ObjectType, SegmentObject } from '@/shared/object-kinds';
export { isBox, isSegment, OBJECT_TYPES } from '@/shared/object-kinds';

/** A species sheet as the studio receives it: the engine's sheet plus the organisation's id for it. */
export type StudioSpecies = SpeciesSheet & { id: string };

export type { StudioCatalogueType } from '@/shared/designs/catalogue-type';
