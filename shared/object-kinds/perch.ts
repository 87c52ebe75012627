// A perch: a branch between two ends, with a thickness; the animal sits on its top.
import { round2 } from './box';
import { ends, segmentBounds, segmentLine } from './segment';
import type { ObjectKind } from './types';

/** A new perch (cm; common practice, no published source). */
export const PERCH_LENGTH_CM = 40;
export const PERCH_THICKNESS_CM = 4;

export const perch: ObjectKind<'perch'> = {
  type: 'perch',
  name: 'Perch',
  form: 'segment',
  tool: { label: 'Perch', key: 'P', hint: 'A branch: drag from one end to the other' },
  // A click places a branch rising gently (20°) to the right, centred on the click.
  place: (_design, id, p) => {
    const a = (20 * Math.PI) / 180;
    const dx = (Math.cos(a) * PERCH_LENGTH_CM) / 2;
    const dy = (Math.sin(a) * PERCH_LENGTH_CM) / 2;
    return {
      type: 'perch',
      id,
      x1: round2(p.x - dx),
      y1: round2(p.y - dy),
      x2: round2(p.x + dx),
      y2: round2(p.y + dy),
      thickness: PERCH_THICKNESS_CM,
    };
  },
  draw: (id, a, b) => ({ type: 'perch', id, ...ends(a, b), thickness: PERCH_THICKNESS_CM }),
  centre: (design) => ({ x: design.enclosure.width / 2, y: design.enclosure.height / 2 }),
  bounds: segmentBounds,
  // Its centre is placed freely; its ends rest on the floor and on ledges and hides.
  snap: {
    click: 'free',
    drag: 'perch-end',
    ends: 'perch-end',
    restsOn: 'surfaces',
    bearsWeight: false,
    newThickness: PERCH_THICKNESS_CM,
  },
  svg: (o, look) =>
    segmentLine(o, {
      stroke: look.over === 'field' ? '#4a3b2a' : '#94561f',
      strokeWidth: o.thickness,
      strokeLinecap: 'round',
    }),
  raster: (o, pen) =>
    pen.line(o.x1, o.y1, o.x2, o.y2, pen.ink, Math.max(2, Math.round(o.thickness * pen.pxPerCm))),
};
