// A hide: a closed box that shades its inside; things rest on its top.
import { boxKind, boxRect, SOLID_SKETCH } from './box';

export const hide = boxKind({
  type: 'hide',
  name: 'Hide',
  tool: { label: 'Hide', key: 'D', hint: 'A closed box that shades its inside' },
  // A keeper's usual starting size (cm; common practice, no published source).
  size: { width: 25, height: 14 },
  bearsWeight: true,
  svg: (o, look) =>
    boxRect(
      o,
      look.over === 'field'
        ? { fill: 'none', stroke: '#1c1f1a', strokeWidth: look.stroke * 1.5 }
        : SOLID_SKETCH,
    ),
  raster: (o, pen) => pen.box(o.x, o.y, o.width, o.height, pen.ink),
});
