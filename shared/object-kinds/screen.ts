// A mesh screen: a barrier that passes part of the UVB; across the top it is the lid.
import { BARRIER_LENGTH_CM, BARRIER_SNAP, ends, segmentBounds, segmentLine } from './segment';
import type { ObjectKind } from './types';

export const screen: ObjectKind<'screen'> = {
  type: 'screen',
  name: 'Screen',
  form: 'segment',
  tool: { label: 'Screen (mesh)', key: 'S', hint: 'A mesh screen (passes part of the UVB)' },
  place: ({ enclosure: { width: W, height: H } }, id, p) => {
    // A click near the top makes the lid across the whole width, the usual mesh top.
    if (Math.abs(p.y - H) < 3) return { type: 'screen', id, x1: 0, y1: H, x2: W, y2: H };
    const half = BARRIER_LENGTH_CM / 2;
    return { type: 'screen', id, x1: p.x - half, y1: p.y, x2: p.x + half, y2: p.y };
  },
  draw: (id, a, b) => ({ type: 'screen', id, ...ends(a, b) }),
  centre: (design) => ({ x: design.enclosure.width / 2, y: design.enclosure.height }),
  bounds: segmentBounds,
  snap: BARRIER_SNAP,
  svg: (o, look) => {
    const s = look.stroke;
    const [stroke, width, dash] =
      look.over === 'field' ? ['#1c1f1a', s * 1.5, [s * 4, s * 3]] : ['#7e8673', 1.2, [2, 1.5]];
    return segmentLine(o, { stroke, strokeWidth: width, strokeDasharray: dash.join(' ') });
  },
  raster: (o, pen) => pen.line(o.x1, o.y1, o.x2, o.y2, pen.ink, 2, 6),
};
