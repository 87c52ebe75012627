/**
 * The studio's first field of a design (shared/designs/studio-field.ts), remembered by the design's
 * content on the engine thread that computed it: reopening a design, or many people opening the scratch
 * studio's example, costs nothing. Runs only on engine threads (lib/engine-pool/tasks.ts).
 */
import 'server-only';
import { createHash } from 'node:crypto';
import type { Design, FieldName } from '@/simulation';
import { studioFirstField, type StudioFirstField } from '@/shared/designs/studio-field';
import { Lru } from './lru';

const KEY = Symbol.for('baskwell.variants.studio-first-field');
const holder = globalThis as typeof globalThis & { [KEY]?: Lru<string, StudioFirstField | null> };

export function cachedStudioFirstField(design: Design, field: FieldName): StudioFirstField | null {
  const lru = (holder[KEY] ??= new Lru(32));
  const key = `${field}:${createHash('sha256').update(JSON.stringify(design)).digest('base64url')}`;
  return lru.getOrSet(key, () => studioFirstField(design, field));
}
