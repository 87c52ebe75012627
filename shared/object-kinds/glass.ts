// A glass or acrylic pane: a barrier that blocks UVB (acrylic varies) and part of the heat.
import { BARRIER_LENGTH_CM, BARRIER_SNAP, ends, segmentBounds, segmentLine } from './segment';
import type { ObjectKind } from './types';

export const glass: ObjectKind<'glass'> = {
  type: 'glass',
  name: 'Glass',
  form: 'segment',
  tool: {
    label: 'Glass',
    key: 'G',
    hint: 'A glass or acrylic pane (glass blocks UVB; acrylic varies, so set its measured share)',
  },
  // A new pane stands up, centred on the click.
  place: (design, id, p) => {
    const half = Math.min(BARRIER_LENGTH_CM, design.enclosure.height) / 2;
    return { type: 'glass', id, x1: p.x, y1: p.y + half, x2: p.x, y2: p.y - half };
  },
  draw: (id, a, b) => ({ type: 'glass', id, ...ends(a, b) }),
  centre: (design) => ({ x: design.enclosure.width / 2, y: 0 }),
  bounds: segmentBounds,
  snap: BARRIER_SNAP,
  svg: (o, look) =>
    look.over === 'field'
      ? segmentLine(o, { stroke: '#3377c5', strokeWidth: look.stroke * 2 })
      : segmentLine(o, { stroke: '#4592d2', strokeWidth: 1.4 }),
  raster: (o, pen) => pen.line(o.x1, o.y1, o.x2, o.y2, [90, 150, 200], 3),
};
