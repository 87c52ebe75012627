// What every picture of a design needs beyond its objects' own looks.
import type { DesignObject } from '@/simulation';

/** The height a side view must show: the enclosure and the lamps resting on or above its lid. */
export function drawingTop(design: { enclosure: { height: number }; objects: readonly DesignObject[] }) {
  return Math.max(design.enclosure.height, ...design.objects.map((o) => (o.type === 'lamp' ? o.y + 4 : 0)));
}
