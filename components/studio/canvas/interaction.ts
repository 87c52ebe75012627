// Pointer interaction on the canvas as a framework-free controller: it turns pointer down/move/up
// (in stage pixels) into store changes. One drag is one gesture, hence one undo step.
import { designToStage, rectFromPoints, rectsIntersect, stageToDesign, type Point } from '../geometry/camera';
import {
  applyHandle,
  objectBounds,
  objectHandles,
  topmostAt,
  anchorPoint,
  type HandleId,
} from '../geometry/objects';
import { snapMove, snapPoint, type Guide, type PointRole } from '../geometry/snap';
import {
  backdropCornerAt,
  dragBackdropCorner,
  insideBackdrop,
  moveBackdrop,
  type BackdropCorner,
} from '../geometry/backdrop';
import * as A from '../state/actions';
import { backdropShown } from '../state/backdropActions';
import { objectForDrag } from '../state/defaults';
import { kindOf } from '@/shared/object-kinds';
import { addObject, moveObjects, nextId, replaceObjects, setBackdrop } from '../state/document';
import { isPlaceTool, type PlaceTool } from '../state/session';
import type { StudioStore } from '../state/store';
import type { Backdrop, Design, DesignObject } from '../state/types';

export interface Modifiers {
  shift: boolean;
  /** Ctrl or ⌘. */
  mod: boolean;
  alt: boolean;
  /** Pan regardless of tool (middle button, Space held). */
  pan?: boolean;
  /** A finger, not a mouse or pen: in a view-only studio its drags move the view. */
  touch?: boolean;
}

/** Movement (px) before a press becomes a drag. */
export const DRAG_THRESHOLD_PX = 3;
/** How close (px) the pointer must be to grab a handle or a probe pin. */
export const HANDLE_HIT_PX = 9;
/** Extra pointer tolerance (px) for thin objects. */
export const OBJECT_HIT_PX = 5;

type Drag =
  | { kind: 'pan'; last: Point; tap?: string[] }
  | { kind: 'move'; ids: string[]; startDoc: Design; lead: DesignObject | null; anchor: Point; from: Point }
  | { kind: 'handle'; id: string; handle: HandleId; start: DesignObject }
  | { kind: 'marquee'; from: Point; base: string[] }
  | { kind: 'place'; type: PlaceTool; from: Point; id: string }
  | { kind: 'ruler'; from: Point }
  | { kind: 'probe'; from: Point }
  | { kind: 'backdrop-move'; start: Backdrop; from: Point }
  | { kind: 'backdrop-corner'; start: Backdrop; corner: BackdropCorner };

export function handleRole(o: DesignObject, handle: HandleId): PointRole {
  // A segment's rotate handle turns it freely; ends and corners snap as the kind says.
  return handle === 'rotate' ? 'free' : kindOf(o.type).snap.ends;
}

function sameGuides(a: readonly Guide[], b: readonly Guide[]): boolean {
  return a.length === b.length && a.every((g, i) => g.axis === b[i]!.axis && g.at === b[i]!.at);
}

export class CanvasInteraction {
  private drag: Drag | null = null;
  private downAt: Point | null = null;
  private dragging = false;

  constructor(private readonly store: StudioStore) {}

  private toDesign(p: Point): Point {
    return stageToDesign(this.store.session.camera, p);
  }

  /** Shows snap guides, without a state change when they are the same as before. */
  private guides(g: Guide[]) {
    if (!sameGuides(g, this.store.session.guides)) this.store.setSession({ guides: g });
  }

  private tolCm(px: number): number {
    return px / this.store.session.camera.zoom;
  }

  /** The handle of the single selected object under the pointer, if any. */
  handleAt(p: Point): { object: DesignObject; handle: HandleId } | null {
    const sel = this.store.session.selection;
    if (sel.length !== 1) return null;
    const o = this.store.design.objects.find((x) => x.id === sel[0]);
    if (!o) return null;
    const cam = this.store.session.camera;
    for (const h of objectHandles(o)) {
      const s = designToStage(cam, h);
      if (Math.hypot(s.x - p.x, s.y - p.y) <= HANDLE_HIT_PX) return { object: o, handle: h.id };
    }
    return null;
  }

  probeAt(p: Point): string | null {
    const cam = this.store.session.camera;
    const probes = this.store.design.probes ?? [];
    for (let i = probes.length - 1; i >= 0; i--) {
      const pr = probes[i]!;
      const s = designToStage(cam, pr);
      if (Math.hypot(s.x - p.x, s.y - p.y) <= HANDLE_HIT_PX) return pr.id;
    }
    return null;
  }

  objectAt(p: Point): DesignObject | undefined {
    return topmostAt(this.store.design.objects, this.toDesign(p), this.tolCm(OBJECT_HIT_PX));
  }

  /** While adjusting the photo: the photo's corner or the photo itself under the pointer. */
  backdropAt(p: Point): { backdrop: Backdrop; corner: BackdropCorner | null } | null {
    const s = this.store;
    const b = s.design.backdrop;
    if (!s.session.backdropAdjust || s.session.tool !== 'select' || !b || !backdropShown(s)) return null;
    const corner = backdropCornerAt(s.session.camera, b, p, HANDLE_HIT_PX);
    if (corner) return { backdrop: b, corner };
    return insideBackdrop(b, this.toDesign(p)) ? { backdrop: b, corner: null } : null;
  }

  get active(): boolean {
    return this.drag !== null;
  }

  /** The press has moved past the drag threshold: it is a drag now, no longer a press or a tap. */
  get moved(): boolean {
    return this.dragging;
  }

  down(p: Point, mods: Modifiers) {
    const s = this.store;
    const tool = s.session.tool;
    this.downAt = p;
    this.dragging = false;
    const d = this.toDesign(p);
    if (mods.pan || tool === 'pan') {
      this.drag = { kind: 'pan', last: p };
      return;
    }
    if (isPlaceTool(tool)) {
      // The start of a drag (a lamp starts on the lid); a plain click is placed on release instead.
      const { snap } = kindOf(tool);
      const role = snap.dragFrom ?? snap.drag;
      const { point } = snapPoint(s.design, d, role, A.snapOptions(s), new Set(), snap.newThickness ?? 0);
      this.drag = { kind: 'place', type: tool, from: point, id: nextId(s.design, tool) };
      return;
    }
    if (tool === 'ruler') {
      const { point } = snapPoint(s.design, d, 'free', A.snapOptions(s));
      this.drag = { kind: 'ruler', from: point };
      s.setSession({ ruler: { a: point, b: point } });
      return;
    }
    if (tool === 'probe') {
      this.drag = { kind: 'probe', from: d };
      return;
    }
    // Select tool. Adjusting the photo: drags move it or stretch it; elsewhere they pan.
    if (s.session.backdropAdjust) {
      const hitPhoto = this.backdropAt(p);
      this.drag = !hitPhoto
        ? { kind: 'pan', last: p }
        : hitPhoto.corner
          ? { kind: 'backdrop-corner', start: hitPhoto.backdrop, corner: hitPhoto.corner }
          : { kind: 'backdrop-move', start: hitPhoto.backdrop, from: d };
      return;
    }
    if (mods.touch && s.readOnly) {
      // Nothing can be changed: a tap selects what it lands on (to read it), a drag moves the view. The
      // selection waits for the finger to lift, so the first finger of a pinch selects nothing.
      const id = this.probeAt(p) ?? this.objectAt(p)?.id;
      this.drag = { kind: 'pan', last: p, tap: id ? [id] : [] };
      return;
    }
    const h = this.handleAt(p);
    if (h) {
      this.drag = { kind: 'handle', id: h.object.id, handle: h.handle, start: h.object };
      return;
    }
    const probeId = this.probeAt(p);
    const hit = probeId ? null : this.objectAt(p);
    const hitId = probeId ?? hit?.id;
    if (hitId) {
      const sel = s.session.selection;
      if (mods.shift) A.select(s, [hitId], 'toggle');
      else if (!sel.includes(hitId)) A.select(s, [hitId]);
      const ids = s.session.selection;
      if (!ids.includes(hitId)) {
        this.drag = null;
        return;
      }
      const lead = hit ?? null;
      const anchor = hit ? anchorPoint(hit) : (s.design.probes?.find((x) => x.id === probeId) ?? d);
      this.drag = {
        kind: 'move',
        ids: [...ids],
        startDoc: s.design,
        lead,
        anchor: { x: anchor.x, y: anchor.y },
        from: d,
      };
      return;
    }
    const base = mods.shift ? [...s.session.selection] : [];
    if (!mods.shift) A.select(s, []);
    this.drag = { kind: 'marquee', from: d, base };
  }

  move(p: Point, mods: Modifiers) {
    const drag = this.drag;
    if (!drag || !this.downAt) return;
    if (!this.dragging) {
      if (Math.hypot(p.x - this.downAt.x, p.y - this.downAt.y) < DRAG_THRESHOLD_PX) return;
      this.dragging = true;
      if (
        drag.kind === 'move' ||
        drag.kind === 'handle' ||
        drag.kind === 'place' ||
        drag.kind === 'backdrop-move' ||
        drag.kind === 'backdrop-corner'
      )
        this.store.beginGesture();
    }
    const s = this.store;
    const d = this.toDesign(p);
    const opts = A.snapOptions(s);
    switch (drag.kind) {
      case 'pan': {
        const cam = s.session.camera;
        s.setSession({
          camera: {
            ...cam,
            originX: cam.originX + p.x - drag.last.x,
            originY: cam.originY + p.y - drag.last.y,
          },
        });
        drag.last = p;
        return;
      }
      case 'move': {
        const rawDx = d.x - drag.from.x;
        const rawDy = d.y - drag.from.y;
        const snapOpts = mods.alt ? { ...opts, grid: null, surfaces: false } : opts;
        const movingObjs = drag.startDoc.objects.filter((o) => drag.ids.includes(o.id));
        const lead = drag.lead ? [drag.lead, ...movingObjs.filter((o) => o !== drag.lead)] : movingObjs;
        const r = snapMove(drag.startDoc, lead, rawDx, rawDy, drag.anchor, snapOpts);
        s.edit(() => moveObjects(drag.startDoc, drag.ids, r.dx, r.dy));
        this.guides(r.guides);
        return;
      }
      case 'handle': {
        const role = handleRole(drag.start, drag.handle);
        const snapOpts = mods.alt ? { ...opts, grid: null, surfaces: false } : opts;
        // An end of a kind drawn with a thickness (a branch) rests that much above the surface.
        const thickness = 'thickness' in drag.start ? drag.start.thickness : 0;
        const { point, guides } =
          drag.handle === 'rotate'
            ? { point: d, guides: [] }
            : snapPoint(s.design, d, role, snapOpts, new Set([drag.id]), thickness);
        const next = applyHandle(
          drag.start,
          drag.handle,
          point,
          drag.handle === 'rotate' && (mods.shift || opts.grid !== null),
        );
        s.edit((doc) => replaceObjects(doc, new Map([[drag.id, next]])));
        this.guides(guides);
        return;
      }
      case 'marquee': {
        const rect = rectFromPoints(drag.from, d);
        const hits = s.design.objects.filter((o) => rectsIntersect(rect, objectBounds(o))).map((o) => o.id);
        const probes = (s.design.probes ?? [])
          .filter(
            (pr) =>
              pr.x >= rect.x && pr.x <= rect.x + rect.width && pr.y >= rect.y && pr.y <= rect.y + rect.height,
          )
          .map((pr) => pr.id);
        const selection = [...drag.base, ...[...hits, ...probes].filter((id) => !drag.base.includes(id))];
        s.setSession({ marquee: rect, selection });
        return;
      }
      case 'place': {
        const { snap } = kindOf(drag.type);
        const { point, guides } = snapPoint(s.design, d, snap.drag, opts, new Set(), snap.newThickness ?? 0);
        const obj = objectForDrag(drag.type, drag.id, drag.from, point);
        const base = s.getState().history.gestureBase ?? s.design;
        s.edit(() => (obj ? addObject(base, obj) : base));
        this.guides(guides);
        return;
      }
      case 'ruler': {
        const { point } = snapPoint(s.design, d, 'free', mods.alt ? { ...opts, grid: null } : opts);
        s.setSession({ ruler: { a: drag.from, b: point } });
        return;
      }
      case 'probe':
        return;
      case 'backdrop-move': {
        const moved = moveBackdrop(drag.start, d.x - drag.from.x, d.y - drag.from.y);
        s.edit((doc) => setBackdrop(doc, moved));
        return;
      }
      case 'backdrop-corner': {
        const next = dragBackdropCorner(drag.start, drag.corner, d);
        s.edit((doc) => setBackdrop(doc, next));
        return;
      }
    }
  }

  up(p: Point, mods: Modifiers) {
    const drag = this.drag;
    this.drag = null;
    if (!drag) return;
    const s = this.store;
    const wasDrag = this.dragging;
    this.dragging = false;
    switch (drag.kind) {
      case 'move':
      case 'handle':
      case 'backdrop-move':
      case 'backdrop-corner':
        if (wasDrag) s.endGesture();
        return;
      case 'marquee':
        s.setSession({ marquee: null });
        return;
      case 'place': {
        if (!wasDrag) {
          A.placeObject(s, drag.type, this.toDesign(p));
          return;
        }
        const placed = s.design.objects.some((o) => o.id === drag.id);
        s.endGesture();
        if (placed) s.setSession({ selection: [drag.id], tool: 'select', tab: 'inspect' });
        return;
      }
      case 'probe': {
        if (wasDrag) return;
        const d = this.toDesign(p);
        const { width, height } = s.design.enclosure;
        if (d.x < 0 || d.y < 0 || d.x > width || d.y > height) return;
        const id = A.addProbeAt(s, d);
        s.setSession({ selection: [id] });
        return;
      }
      case 'ruler':
        if (!wasDrag && !mods.shift) s.setSession({ ruler: null });
        return;
      case 'pan':
        if (!wasDrag && drag.tap) A.select(s, drag.tap);
        return;
    }
  }

  /** Abandons the drag (Escape, pointer cancel): the document goes back to where it was. */
  cancel() {
    if (this.drag && this.dragging && this.store.inGesture) this.store.cancelGesture();
    if (this.drag?.kind === 'marquee') this.store.setSession({ marquee: null });
    this.drag = null;
    this.dragging = false;
  }

  cursor(p: Point, mods: Modifiers): string {
    const tool = this.store.session.tool;
    if (this.drag?.kind === 'pan') return 'grabbing';
    if (mods.pan || tool === 'pan') return 'grab';
    if (isPlaceTool(tool) || tool === 'ruler' || tool === 'probe') return 'crosshair';
    if (this.store.session.backdropAdjust) {
      const hit = this.backdropAt(p);
      return hit ? (hit.corner ? HANDLE_CURSORS[hit.corner] : 'move') : 'grab';
    }
    const h = this.handleAt(p);
    if (h) return h.handle === 'rotate' ? 'alias' : HANDLE_CURSORS[h.handle];
    if (this.probeAt(p) || this.objectAt(p)) return 'move';
    return 'default';
  }
}

const HANDLE_CURSORS: Record<HandleId, string> = {
  p1: 'crosshair',
  p2: 'crosshair',
  rotate: 'alias',
  nw: 'nwse-resize',
  se: 'nwse-resize',
  ne: 'nesw-resize',
  sw: 'nesw-resize',
  n: 'ns-resize',
  s: 'ns-resize',
  e: 'ew-resize',
  w: 'ew-resize',
  'len-w': 'ew-resize',
  'len-e': 'ew-resize',
};
