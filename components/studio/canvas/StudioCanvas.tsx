'use client';
// The Konva stage: layers for the backdrop and fields, the objects, and the overlay. Pointer input
// is taken from the wrapping element (pointer events, wheel, pinch, drop from the palette) and
// handed to the framework-free CanvasInteraction.
import {
  useEffect,
  useMemo,
  useRef,
  useState,
  type DragEvent,
  type KeyboardEvent as ReactKeyboardEvent,
  type MouseEvent as ReactMouseEvent,
  type PointerEvent as ReactPointerEvent,
} from 'react';
import { Layer, Stage } from 'react-konva';
import { designToStage, stageToDesign, zoomAt, type Point } from '../geometry/camera';
import { objectBounds } from '../geometry/objects';
import * as A from '../state/actions';
import { isPlaceTool, type PlaceTool } from '../state/session';
import type { StudioStore } from '../state/store';
import type { Atom } from '../state/atom';
import type { ProbePoint } from '../state/types';
import { useAtom, useStudio } from '../hooks/useStudio';
import { sampleAll, type Reading } from '../fields/sample';
import type { FieldGrid } from '@/simulation';
import { CanvasInteraction, type Modifiers } from './interaction';
import { BackdropPhoto, EnclosureBack, EnclosureWalls, GridShape } from './Backdrop';
import { BackdropFrame } from './BackdropFrame';
import { HusbandryLayer } from './HusbandryLayer';
import type { MeshRisk } from '@/simulation';
import type { Finding } from '../fields/engineTypes';
import { FieldBands, type ColouredBand } from './FieldBands';
import { LampLabels, useLampLabels } from './LampLabels';
import { ObjectShape } from './ObjectShape';
import {
  GuidesLayer,
  HighlightLayer,
  MarqueeLayer,
  PointerReadout,
  ProbePins,
  useProbeTips,
  RulerLayer,
  SelectionLayer,
  type HighlightShape,
} from './Overlay';
import { Rulers } from './Rulers';
import { markFieldVisible } from '../fields/early';

export const PALETTE_DRAG_TYPE = 'application/x-baskwell-tool';
/** How long a finger rests (ms) before its press opens the actions menu. */
export const LONG_PRESS_MS = 500;
/** How far (px) a resting finger may wander and still count as a long press. */
export const LONG_PRESS_SLOP_PX = 10;

export interface PointerInfo {
  stage: Point;
  design: Point;
}

export interface CanvasProps {
  store: StudioStore;
  pointer: Atom<PointerInfo | null>;
  grid: FieldGrid | null;
  bands: ColouredBand[];
  probeReadings: Map<string, Reading>;
  highlight: HighlightShape | null;
  summaryId: string;
  /** The backdrop's photo once loaded (and only if this user may see it). */
  photo: HTMLImageElement | null;
  /** The shared-basking finding of the current check, if a species is chosen. */
  basking?: Finding;
  /** The chosen species climbs: each mesh it can hang from, with the lamps near it (marked). */
  meshRisks?: MeshRisk[] | null;
}

/** Shared so that a design without probes keeps one array between frames. */
const NO_PROBES: readonly ProbePoint[] = [];

function mods(
  e: { shiftKey: boolean; ctrlKey: boolean; metaKey: boolean; altKey: boolean; pointerType?: string },
  pan = false,
): Modifiers {
  return {
    shift: e.shiftKey,
    mod: e.ctrlKey || e.metaKey,
    alt: e.altKey,
    pan,
    touch: e.pointerType === 'touch',
  };
}

function PointerProbe({
  pointer,
  grid,
  store,
}: {
  pointer: Atom<PointerInfo | null>;
  grid: FieldGrid | null;
  store: StudioStore;
}) {
  const p = useAtom(pointer);
  const tool = useStudio(store, (s) => s.session.tool);
  const temp = useStudio(store, (s) => s.session.tempUnit);
  const viewport = useStudio(store, (s) => s.session.viewport);
  if (tool !== 'probe' || !p || !grid) return null;
  const reading = sampleAll(grid, p.design.x, p.design.y);
  return <PointerReadout at={p.stage} reading={reading} temp={temp} viewport={viewport} />;
}

export default function StudioCanvas({
  store,
  pointer,
  grid,
  bands,
  probeReadings,
  highlight,
  summaryId,
  photo,
  basking,
  meshRisks = null,
}: CanvasProps) {
  const wrap = useRef<HTMLDivElement>(null);
  const ui = useMemo(() => new CanvasInteraction(store), [store]);
  const state = useStudio(store, (s) => s);
  const { session } = state;
  const design = state.history.present;
  const cam = session.camera;
  const lampLabels = useLampLabels(design.objects, cam, session.viewport);
  const probeTips = useProbeTips(
    cam,
    design.probes ?? NO_PROBES,
    probeReadings,
    session.tempUnit,
    session.viewport,
  );
  // The marks' labels keep clear of what else is written near a basking spot.
  const labelled = useMemo(() => [...lampLabels, ...probeTips], [lampLabels, probeTips]);
  const [cursor, setCursor] = useState('default');
  const spaceDown = useRef(false);
  const touches = useRef(new Map<number, Point>());
  const pinch = useRef<{ dist: number; mid: Point } | null>(null);
  const longPress = useRef<{ timer: number; at: Point } | null>(null);
  const lastPointerType = useRef('mouse');

  const endLongPress = () => {
    if (longPress.current) window.clearTimeout(longPress.current.timer);
    longPress.current = null;
  };
  useEffect(() => endLongPress, []);

  /** Opens the actions menu at a stage point, for the object or probe there (selecting it) or for none. */
  const openActions = (p: Point) => {
    ui.cancel();
    const id = ui.probeAt(p) ?? ui.objectAt(p)?.id ?? null;
    if (id && !store.session.selection.includes(id)) A.select(store, [id]);
    store.setSession({ actionsMenu: { at: p, objectId: id } });
  };

  // Size the stage to its box; fit the design the first time the size is known.
  useEffect(() => {
    const el = wrap.current;
    if (!el) return;
    const ro = new ResizeObserver(() => {
      const r = el.getBoundingClientRect();
      const viewport = { width: Math.max(1, Math.floor(r.width)), height: Math.max(1, Math.floor(r.height)) };
      const { fitted, viewport: before, camera } = store.session;
      // A banner or a sheet that appears before anyone has zoomed or panned (a safety banner arriving
      // with the first check, on a phone) fits the design again, so none of it is pushed out of view.
      if (fitted && A.stillFitted(store, before)) {
        store.setSession({ viewport });
        A.fitView(store);
        return;
      }
      // Once fitted, a resize (a sheet opening under the canvas, a phone turned) keeps the design point
      // in the middle of the canvas where it was, instead of pinning the top left.
      store.setSession(
        fitted
          ? {
              viewport,
              camera: {
                ...camera,
                originX: camera.originX + (viewport.width - before.width) / 2,
                originY: camera.originY + (viewport.height - before.height) / 2,
              },
            }
          : { viewport },
      );
      if (!store.session.fitted) A.fitView(store);
    });
    ro.observe(el);
    return () => ro.disconnect();
  }, [store]);

  // Wheel zoom needs a non-passive listener to keep the page from scrolling.
  useEffect(() => {
    const el = wrap.current;
    if (!el) return;
    const onWheel = (e: WheelEvent) => {
      e.preventDefault();
      const r = el.getBoundingClientRect();
      const anchor = { x: e.clientX - r.left, y: e.clientY - r.top };
      const unit = e.deltaMode === 1 ? 16 : 1;
      // ctrlKey is set for trackpad pinch gestures, which send small deltas.
      const factor = Math.exp(-e.deltaY * unit * (e.ctrlKey ? 0.01 : 0.0015));
      A.zoomBy(store, factor, anchor);
    };
    el.addEventListener('wheel', onWheel, { passive: false });
    return () => el.removeEventListener('wheel', onWheel);
  }, [store]);

  // Space held: temporary pan, as in most drawing programs.
  useEffect(() => {
    const down = (e: KeyboardEvent) => {
      if (e.code === 'Space' && e.target === wrap.current) {
        spaceDown.current = true;
        e.preventDefault();
      }
    };
    const up = (e: KeyboardEvent) => {
      if (e.code === 'Space') spaceDown.current = false;
    };
    window.addEventListener('keydown', down);
    window.addEventListener('keyup', up);
    return () => {
      window.removeEventListener('keydown', down);
      window.removeEventListener('keyup', up);
    };
  }, []);

  const local = (e: { clientX: number; clientY: number }): Point => {
    const r = wrap.current!.getBoundingClientRect();
    return { x: e.clientX - r.left, y: e.clientY - r.top };
  };

  const onPointerDown = (e: ReactPointerEvent<HTMLDivElement>) => {
    lastPointerType.current = e.pointerType;
    if (e.button !== 0 && e.button !== 1) return;
    wrap.current?.focus({ preventScroll: true });
    wrap.current?.setPointerCapture(e.pointerId);
    const p = local(e);
    if (e.pointerType === 'touch') {
      touches.current.set(e.pointerId, p);
      endLongPress();
      if (touches.current.size === 1) {
        // A finger that rests without moving asks for the actions of what it rests on.
        const timer = window.setTimeout(() => {
          longPress.current = null;
          if (touches.current.size === 1) openActions(p);
        }, LONG_PRESS_MS);
        longPress.current = { timer, at: p };
      }
      if (touches.current.size === 2) {
        ui.cancel();
        const [a, b] = [...touches.current.values()] as [Point, Point];
        pinch.current = {
          dist: Math.hypot(a.x - b.x, a.y - b.y),
          mid: { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 },
        };
        return;
      }
    }
    ui.down(p, mods(e, e.button === 1 || spaceDown.current));
    setCursor(ui.cursor(p, mods(e, spaceDown.current)));
  };

  const onPointerMove = (e: ReactPointerEvent<HTMLDivElement>) => {
    const p = local(e);
    const lp = longPress.current;
    if (lp && Math.hypot(p.x - lp.at.x, p.y - lp.at.y) > LONG_PRESS_SLOP_PX) endLongPress();
    if (e.pointerType === 'touch' && touches.current.has(e.pointerId)) {
      touches.current.set(e.pointerId, p);
      if (pinch.current && touches.current.size === 2) {
        const [a, b] = [...touches.current.values()] as [Point, Point];
        const dist = Math.hypot(a.x - b.x, a.y - b.y);
        const mid = { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
        const prev = pinch.current;
        let camera = zoomAt(store.session.camera, prev.mid, dist / Math.max(prev.dist, 1));
        camera = {
          ...camera,
          originX: camera.originX + mid.x - prev.mid.x,
          originY: camera.originY + mid.y - prev.mid.y,
        };
        store.setSession({ camera });
        pinch.current = { dist, mid };
        return;
      }
    }
    pointer.set({ stage: p, design: stageToDesign(store.session.camera, p) });
    ui.move(p, mods(e, spaceDown.current));
    // A finger that has started to drag (the view, an object) is not resting: no actions menu.
    if (ui.moved) endLongPress();
    if (!ui.active) setCursor(ui.cursor(p, mods(e, spaceDown.current)));
  };

  const onPointerUp = (e: ReactPointerEvent<HTMLDivElement>) => {
    touches.current.delete(e.pointerId);
    endLongPress();
    if (pinch.current) {
      if (touches.current.size < 2) pinch.current = null;
      return;
    }
    const p = local(e);
    ui.up(p, mods(e, spaceDown.current));
    setCursor(ui.cursor(p, mods(e, spaceDown.current)));
  };

  // A right click opens the actions menu; a touch's long press does so through its own timer (the
  // browser's contextmenu after a long touch is swallowed so the two never both open it).
  const onContextMenu = (e: ReactMouseEvent<HTMLDivElement>) => {
    e.preventDefault();
    if (lastPointerType.current === 'touch') return;
    openActions(local(e));
  };

  // The context-menu key or Shift+F10 opens the same menu for the selection, from the keyboard.
  const onKeyDown = (e: ReactKeyboardEvent<HTMLDivElement>) => {
    if (e.key !== 'ContextMenu' && !(e.shiftKey && e.key === 'F10')) return;
    e.preventDefault();
    e.stopPropagation();
    const vp = store.session.viewport;
    const first = store.design.objects.find((o) => store.session.selection.includes(o.id));
    const b = first ? objectBounds(first) : null;
    const at = b
      ? designToStage(store.session.camera, { x: b.x + b.width / 2, y: b.y + b.height / 2 })
      : { x: vp.width / 2, y: vp.height / 2 };
    store.setSession({ actionsMenu: { at, objectId: first?.id ?? null } });
  };

  const onDragOver = (e: DragEvent<HTMLDivElement>) => {
    if (e.dataTransfer.types.includes(PALETTE_DRAG_TYPE)) {
      e.preventDefault();
      e.dataTransfer.dropEffect = 'copy';
    }
  };

  const onDrop = (e: DragEvent<HTMLDivElement>) => {
    const type = e.dataTransfer.getData(PALETTE_DRAG_TYPE);
    if (!isPlaceTool(type as PlaceTool)) return;
    e.preventDefault();
    A.placeObject(store, type as PlaceTool, stageToDesign(store.session.camera, local(e)));
    wrap.current?.focus({ preventScroll: true });
  };

  // Drawn in this commit's frame: the first field on screen when the page brought no picture of it.
  const fieldShown = session.fieldsVisible && bands.length > 0;
  useEffect(() => {
    if (fieldShown) markFieldVisible();
  }, [fieldShown]);

  const selected = design.objects.filter((o) => session.selection.includes(o.id));
  const backdrop = design.backdrop;
  const photoShown = backdrop && backdrop.visible && photo ? backdrop : null;

  return (
    <div
      ref={wrap}
      data-testid="studio-canvas"
      role="application"
      aria-roledescription="design canvas"
      aria-label="Enclosure side view. Use the tool shortcuts, arrow keys to nudge the selection, Enter to place with the current tool."
      aria-describedby={summaryId}
      tabIndex={0}
      className="relative h-full w-full touch-none overflow-hidden bg-basalt-100 outline-none focus-visible:ring-2 focus-visible:ring-sky-600 focus-visible:ring-inset"
      style={{ cursor }}
      onPointerDown={onPointerDown}
      onPointerMove={onPointerMove}
      onPointerUp={onPointerUp}
      onContextMenu={onContextMenu}
      onKeyDown={onKeyDown}
      onPointerCancel={(e) => {
        touches.current.delete(e.pointerId);
        endLongPress();
        pinch.current = null;
        ui.cancel();
      }}
      onPointerLeave={() => {
        if (!ui.active) pointer.set(null);
      }}
      onDragOver={onDragOver}
      onDrop={onDrop}
    >
      <Stage width={session.viewport.width} height={session.viewport.height} listening={false}>
        <Layer listening={false}>
          <GridShape cam={cam} viewport={session.viewport} unit={session.lengthUnit} />
          <EnclosureBack cam={cam} enclosure={design.enclosure} />
          {photoShown && <BackdropPhoto cam={cam} backdrop={photoShown} image={photo!} />}
          {session.fieldsVisible && bands.length > 0 && (
            <FieldBands cam={cam} enclosure={design.enclosure} bands={bands} opacity={session.fieldOpacity} />
          )}
          <EnclosureWalls cam={cam} enclosure={design.enclosure} unit={session.lengthUnit} />
        </Layer>
        <Layer listening={false}>
          {design.objects.map((o) => (
            <ObjectShape key={o.id} o={o} cam={cam} />
          ))}
          <LampLabels labels={lampLabels} />
        </Layer>
        <Layer listening={false}>
          <HusbandryLayer
            cam={cam}
            design={design}
            basking={basking}
            meshRisks={meshRisks}
            unit={session.lengthUnit}
            avoid={labelled}
            viewport={session.viewport}
          />
          <HighlightLayer cam={cam} design={design} shape={highlight} />
          {photoShown && session.backdropAdjust && <BackdropFrame cam={cam} backdrop={photoShown} />}
          <SelectionLayer cam={cam} objects={selected} showHandles={session.tool === 'select'} />
          <ProbePins tips={probeTips} selection={session.selection} />
          <GuidesLayer cam={cam} guides={session.guides} viewport={session.viewport} />
          <MarqueeLayer cam={cam} rect={session.marquee} />
          <RulerLayer cam={cam} ruler={session.ruler} unit={session.lengthUnit} />
          <Rulers cam={cam} viewport={session.viewport} unit={session.lengthUnit} />
          <PointerProbe pointer={pointer} grid={grid} store={store} />
        </Layer>
      </Stage>
    </div>
  );
}
