import { describe, expect, it } from 'vitest';
import type { Finding } from '../fields/engineTypes';
import {
  husbandrySentences,
  MARK_LABEL_GAP_PX,
  meshLabel,
  stackMarkLabels as placeMarkLabels,
  type MarkLabelBox,
} from './husbandry';

type Box = { x: number; y: number; width: number; height: number };
/** The tops the labels take, null for one left out (each placed label keeps its own x here). */
const stackMarkLabels = (boxes: MarkLabelBox[], avoid?: Box[]) => {
  const at = placeMarkLabels(boxes, avoid);
  at.forEach((p, i) => p && expect(p.x).toBe(boxes[i]!.x));
  return at.map((p) => p?.y ?? null);
};

const seg = (x1: number, x2: number, y = 44) => ({ x1, y1: y, x2, y2: y });
const basking = (uv: number[][], heat: number[][], both: number[][]): Finding => ({
  id: 'shared-basking',
  status: both.length ? 'pass' : 'fail',
  title: 'UV and heat on one basking spot',
  message: '',
  numbers: {},
  basking: {
    uv: uv.map(([a, b]) => seg(a!, b!)),
    heat: heat.map(([a, b]) => seg(a!, b!)),
    both: both.map(([a, b]) => seg(a!, b!)),
  },
});

describe('the husbandry marks in words', () => {
  it('says where UV and heat fall when they are apart, and where they meet', () => {
    const names = new Map<string, string>();
    expect(husbandrySentences(basking([[25, 55]], [[135, 165]], []), null, names, 'cm')).toEqual([
      'UV and heat apart: no spot gets both. The UV range falls around 40 cm from the left, the basking heat around 150 cm.',
    ]);
    expect(husbandrySentences(basking([[25, 55]], [[30, 50]], [[30, 50]]), null, names, 'cm')).toEqual([
      'UV and heat meet on the basking spot, around 40 cm from the left.',
    ]);
    expect(husbandrySentences(undefined, null, names, 'cm')).toEqual([]);
  });

  it('labels a climber’s mesh with the lamps that make it a burn or a UV risk, in the chosen unit', () => {
    const risk = { screenId: 'lid', burn: [{ lampId: 'heat', distanceCm: 3 }], uv: [] };
    expect(meshLabel(risk, 'cm')).toBe('Climbable mesh: burn risk (heat, 3 cm)');
    expect(meshLabel({ ...risk, uv: [{ lampId: 'uv', distanceCm: 2.54 }] }, 'in')).toBe(
      'Climbable mesh: burn risk (heat, 1.2 in), UV at the eyes (uv, 1 in)',
    );
    expect(meshLabel({ screenId: 'lid', burn: [], uv: [] }, 'cm')).toBe('Climbable mesh');
    const names = new Map([['lid', '“Mesh lid”']]);
    expect(husbandrySentences(undefined, [risk, { screenId: 'g', burn: [], uv: [] }], names, 'cm')).toEqual([
      'Climbable mesh: burn risk (heat, 3 cm) — “Mesh lid”.',
      'Climbable mesh — g: no lamp within reach.',
    ]);
  });
});

describe('the basking marks’ labels', () => {
  it('stack above one another where their marks lie together, and stay put where they do not', () => {
    const box = (x: number, y: number, width = 80) => ({ x, y, width, height: 15, belowY: y + 30 });
    // Three marks 6 px apart over one perch: each label moves up until it is clear of the ones placed.
    const ys = stackMarkLabels([box(100, 400), box(100, 394), box(104, 388)]);
    expect(ys).toEqual([400, 400 - 15 - MARK_LABEL_GAP_PX, 400 - 2 * (15 + MARK_LABEL_GAP_PX)]);
    for (let i = 0; i < ys.length; i++)
      for (let j = 0; j < i; j++) expect(Math.abs(ys[i]! - ys[j]!)).toBeGreaterThanOrEqual(15);
    // A UV range at one end and the heat at the other: side by side, nothing moves.
    expect(stackMarkLabels([box(20, 400), box(300, 394)])).toEqual([400, 394]);
  });

  it('keep clear of a lamp label: below their surface when the stack above would cover it', () => {
    // Three marks over a perch at y 420 (labels start at 400, 394, 388; below the surface from 424), and
    // a lamp hanging low with its label across the second and third labels' spots above.
    const box = (x: number, y: number) => ({ x, y, width: 80, height: 15, belowY: 424 });
    const lampLabel = { x: 90, y: 372, width: 160, height: 14 };
    const ys = stackMarkLabels([box(100, 400), box(100, 394), box(104, 388)], [lampLabel]);
    expect(ys[0]).toBe(400);
    expect(ys.slice(1)).toEqual([424, 424 + 15 + MARK_LABEL_GAP_PX]);
    const rect = (y: number) => ({ x: 100, y, width: 80, height: 15 });
    const overlaps = (a: { x: number; y: number; width: number; height: number }, b: typeof a) =>
      a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
    for (const y of ys) expect(overlaps(rect(y!), lampLabel)).toBe(false);
    // The same marks with the lamp's label elsewhere stack above as before.
    expect(stackMarkLabels([box(100, 400), box(100, 394)], [{ ...lampLabel, x: 400 }])).toEqual([
      400,
      400 - 15 - MARK_LABEL_GAP_PX,
    ]);
    // Covered both ways (a label below the surface too) and nowhere beside: the label is left out, and
    // a later one is placed as if it were not there.
    const under = { x: 90, y: 424, width: 160, height: 60 };
    expect(stackMarkLabels([box(100, 380), box(300, 380)], [lampLabel, under])).toEqual([null, 380]);
  });

  it('go beside their line when the spots above and below are both covered (a probe’s readout below)', () => {
    // A perch at y 420 whose label spot above is under a lamp's label and whose spot below is under a
    // probe's readout: the label sits level with its line, past the run's right end (x 180).
    const lampLabel = { x: 90, y: 392, width: 160, height: 14 };
    const readout = { x: 40, y: 424, width: 150, height: 60 };
    const beside = [
      { x: 184, y: 408 },
      { x: 16, y: 408 },
    ];
    const box = { x: 100, y: 398, width: 80, height: 15, belowY: 424, beside };
    const view = { width: 400, height: 600 };
    expect(placeMarkLabels([box], [lampLabel, readout], view)).toEqual([{ x: 184, y: 408 }]);
    // The right end runs off the view: the left one is taken.
    expect(placeMarkLabels([box], [lampLabel, readout], { width: 250, height: 600 })).toEqual([
      { x: 16, y: 408 },
    ]);
    // Both beside spots covered too: left out rather than printed over a lamp's name.
    const wide = { x: 0, y: 400, width: 400, height: 20 };
    expect(placeMarkLabels([box], [lampLabel, readout, wide], view)).toEqual([null]);
    // With room below, below is still preferred over beside.
    expect(placeMarkLabels([box], [lampLabel], view)).toEqual([{ x: 100, y: 424 }]);
  });
});
