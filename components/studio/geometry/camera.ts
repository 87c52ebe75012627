// Camera: maps design coordinates (cm, origin inside bottom-left, y up) to stage pixels (y down).
// Kept as plain numbers so the transform is testable without Konva.
import type { LengthUnit } from '@/shared/units';

export interface Point {
  x: number;
  y: number;
}

export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

export interface Camera {
  /** Pixels per centimetre. */
  zoom: number;
  /** Stage position of the design origin. */
  originX: number;
  originY: number;
}

export const MIN_ZOOM = 0.5;
export const MAX_ZOOM = 60;

export function designToStage(cam: Camera, p: Point): Point {
  return { x: cam.originX + p.x * cam.zoom, y: cam.originY - p.y * cam.zoom };
}

export function stageToDesign(cam: Camera, p: Point): Point {
  return { x: (p.x - cam.originX) / cam.zoom, y: (cam.originY - p.y) / cam.zoom };
}

/** A design-space length in pixels. */
export function cmToPx(cam: Camera, cm: number): number {
  return cm * cam.zoom;
}

export function clampZoom(z: number): number {
  return Math.min(MAX_ZOOM, Math.max(MIN_ZOOM, z));
}

/** Zooms by `factor` keeping the design point under `anchor` (stage px) fixed, as wheel and pinch zoom do. */
export function zoomAt(cam: Camera, anchor: Point, factor: number): Camera {
  const zoom = clampZoom(cam.zoom * factor);
  const under = stageToDesign(cam, anchor);
  return { zoom, originX: anchor.x - under.x * zoom, originY: anchor.y + under.y * zoom };
}

export function panBy(cam: Camera, dx: number, dy: number): Camera {
  return { ...cam, originX: cam.originX + dx, originY: cam.originY + dy };
}

export interface Viewport {
  width: number;
  height: number;
}

/**
 * The camera that shows the design rectangle `bounds` (cm, y up: x/y is the bottom-left corner)
 * centred in the viewport with `padding` pixels on every side.
 */
export function fitCamera(bounds: Rect, viewport: Viewport, padding = 48): Camera {
  const w = Math.max(1, viewport.width - 2 * padding);
  const h = Math.max(1, viewport.height - 2 * padding);
  const zoom = clampZoom(Math.min(w / Math.max(bounds.width, 1), h / Math.max(bounds.height, 1)));
  const cx = bounds.x + bounds.width / 2;
  const cy = bounds.y + bounds.height / 2;
  return { zoom, originX: viewport.width / 2 - cx * zoom, originY: viewport.height / 2 + cy * zoom };
}

/** The design rectangle (cm, y up, bottom-left anchored) visible in the viewport. */
export function visibleDesignRect(cam: Camera, viewport: Viewport): Rect {
  const a = stageToDesign(cam, { x: 0, y: viewport.height });
  const b = stageToDesign(cam, { x: viewport.width, y: 0 });
  return { x: a.x, y: a.y, width: b.x - a.x, height: b.y - a.y };
}

/** Normalised rectangle spanned by two design points. */
export function rectFromPoints(a: Point, b: Point): Rect {
  return {
    x: Math.min(a.x, b.x),
    y: Math.min(a.y, b.y),
    width: Math.abs(a.x - b.x),
    height: Math.abs(a.y - b.y),
  };
}

export function rectsIntersect(a: Rect, b: Rect): boolean {
  return a.x <= b.x + b.width && b.x <= a.x + a.width && a.y <= b.y + b.height && b.y <= a.y + a.height;
}

export function unionRect(a: Rect, b: Rect): Rect {
  const x = Math.min(a.x, b.x);
  const y = Math.min(a.y, b.y);
  return {
    x,
    y,
    width: Math.max(a.x + a.width, b.x + b.width) - x,
    height: Math.max(a.y + a.height, b.y + b.height) - y,
  };
}

/** What a layer drawn across the whole view (grid, rulers) needs: the camera, the view, the unit of its steps. */
export interface ViewLayerProps {
  cam: Camera;
  viewport: Viewport;
  unit: LengthUnit;
}

/**
 * Ruler/grid tick spacing (in cm) for the current zoom: the smallest "nice" step of
 * 1, 2 or 5 × 10^n in the display unit that is at least `minPx` apart on screen.
 */
export function niceStepCm(zoom: number, minPx: number, cmPerUnit: number): number {
  const minUnits = minPx / (zoom * cmPerUnit);
  const pow = 10 ** Math.floor(Math.log10(Math.max(minUnits, 1e-9)));
  for (const m of [1, 2, 5, 10]) {
    if (m * pow >= minUnits) return m * pow * cmPerUnit;
  }
  return 10 * pow * cmPerUnit;
}
