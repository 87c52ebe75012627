// The registry of the studio's half of each object kind (types.ts), typed by the engine's list of
// kinds like shared/object-kinds, so a kind without its canvas shape or inspector form does not compile.
import type { ObjectType } from '@/shared/object-kinds';
import { foliage } from './foliage';
import { glass } from './glass';
import { hide } from './hide';
import { lamp } from './lamp';
import { ledge } from './ledge';
import { perch } from './perch';
import { screen } from './screen';
import type { StudioKind } from './types';

export type { StudioKind };

type Registry = { readonly [K in ObjectType]: StudioKind<K> };

export const STUDIO_KINDS: Registry = { lamp, screen, glass, perch, ledge, hide, foliage };

/**
 * The studio record of a kind, found by type. Its members take any design object: call them with an
 * object of the type you looked up.
 */
export function studioKindOf(type: ObjectType): StudioKind<ObjectType> {
  return STUDIO_KINDS[type] as unknown as StudioKind<ObjectType>;
}
