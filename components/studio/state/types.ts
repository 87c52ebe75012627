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

import type { DesignObject, SpeciesSheet } from '@/simulation';

export type ObjectType = DesignObject['type'];
export type SegmentObject = Extract<DesignObject, { type: 'screen' | 'glass' | 'perch' }>;
export type BoxObject = Extract<DesignObject, { type: 'ledge' | 'hide' | 'foliage' }>;

/** A species sheet as the studio receives it: the engine's sheet plus the organisation's id for it. */
export type StudioSpecies = SpeciesSheet & { id: string };

export const OBJECT_TYPES: readonly ObjectType[] = [
  'lamp',
  'screen',
  'glass',
  'perch',
  'ledge',
  'hide',
  'foliage',
];

export function isSegment(o: DesignObject): o is SegmentObject {
  return o.type === 'screen' || o.type === 'glass' || o.type === 'perch';
}

export function isBox(o: DesignObject): o is BoxObject {
  return o.type === 'ledge' || o.type === 'hide' || o.type === 'foliage';
}
