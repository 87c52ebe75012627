// Higher-level studio operations on the store, shared by commands, the canvas and the panels.
import {
  fitCamera,
  unionRect,
  zoomAt,
  type Camera,
  type Point,
  type Rect,
  type Viewport,
} from '../geometry/camera';
import { objectBounds } from '../geometry/objects';
import { snapPoint, type PointRole, type SnapOptions } from '../geometry/snap';
import { keyboardPoint, objectForClick } from './defaults';
import { kindOf } from '@/shared/object-kinds';
import * as doc from './document';
import { gridStepCm, type PlaceTool, type Tool } from './session';
import type { StudioStore } from './store';
import type { Design, DesignObject, ObjectType } from './types';

/** Pointer pull distance for surface snapping, in screen pixels. */
export const SNAP_PX = 10;

export function snapOptions(store: StudioStore): SnapOptions {
  const s = store.session;
  return {
    grid: s.snapGrid ? gridStepCm(s.lengthUnit) : null,
    surfaces: s.snapSurfaces,
    threshold: SNAP_PX / s.camera.zoom,
  };
}

export function designBounds(design: Design): Rect {
  let r: Rect = { x: 0, y: 0, width: design.enclosure.width, height: design.enclosure.height };
  for (const o of design.objects) r = unionRect(r, objectBounds(o));
  return r;
}

/** Room around the design for the rulers, the lamp labels above and the size label below (pixels). */
export const FIT_PADDING_PX = 72;
/** The rulers sit on top, so the fitted view is nudged down a little (pixels). */
export const FIT_SHIFT_DOWN_PX = 10;

/** The fit's room around the design: all of it from tablet width up, less on a phone, whose few hundred pixels go to the design. */
export function fitPadding(viewportWidth: number): number {
  return Math.min(FIT_PADDING_PX, Math.max(28, Math.round(viewportWidth * 0.09)));
}

/** The camera that shows the whole design in a viewport (what Fit gives). */
export function fittedCamera(design: StudioStore['design'], viewport: Viewport): Camera {
  const cam = fitCamera(designBounds(design), viewport, fitPadding(viewport.width));
  return { ...cam, originY: cam.originY + FIT_SHIFT_DOWN_PX };
}

export function fitView(store: StudioStore) {
  store.setSession({ camera: fittedCamera(store.design, store.session.viewport), fitted: true });
}

/** Whether the camera is still exactly as Fit left it in that viewport (not zoomed or panned since). */
export function stillFitted(store: StudioStore, viewport: Viewport): boolean {
  const want = fittedCamera(store.design, viewport);
  const cam = store.session.camera;
  return (
    Math.abs(cam.zoom - want.zoom) < 1e-9 &&
    Math.abs(cam.originX - want.originX) < 0.5 &&
    Math.abs(cam.originY - want.originY) < 0.5
  );
}

export function zoomBy(store: StudioStore, factor: number, anchor?: Point) {
  const { viewport, camera } = store.session;
  const at = anchor ?? { x: viewport.width / 2, y: viewport.height / 2 };
  store.setSession({ camera: zoomAt(camera, at, factor) });
}

export function setTool(store: StudioStore, tool: Tool) {
  store.setSession({
    tool,
    ruler: tool === 'ruler' ? store.session.ruler : null,
    marquee: null,
    // Adjusting the photo is a way of selecting; another tool ends it.
    backdropAdjust: tool === 'select' && store.session.backdropAdjust,
  });
}

export type SelectMode = 'replace' | 'toggle' | 'add';

export function select(store: StudioStore, ids: readonly string[], mode: SelectMode = 'replace') {
  const cur = store.session.selection;
  let next: string[];
  if (mode === 'replace') next = [...ids];
  else if (mode === 'add') next = [...cur, ...ids.filter((id) => !cur.includes(id))];
  else {
    next = cur.filter((id) => !ids.includes(id));
    for (const id of ids) if (!cur.includes(id)) next.push(id);
  }
  store.setSession({ selection: next, highlight: null });
}

export function selectAll(store: StudioStore) {
  select(
    store,
    store.design.objects.map((o) => o.id),
  );
}

export function selectedObjects(store: StudioStore): DesignObject[] {
  const set = new Set(store.session.selection);
  return store.design.objects.filter((o) => set.has(o.id));
}

export function deleteSelection(store: StudioStore) {
  const ids = store.session.selection;
  if (ids.length === 0) return;
  store.edit((d) => doc.removeObjects(d, ids));
}

export function duplicateSelection(store: StudioStore) {
  const ids = selectedObjects(store).map((o) => o.id);
  if (ids.length === 0) return;
  let added: string[] = [];
  store.edit((d) => {
    const r = doc.duplicateObjects(d, ids);
    added = r.ids;
    return r.design;
  });
  select(store, added);
}

export function arrangeSelection(store: StudioStore, move: doc.ArrangeMove) {
  const ids = store.session.selection;
  if (ids.length === 0) return;
  store.edit((d) => doc.arrange(d, ids, move));
}

/** Moves the selection by a number of grid steps (1 cm, or ½ in when working in inches). */
export function nudgeSelection(store: StudioStore, stepsX: number, stepsY: number) {
  const ids = store.session.selection;
  if (ids.length === 0) return;
  const step = gridStepCm(store.session.lengthUnit);
  store.edit((d) => doc.moveObjects(d, ids, stepsX * step, stepsY * step));
}

/** How a click that places an object snaps: a lamp to the lid, a box onto a surface; a perch's centre freely. */
export function roleForPlacement(type: ObjectType): PointRole {
  return kindOf(type).snap.click;
}

/** Places a new object of `type` at a design point (snapped for its kind), selects it, back to Select. */
export function placeObject(store: StudioStore, type: PlaceTool, at: Point): string {
  const { point } = snapPoint(store.design, at, roleForPlacement(type), snapOptions(store));
  const id = doc.nextId(store.design, type);
  const object = objectForClick(store.design, type, id, point);
  store.edit((d) => doc.addObject(d, object));
  store.setSession({ selection: [id], tool: 'select', tab: 'inspect' });
  return id;
}

/** Keyboard placement: mid-width, where the kind belongs (a lamp on the lid, a box on the floor). */
export function placeAtCentre(store: StudioStore, type: PlaceTool): string {
  return placeObject(store, type, keyboardPoint(store.design, type));
}

export function addProbeAt(store: StudioStore, at: Point): string {
  let id = '';
  store.edit((d) => {
    const r = doc.addProbe(d, Math.round(at.x * 10) / 10, Math.round(at.y * 10) / 10);
    id = r.id;
    return r.design;
  });
  return id;
}

/** Keyboard selection: the next (or previous) object in drawing order, wrapping around. */
export function selectStep(store: StudioStore, step: 1 | -1) {
  const objs = store.design.objects;
  if (objs.length === 0) return;
  const cur =
    store.session.selection.length === 1 ? objs.findIndex((o) => o.id === store.session.selection[0]) : -1;
  const next = cur < 0 ? (step === 1 ? 0 : objs.length - 1) : (cur + step + objs.length) % objs.length;
  select(store, [objs[next]!.id]);
}
