// Foliage: planting that lets part of the light through; nothing rests on it.
import { boxKind, boxRect } from './box';

export const foliage = boxKind({
  type: 'foliage',
  name: 'Foliage',
  tool: { label: 'Foliage', key: 'F', hint: 'Planting that lets part of the light through' },
  // A keeper's usual starting size (cm; common practice, no published source).
  size: { width: 18, height: 40 },
  bearsWeight: false,
  svg: (o, look) => {
    const dash = look.over === 'field' ? [look.stroke * 4, look.stroke * 2] : [2, 1];
    return boxRect(o, {
      fill: '#3e8546',
      fillOpacity: 0.25,
      stroke: '#27552e',
      strokeWidth: look.stroke,
      strokeDasharray: dash.join(' '),
    });
  },
  raster: (o, pen) => pen.box(o.x, o.y, o.width, o.height, pen.ink),
});
