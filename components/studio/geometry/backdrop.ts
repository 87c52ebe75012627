// Placement of the photo backdrop (design.backdrop), in design cm with y up: fitted over the
// enclosure's inner rectangle (the photo is taken from the front), moved whole, or stretched by one
// corner while the opposite corner stays put. Pure; the canvas and the panel share it.
import type { Backdrop, Enclosure } from '../state/types';
import { designToStage, type Camera, type Point, type Rect } from './camera';

export type BackdropCorner = 'nw' | 'ne' | 'sw' | 'se';
export const BACKDROP_CORNERS: readonly BackdropCorner[] = ['nw', 'ne', 'se', 'sw'];

/** The smallest the photo may be squeezed to, cm: a corner never crosses its neighbours. */
export const MIN_BACKDROP_CM = 1;
/** Opacity of a newly chosen photo: the drawn lines stay readable above it. */
export const DEFAULT_BACKDROP_OPACITY = 0.6;

/** The photo stretched over the enclosure's inner rectangle, keeping its other settings. */
export function fitToEnclosure(
  enclosure: Pick<Enclosure, 'width' | 'height'>,
  uploadId: number,
  prev?: Pick<Backdrop, 'opacity' | 'visible'>,
): Backdrop {
  return {
    uploadId,
    x: 0,
    y: 0,
    width: enclosure.width,
    height: enclosure.height,
    opacity: prev?.opacity ?? DEFAULT_BACKDROP_OPACITY,
    visible: prev?.visible ?? true,
  };
}

const round = (v: number) => Math.round(v * 100) / 100;

export function moveBackdrop(b: Backdrop, dx: number, dy: number): Backdrop {
  return { ...b, x: round(b.x + dx), y: round(b.y + dy) };
}

export function backdropCornerPoint(b: Backdrop, corner: BackdropCorner): Point {
  const right = corner === 'ne' || corner === 'se';
  const top = corner === 'nw' || corner === 'ne';
  return { x: right ? b.x + b.width : b.x, y: top ? b.y + b.height : b.y };
}

/** Drags one corner to `to`; the opposite corner stays, the photo never gets smaller than MIN_BACKDROP_CM. */
export function dragBackdropCorner(b: Backdrop, corner: BackdropCorner, to: Point): Backdrop {
  const right = corner === 'ne' || corner === 'se';
  const top = corner === 'nw' || corner === 'ne';
  const left = b.x;
  const rightEdge = b.x + b.width;
  const bottom = b.y;
  const topEdge = b.y + b.height;
  let x0 = left;
  let x1 = rightEdge;
  let y0 = bottom;
  let y1 = topEdge;
  if (right) x1 = Math.max(to.x, left + MIN_BACKDROP_CM);
  else x0 = Math.min(to.x, rightEdge - MIN_BACKDROP_CM);
  if (top) y1 = Math.max(to.y, bottom + MIN_BACKDROP_CM);
  else y0 = Math.min(to.y, topEdge - MIN_BACKDROP_CM);
  const x = round(x0);
  const y = round(y0);
  return { ...b, x, y, width: round(x1 - x0), height: round(y1 - y0) };
}

/** The corner whose stage position is within `hitPx` of `p` (stage px), if any. */
export function backdropCornerAt(cam: Camera, b: Backdrop, p: Point, hitPx: number): BackdropCorner | null {
  for (const c of BACKDROP_CORNERS) {
    const s = designToStage(cam, backdropCornerPoint(b, c));
    if (Math.hypot(s.x - p.x, s.y - p.y) <= hitPx) return c;
  }
  return null;
}

export function insideBackdrop(b: Backdrop, d: Point): boolean {
  return d.x >= b.x && d.x <= b.x + b.width && d.y >= b.y && d.y <= b.y + b.height;
}

/** The photo's rectangle on the stage (top-left corner, size in px). */
export function backdropStageRect(cam: Camera, b: Backdrop): Rect {
  const tl = designToStage(cam, { x: b.x, y: b.y + b.height });
  return { x: tl.x, y: tl.y, width: b.width * cam.zoom, height: b.height * cam.zoom };
}
