// The registry of object kinds: one record a kind, found by type. The engine's schema
// (simulation/model/schema.ts) says which kinds exist; the mapped type below makes a missing or
// misnamed record a type error, and the list of kinds everywhere else is read from here.
import type { DesignObject } from '@/simulation';
import { foliage } from './foliage';
import { glass } from './glass';
import { hide } from './hide';
import { lamp } from './lamp';
import { ledge } from './ledge';
import { perch } from './perch';
import { screen } from './screen';
import type { ObjectKind, ObjectType } from './types';
import type { BoxObject } from './box';
import type { SegmentObject } from './segment';

export type * from './types';
export { hexRgb } from './types';
export type { BoxObject, SegmentObject };

/** In the order of the palette and the keyboard tools. */
export const OBJECT_KINDS: { readonly [K in ObjectType]: ObjectKind<K> } = {
  lamp,
  screen,
  glass,
  perch,
  ledge,
  hide,
  foliage,
};

export const OBJECT_TYPES = Object.keys(OBJECT_KINDS) as readonly ObjectType[];

export function isObjectType(t: string): t is ObjectType {
  return Object.hasOwn(OBJECT_KINDS, t);
}

/**
 * The record of a kind, found by type. Its functions take any design object (the records' methods
 * accept their own kind's objects; call them with an object of the type you looked up).
 */
export function kindOf(type: ObjectType): ObjectKind<ObjectType> {
  return OBJECT_KINDS[type] as unknown as ObjectKind<ObjectType>;
}

export function isSegment(o: DesignObject): o is SegmentObject {
  return OBJECT_KINDS[o.type].form === 'segment';
}

export function isBox(o: DesignObject): o is BoxObject {
  return OBJECT_KINDS[o.type].form === 'box';
}
