// A ledge: a solid platform or rock; things rest on its top.
import { boxKind, boxRect, SOLID_SKETCH } from './box';

export const ledge = boxKind({
  type: 'ledge',
  name: 'Ledge',
  tool: { label: 'Ledge', key: 'E', hint: 'A solid platform or rock' },
  // A keeper's usual starting size (cm; common practice, no published source).
  size: { width: 30, height: 15 },
  bearsWeight: true,
  svg: (o, look) =>
    boxRect(
      o,
      look.over === 'field' ? { fill: '#7a6e64', stroke: '#1c1f1a', strokeWidth: look.stroke } : SOLID_SKETCH,
    ),
  raster: (o, pen) => pen.box(o.x, o.y, o.width, o.height, pen.ink, [120, 110, 100]),
});
