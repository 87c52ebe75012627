import 'server-only';
import { createHash } from 'node:crypto';
import { runEngineTask, type SharedView } from '@/lib/engine-pool';
import { lampRows, type LampRow } from '@/lib/reports/lamps';
import { designWorkProblem, physicsOf, type Design, type FieldName } from '@/simulation';
import { Lru } from './lru';
import type { ShareRecord } from './queries';
import { readStoredDesign } from './stored-design';

/**
 * What a share page shows of its design, made once and then served from memory: the design as drawn
 * (without its photo backdrop), its lamps, and — unless the design is beyond the engine's work bound
 * (`problem`) — one field's scale, the key figures and the species check from an engine thread.
 */
export type SharePageView = {
  design: Design;
  lamps: LampRow[];
  problem: string | null;
  result: SharedView | null;
};

// One link is opened by many people, and a view follows only from what the key names: the stored
// document (hashed), the field and the species sheet's figures. The key holds content, not ids or
// versions, so an entry can never go stale; a saved change or an edited sheet is simply a new key. The
// link itself is checked by the caller on every request, so a revoked link stops at once. About 10–30 kB
// an entry.
const KEY = Symbol.for('baskwell.variants.share-page-views');
const holder = globalThis as typeof globalThis & { [KEY]?: Lru<string, Promise<SharePageView>> };
const views = () => (holder[KEY] ??= new Lru<string, Promise<SharePageView>>(256));

const viewKey = (share: ShareRecord, field: FieldName) =>
  [
    field,
    createHash('sha256').update(share.designJson).digest('base64url'),
    share.species ? JSON.stringify(share.species.sheet) : '',
  ].join('\n');

async function make(share: ShareRecord, field: FieldName): Promise<SharePageView> {
  const design = physicsOf(readStoredDesign(share.designJson));
  const lamps = lampRows(design);
  // Saved before designs were bounded: the page says so rather than spend the server on it.
  const problem = designWorkProblem(design);
  if (problem) return { design, lamps, problem, result: null };
  // On an engine thread, never on the server's event loop.
  const result = await runEngineTask('sharedView', { design, field, sheet: share.species?.sheet ?? null });
  return { design, lamps, problem: null, result };
}

/**
 * The view of a working link's design and field. Requests that arrive together for one new view share
 * one engine run; a failed run (the engine busy, say) is forgotten, so the next request tries again.
 */
export function sharePageView(share: ShareRecord, field: FieldName): Promise<SharePageView> {
  const lru = views();
  const key = viewKey(share, field);
  const held = lru.get(key);
  if (held) return held;
  const made = make(share, field);
  lru.set(key, made);
  made.catch(() => {
    if (lru.get(key) === made) lru.delete(key);
  });
  return made;
}

/** For tests: start with no views held. */
export const sharePageViews = { clear: () => views().clear(), size: () => views().size };
