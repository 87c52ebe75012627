/**
 * How much computing one design costs the server, and the most it may cost. The engine's time grows
 * with grid cells × lamps × barrier edges (every cell looks at every lamp past every barrier's edges),
 * so a design of a few hundred lamps and barriers took tens of seconds for one export. Designs are
 * bounded by that product, not by counts alone: a small enclosure may hold many more objects than a
 * room-sized one.
 *
 * The grid is the one the server draws exports and share pages with (`reportCellCm`); the studio's own
 * grid in the browser is the person's own computer's business.
 */
import type { Design, DesignObject } from './schema';

/**
 * The most work one design may need: cells × lamps × (barrier edges + 1). About 1–2 s of one core for the
 * export on the reference machine (npm run --silent bench:export), and over ten times what a busy real
 * enclosure needs (20 lamps and 40 barriers in the largest enclosure come to about 190 million).
 */
export const MAX_DESIGN_WORK = 300_000_000;

/** Cells of about half a centimetre, coarser for big enclosures (at most 240 along the longer side). */
export function reportCellCm(enclosure: { width: number; height: number }): number {
  return Math.max(0.5, Math.round((Math.max(enclosure.width, enclosure.height) / 240) * 10) / 10);
}

/** Edges a barrier adds: a screen or pane is one segment, the others are four-sided. */
function barrierEdges(o: DesignObject): number {
  switch (o.type) {
    case 'lamp':
      return 0;
    case 'screen':
    case 'glass':
      return 1;
    default:
      return 4;
  }
}

export type DesignWork = { cells: number; lamps: number; barrierEdges: number; work: number };

export function designWork(design: Pick<Design, 'enclosure' | 'objects'>): DesignWork {
  const cell = reportCellCm(design.enclosure);
  const cells =
    Math.max(1, Math.ceil(design.enclosure.width / cell - 1e-9)) *
    Math.max(1, Math.ceil(design.enclosure.height / cell - 1e-9));
  let lamps = 0;
  let edges = 0;
  for (const o of design.objects) {
    if (o.type === 'lamp') lamps++;
    else edges += barrierEdges(o);
  }
  return { cells, lamps, barrierEdges: edges, work: cells * lamps * (edges + 1) };
}

const millions = (n: number) => `${Math.round(n / 1e6).toLocaleString('en')} million`;

/** Null when the design is within the limit; else a message naming the limit and how to get under it. */
export function designWorkProblem(design: Pick<Design, 'enclosure' | 'objects'>): string | null {
  const w = designWork(design);
  if (w.work <= MAX_DESIGN_WORK) return null;
  return (
    `this design is too complex to compute: ${w.cells.toLocaleString('en')} grid cells × ${w.lamps} lamps × ` +
    `(${w.barrierEdges} barrier edges + 1) is ${millions(w.work)}, and the limit is ${millions(MAX_DESIGN_WORK)}. ` +
    'Remove some lamps or barriers, or split the design into variants.'
  );
}
