/**
 * Server-side memo of what the share page and the reports compute from a design: the engine's fields
 * and key figures, each field's scale and contour bands, and the species check. A shared link is opened
 * by many people and the engine takes a few hundred milliseconds a run, so a design is simulated once
 * and then served from here.
 *
 * The key is a hash of the design document itself (plus the lamp age), not the variant's id and
 * version: the same content always gives the same figures, so an entry can never go stale, whoever
 * saved what. Bounded: the least recently used design is dropped first.
 */
import 'server-only';
import { createHash } from 'node:crypto';
import { config } from '@/lib/config';
import type { Assessment, ContourBand, Design, FieldName, SpeciesSheet } from '@/simulation';
import { assessFor } from '@/shared/designs/assessment';
import { Lru } from './lru';
import type { FieldScale } from '@/shared/field-scale';
import { bandsFor, scaleFor, simulate, type Simulated } from '@/shared/designs/simulate';

export type FieldView = { scale: FieldScale; bands: ContourBand[] };

export type Computed = {
  sim: Simulated;
  /** The field's scale (this design alone) and its contour bands on that scale. */
  view(field: FieldName): FieldView;
  /** The species check of this design against the sheet; with no sheet, the general safety checks. */
  assessment(sheet: SpeciesSheet | null): Assessment;
  /**
   * Anything else made from this run alone (a report's field picture): made once under `key`, then
   * reused for as long as the run is held. `make` must depend on nothing but the design, the lamp age
   * and what the key names.
   */
  derived<T>(key: string, make: () => T): T;
};

type Entry = {
  sim: Simulated;
  views: Map<FieldName, FieldView>;
  assessments: Map<string, Assessment>;
  derived: Map<string, unknown>;
};

// One cache for the whole server process: pages and route handlers are separate bundles in a
// production build, each with its own copy of this module. About 1 MB an entry (fields of some 30 000
// cells, the bands of three fields); COMPUTED_CACHE_ENTRIES of them at most, none when it is 0.
const KEY = Symbol.for('baskwell.variants.computed');
const holder = globalThis as typeof globalThis & { [KEY]?: Lru<string, Entry> | null };
function cache(): Lru<string, Entry> | null {
  if (holder[KEY] === undefined) {
    const entries = config().COMPUTED_CACHE_ENTRIES;
    holder[KEY] = entries > 0 ? new Lru<string, Entry>(entries) : null;
  }
  return holder[KEY];
}

const digest = (value: unknown) => createHash('sha256').update(JSON.stringify(value)).digest('base64url');

export function computedFor(design: Design, months = 0): Computed {
  const fresh = (): Entry => ({
    sim: simulate(design, months),
    views: new Map(),
    assessments: new Map(),
    derived: new Map(),
  });
  const lru = cache();
  const entry = lru ? lru.getOrSet(`${digest(design)}:${months}`, fresh) : fresh();
  return {
    sim: entry.sim,
    view(field) {
      let v = entry.views.get(field);
      if (!v) {
        const scale = scaleFor(field, [entry.sim]);
        v = { scale, bands: bandsFor(entry.sim, scale) };
        entry.views.set(field, v);
      }
      return v;
    },
    assessment(sheet) {
      const k = sheet ? digest(sheet) : 'no sheet';
      let a = entry.assessments.get(k);
      if (!a) {
        a = assessFor(design, sheet, months);
        // A design is checked against one sheet or a few; a long run of edited sheets starts afresh.
        if (entry.assessments.size >= 8) entry.assessments.clear();
        entry.assessments.set(k, a);
      }
      return a;
    },
    derived<T>(key: string, make: () => T): T {
      if (entry.derived.has(key)) return entry.derived.get(key) as T;
      const value = make();
      entry.derived.set(key, value);
      return value;
    },
  };
}

/** For tests: how many designs are held, and a way to start empty. */
export const computedCache = {
  size: () => cache()?.size ?? 0,
  capacity: () => cache()?.capacity ?? 0,
  clear: () => cache()?.clear(),
};
