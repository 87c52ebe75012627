// What the box kinds (ledge, hide, foliage) share: a rectangle standing on its bottom edge.
import type { Design, DesignObject } from '@/simulation';
import type { ObjectKind, ObjectOf, ObjectType, Point, Rect, ShapeLook, SvgNode, ToolText } from './types';

export type BoxObject = Extract<DesignObject, { width: number }>;
type BoxType = BoxObject['type'] & ObjectType;

/**
 * A box kind's record from what sets it apart: its name and tool, the size a click places (cm), whether
 * things rest on its top, and its looks. A drag spans the box between two corners; a click puts its
 * bottom edge on the (snapped) point, centred on it; from the keyboard it lands on the floor, mid-width.
 */
export function boxKind<K extends BoxType>(k: {
  type: K;
  name: string;
  tool: ToolText;
  size: { width: number; height: number };
  bearsWeight: boolean;
  svg: (o: ObjectOf<K> & BoxObject, look: ShapeLook) => SvgNode;
  raster: ObjectKind<K>['raster'];
}): ObjectKind<K> {
  const { type, size } = k;
  return {
    type,
    name: k.name,
    form: 'box',
    tool: k.tool,
    place: (_design, id, p) =>
      ({ type, id, x: round2(p.x - size.width / 2), y: p.y, ...size }) as ObjectOf<K>,
    draw: (id, a, b) => {
      const width = Math.abs(b.x - a.x);
      const height = Math.abs(b.y - a.y);
      if (width < 1 || height < 1) return null;
      return { type, id, x: Math.min(a.x, b.x), y: Math.min(a.y, b.y), width, height } as ObjectOf<K>;
    },
    centre: (design: Design): Point => ({ x: design.enclosure.width / 2, y: 0 }),
    bounds: (o): Rect => {
      const b = o as BoxObject;
      return { x: b.x, y: b.y, width: b.width, height: b.height };
    },
    snap: {
      click: 'box-corner',
      drag: 'box-corner',
      ends: 'box-corner',
      restsOn: 'surfaces',
      bearsWeight: k.bearsWeight,
    },
    svg: k.svg,
    raster: k.raster,
  };
}

/** Solid furniture in a sketch: grey on paper. */
export const SOLID_SKETCH = { fill: '#cdd1c8', stroke: '#4a5143', strokeWidth: 0.6 };

export function boxRect(o: BoxObject, style: SvgNode['attrs']): SvgNode {
  return { tag: 'rect', attrs: { x: o.x, y: o.y, width: o.width, height: o.height, ...style } };
}

export function round2(v: number): number {
  return Math.round(v * 100) / 100;
}
