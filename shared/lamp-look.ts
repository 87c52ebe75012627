// One look per kind of lamp, wherever a design is drawn: the studio's canvas, the compare and share
// pictures, the guided start's sketch and the reports. A UV lamp is pale blue with a dark blue outline
// and a blue core line; a heat lamp that glows is sand with a dark red outline; a ceramic emitter (heat,
// no light) is dark grey with a red core. The outline keeps each one visible over any field band.
// Types only: the pictures of pages that do not compute (share, sketch) must not pull in the engine.
import type { LampObject } from '@/simulation';

export type LampKind = 'uv' | 'heat' | 'ceramic';
export type LampLook = { fill: string; stroke: string; core: string; word: string };

export const LAMP_LOOK: Record<LampKind, LampLook> = {
  uv: { fill: '#ddedf8', stroke: '#295193', core: '#67aede', word: 'UV lamp' },
  heat: { fill: '#f2dcab', stroke: '#a5301f', core: '#dfa845', word: 'Heat lamp' },
  ceramic: { fill: '#4a5143', stroke: '#1c1f1a', core: '#da5540', word: 'Heat emitter (no light)' },
};

/** Which look a lamp takes: any UV output makes it a UV lamp (a mercury vapour lamp heats too). */
const UV_TECHS: ReadonlySet<LampObject['tech']> = new Set([
  't5',
  't8',
  'compact',
  'mercury-vapour',
  'metal-halide',
  'led-uvb',
]);

export function lampKind(l: Pick<LampObject, 'tech' | 'uvbAt30'>): LampKind {
  // Without its own figure a lamp has its technology's output: the UV technologies all give some.
  if (l.uvbAt30 !== undefined ? l.uvbAt30 > 0 : UV_TECHS.has(l.tech)) return 'uv';
  return l.tech === 'ceramic' ? 'ceramic' : 'heat';
}

export const lampLook = (l: Pick<LampObject, 'tech' | 'uvbAt30'>): LampLook => LAMP_LOOK[lampKind(l)];
