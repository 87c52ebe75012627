// A lamp: a tube (a length along x) or a bulb, at its emitting point.
import type { LampObject } from '@/simulation';
import { lampLook } from '@/shared/lamp-look';
import { hexRgb, type ObjectKind, type SvgNode } from './types';

/** How big a bulb is drawn (cm): the design stores only its emitting point. */
export const BULB_RADIUS_CM = 4;
/** How thick a tube is drawn (cm). */
export const TUBE_THICKNESS_CM = 2.5;
/** Length of a new tube (cm): a common T5 size (common practice, no published source). */
export const TUBE_LENGTH_CM = 55;
/** Height of a lamp's emitting point above the lid when it rests on the lid (cm; common practice, no published source). */
export const LAMP_ON_LID_CM = 2;
/** Depth of a lamp's emitting point below the lid when it is fitted inside (cm). */
export const LAMP_UNDER_LID_CM = 3;

export function lampExtent(l: LampObject): { x1: number; x2: number } {
  const half = l.form === 'tube' ? (l.length ?? 0) / 2 : BULB_RADIUS_CM;
  return { x1: l.x - half, x2: l.x + half };
}

/**
 * A new T5 tube resting on the lid: the most common UVB set-up, a neutral starting point. In a
 * narrow enclosure the tube is shortened to fit (about three quarters of the width).
 */
/**
 * A lamp's name with its wattage, as its canvas label reads: "Basking tube · 24 W", or the name alone
 * when it already states that wattage ("Ceramic heat emitter, 100 W").
 */
export function nameWithWatts(name: string, watts: number): string {
  const stated = new RegExp(`(^|[^\\d.])${String(watts).replace('.', '\\.')}\\s*W\\b`).test(name);
  return stated ? name : `${name} · ${watts} W`;
}

export function defaultLamp(id: string, x: number, y: number, enclosureWidth = Infinity): LampObject {
  const length = Math.min(TUBE_LENGTH_CM, Math.max(10, Math.round(enclosureWidth * 0.75)));
  return { type: 'lamp', id, tech: 't5', form: 'tube', x, y, length, ageMonths: 0 };
}

export const lamp: ObjectKind<'lamp'> = {
  type: 'lamp',
  name: 'Lamp',
  form: 'lamp',
  tool: { label: 'Lamp', key: 'L', hint: 'A lamp: UVB tube or bulb, or a heat lamp' },
  place: (design, id, p) => defaultLamp(id, p.x, p.y, design.enclosure.width),
  // A drag draws a tube along the lid at the height it started from.
  draw: (id, a, b) => {
    const length = Math.abs(b.x - a.x);
    if (length < 1) return null;
    if (length < 5) return defaultLamp(id, a.x, a.y);
    return { ...defaultLamp(id, (a.x + b.x) / 2, a.y), length };
  },
  centre: (design) => ({ x: design.enclosure.width / 2, y: design.enclosure.height + LAMP_ON_LID_CM }),
  bounds: (o) => {
    const { x1, x2 } = lampExtent(o);
    const h = o.form === 'tube' ? TUBE_THICKNESS_CM / 2 : BULB_RADIUS_CM;
    return { x: x1, y: o.y - h, width: x2 - x1, height: 2 * h };
  },
  // Tube ends land on walls, floor, tops and the lid like a box's corners.
  snap: {
    click: 'lamp',
    dragFrom: 'lamp',
    drag: 'free',
    ends: 'box-corner',
    restsOn: 'surfaces',
    bearsWeight: false,
  },
  svg: (o, look) => {
    // The studio's marks: a tube is a rounded bar with a core line, a bulb a disc with a core dot.
    const c = lampLook(o);
    const half = (o.length ?? 0) / 2;
    const t = look.over === 'field' ? look.stroke * 5 : 2.4;
    const r = look.over === 'field' ? 2 : 2.4;
    const edge = Math.max(look.stroke, t / 6);
    const g = (children: SvgNode[]): SvgNode => ({ tag: 'g', attrs: { 'data-lamp-kind': c.word }, children });
    if (o.form === 'tube' && half > 0) {
      const bar = { x: o.x - half, y: o.y - t / 2, width: 2 * half, height: t, rx: t / 2 };
      return g([
        { tag: 'rect', attrs: { ...bar, fill: c.fill, stroke: c.stroke, strokeWidth: edge } },
        {
          tag: 'line',
          attrs: {
            x1: o.x - half + t / 2,
            y1: o.y,
            x2: o.x + half - t / 2,
            y2: o.y,
            stroke: c.core,
            strokeWidth: t / 3,
            strokeLinecap: 'round',
          },
        },
      ]);
    }
    const stroke = { stroke: c.stroke, strokeWidth: Math.max(look.stroke, r / 4) };
    return g([
      { tag: 'circle', attrs: { cx: o.x, cy: o.y, r, fill: c.fill, ...stroke } },
      { tag: 'circle', attrs: { cx: o.x, cy: o.y, r: r * 0.45, fill: c.core } },
    ]);
  },
  raster: (o, pen) => {
    // The same look as in the studio: outline, body and core line in the lamp kind's colours.
    const look = lampLook(o);
    if (o.form === 'tube') {
      const half = (o.length ?? 0) / 2;
      pen.line(o.x - half, o.y, o.x + half, o.y, hexRgb(look.stroke), 9);
      pen.line(o.x - half, o.y, o.x + half, o.y, hexRgb(look.fill), 6);
      pen.line(o.x - half, o.y, o.x + half, o.y, hexRgb(look.core), 2);
    } else {
      pen.box(o.x - 2, o.y - 2, 4, 4, hexRgb(look.stroke), hexRgb(look.fill));
      pen.box(o.x - 0.8, o.y - 0.8, 1.6, 1.6, hexRgb(look.core), hexRgb(look.core));
    }
  },
};
