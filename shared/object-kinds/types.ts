// What every kind of design object says about itself, in one record a kind (`lamp.ts`, `perch.ts` …),
// found by type through the registry (`index.ts`). This half is pure, so the server's report raster and
// the share pages use it as well as the studio; the studio's canvas shape and inspector form are in
// `components/studio/object-kinds/`. Types only from the engine: pages that do not compute must not
// pull it in.
import type { Design, DesignObject } from '@/simulation';

export type ObjectType = DesignObject['type'];
export type ObjectOf<K extends ObjectType> = Extract<DesignObject, { type: K }>;

export type Point = { x: number; y: number };
export type Rect = { x: number; y: number; width: number; height: number };

/**
 * The shape a kind is held as, which decides its geometry in the studio (handles, hit test, moves): a
 * lamp is a point (a tube, a length along x); a segment runs between two ends; a box is a rectangle
 * standing on its bottom edge. A new kind picks one of these and needs no geometry of its own.
 */
export type ObjectForm = 'lamp' | 'segment' | 'box';

/** How a point being placed or dragged snaps (the studio's snapPoint). */
export type PointRole = 'lamp' | 'perch-end' | 'barrier-end' | 'box-corner' | 'probe' | 'free';

export interface SnapRole {
  /** A click that places the kind. */
  click: PointRole;
  /** The start of a drag that draws one (the click's role when not given). */
  dragFrom?: PointRole;
  /** The end of that drag. */
  drag: PointRole;
  /** An end or corner handle of one already placed (a segment's rotate handle turns freely). */
  ends: PointRole;
  /** The surfaces a segment's ends or a box's bottom rest on: the lid and floor, or everything that bears weight. */
  restsOn: 'surfaces' | 'lid-and-floor';
  /** Whether its top is a surface others rest on (a ledge, a hide). */
  bearsWeight: boolean;
  /** How thick a new one is (cm): its ends snap that much above a surface. */
  newThickness?: number;
}

/** The palette button and the keyboard tool of a kind. */
export interface ToolText {
  label: string;
  key: string;
  hint: string;
}

/** Which plain look a picture uses: over a computed field (dark ink on bands) or a sketch on paper. */
export type ShapeLook = { over: 'field' | 'paper'; /** base line width, cm of the drawing */ stroke: number };

/**
 * An SVG element as plain data, its attributes named as React's SVG props (strokeWidth); DesignShapes
 * makes the elements, so the share page's static SVG and the inline pictures are the same markup.
 */
export type SvgNode = {
  tag: 'line' | 'rect' | 'circle' | 'g';
  attrs: Record<string, string | number>;
  children?: SvgNode[];
};

export type Rgb = [number, number, number];

/** The report raster's drawing tools, in design cm (y up). */
export interface RasterPen {
  pxPerCm: number;
  /** The dark line colour objects are drawn in over the field's bands. */
  ink: Rgb;
  line(x1: number, y1: number, x2: number, y2: number, c: Rgb, thick?: number, dash?: number): void;
  box(x: number, y: number, width: number, height: number, c: Rgb, fill?: Rgb): void;
}

export interface ObjectKind<K extends ObjectType> {
  type: K;
  /** Its name in lists, the inspector and the screen-reader summary. */
  name: string;
  form: ObjectForm;
  tool: ToolText;
  /** The object a click places at `p` (already snapped): sizes a keeper would start from. */
  place(design: Design, id: string, p: Point): ObjectOf<K>;
  /** The object a drag from `a` to `b` draws (both snapped, `b` further than 1 cm); null when too small. */
  draw(id: string, a: Point, b: Point): ObjectOf<K> | null;
  /** Where one goes when placed from the keyboard. */
  centre(design: Design): Point;
  /** The rectangle it takes up in the drawing. */
  bounds(o: ObjectOf<K>): Rect;
  snap: SnapRole;
  /** Its plain look for share pages, the compare page and the guided start's sketch. */
  svg(o: ObjectOf<K>, look: ShapeLook): SvgNode;
  /** Its look in the report's raster. */
  raster(o: ObjectOf<K>, pen: RasterPen): void;
}

export const hexRgb = (h: string): Rgb => {
  const n = Number.parseInt(h.slice(1), 16);
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
};
