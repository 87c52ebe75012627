// One look per kind of lamp, wherever a design is drawn: the studio's canvas, the compare and share
// pictures, the guided start's sketch and the reports. A UV lamp is pale blue with a dark blue outline
// and a blue core line; a heat lamp that glows is sand with a dark red outline; a ceramic emitter (heat,
// no light) is dark grey with a red core. The outline keeps each one visible over any field band.
import { LAMP_TECHS } from '@/simulation/model/techs';
import type { LampObject } from '@/simulation/model/schema';

export type LampKind = 'uv' | 'heat' | 'ceramic';
export type LampLook = { fill: string; stroke: string; core: string; word: string };

export const LAMP_LOOK: Record<LampKind, LampLook> = {
  uv: { fill: '#ddedf8', stroke: '#295193', core: '#67aede', word: 'UV lamp' },
  heat: { fill: '#f2dcab', stroke: '#a5301f', core: '#dfa845', word: 'Heat lamp' },
  ceramic: { fill: '#4a5143', stroke: '#1c1f1a', core: '#da5540', word: 'Heat emitter (no light)' },
};

/** Which look a lamp takes: any UV output makes it a UV lamp (a mercury vapour lamp heats too). */
export function lampKind(l: Pick<LampObject, 'tech' | 'uvbAt30'>): LampKind {
  const uvb = l.uvbAt30 ?? LAMP_TECHS[l.tech].uvbAt30;
  if (uvb > 0) return 'uv';
  return l.tech === 'ceramic' ? 'ceramic' : 'heat';
}

export const lampLook = (l: Pick<LampObject, 'tech' | 'uvbAt30'>): LampLook => LAMP_LOOK[lampKind(l)];
