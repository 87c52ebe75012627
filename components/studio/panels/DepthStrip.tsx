'use client';
// A small top view of the enclosure (front at the bottom): the line where the side view cuts it and
// every lamp at its depth. The line and each lamp are sliders: arrow keys move them a grid step (Shift:
// ten), Home/End to the front/back; a drag moves them too (mouse, pen or touch). Each key press is one
// undo step, a drag one gesture, through the store's history like every other edit.
import { useEffect, useRef, useState, type KeyboardEvent, type PointerEvent } from 'react';
import { formatLength } from '@/shared/units';
import { useCommandContext, useStudio } from '../hooks/useStudio';
import { select } from '../state/actions';
import { clampDepth, depthRelation, lampDepth, lampsOf, sectionDepth } from '../state/depth';
import { depthStepCm, setLampDepth, setSection } from '../state/depthActions';
import { gridStepCm } from '../state/session';
import type { LampObject } from '../state/types';
import { focusRing } from './CommandButton';

/** Tallest the drawing may be, px: the panel below it keeps its room. */
const MAX_HEIGHT_PX = 84;

/** The new value for a slider key, or null for keys the slider does not use. */
export function sliderKey(
  e: Pick<KeyboardEvent, 'key' | 'shiftKey'>,
  value: number,
  max: number,
  step: number,
): number | null {
  const k = e.shiftKey ? 10 : 1;
  switch (e.key) {
    case 'ArrowUp':
    case 'ArrowRight':
      return value + step * k;
    case 'ArrowDown':
    case 'ArrowLeft':
      return value - step * k;
    case 'PageUp':
      return value + step * 10;
    case 'PageDown':
      return value - step * 10;
    case 'Home':
      return 0;
    case 'End':
      return max;
    default:
      return null;
  }
}

type Drag =
  { pointerId: number; kind: 'section' } | { pointerId: number; kind: 'lamp'; id: string; grab: number };

export function DepthStrip() {
  const { store } = useCommandContext();
  const design = useStudio(store, (s) => s.history.present);
  const selection = useStudio(store, (s) => s.session.selection);
  const unit = useStudio(store, (s) => s.session.lengthUnit);
  const snapGrid = useStudio(store, (s) => s.session.snapGrid);
  const readOnly = useStudio(store, (s) => s.readOnly);
  const outer = useRef<HTMLDivElement>(null);
  const drawing = useRef<HTMLDivElement>(null);
  const drag = useRef<Drag | null>(null);
  const [room, setRoom] = useState(300);
  useEffect(() => {
    const el = outer.current;
    if (!el) return;
    const ro = new ResizeObserver(() => setRoom(el.clientWidth));
    ro.observe(el);
    setRoom(el.clientWidth);
    return () => ro.disconnect();
  }, []);

  const { width: W, depth: D } = design.enclosure;
  const scale = Math.min(room / W, MAX_HEIGHT_PX / D);
  const section = sectionDepth(design);
  const lamps = design.objects.filter((o): o is LampObject => o.type === 'lamp');
  const selectedLamps = lampsOf(design, selection);
  const top = (z: number) => (D - z) * scale;
  const L = (cm: number) => formatLength(cm, unit);

  /** Depth under the pointer, snapped to the grid when snapping is on. */
  const depthAt = (clientY: number): number => {
    const r = drawing.current!.getBoundingClientRect();
    const z = (r.bottom - clientY) / scale;
    const step = snapGrid ? gridStepCm(unit) : 0.1;
    return Math.round(z / step) * step;
  };

  const onPointerDown = (e: PointerEvent<HTMLDivElement>) => {
    if (readOnly || (e.pointerType === 'mouse' && e.button !== 0)) return;
    const handle = (e.target as HTMLElement).closest<HTMLElement>('[data-depth-handle]');
    const lampId = handle?.dataset.lampId;
    e.preventDefault();
    e.currentTarget.setPointerCapture(e.pointerId);
    store.beginGesture();
    if (lampId) {
      const lamp = lamps.find((l) => l.id === lampId)!;
      select(store, [lampId]);
      drag.current = {
        pointerId: e.pointerId,
        kind: 'lamp',
        id: lampId,
        grab: depthAt(e.clientY) - lampDepth(design, lamp),
      };
    } else {
      drag.current = { pointerId: e.pointerId, kind: 'section' };
      // A press off the line moves the line there.
      if (!handle) setSection(store, depthAt(e.clientY));
    }
    handle?.focus();
  };
  const onPointerMove = (e: PointerEvent<HTMLDivElement>) => {
    const d = drag.current;
    if (!d || d.pointerId !== e.pointerId) return;
    if (d.kind === 'section') setSection(store, depthAt(e.clientY));
    else setLampDepth(store, d.id, depthAt(e.clientY) - d.grab);
  };
  const endDrag = (e: PointerEvent<HTMLDivElement>, keep: boolean) => {
    const d = drag.current;
    if (!d || d.pointerId !== e.pointerId) return;
    drag.current = null;
    if (keep) store.endGesture();
    else store.cancelGesture();
  };

  const keysFor = (value: number, set: (z: number) => void) => (e: KeyboardEvent<HTMLDivElement>) => {
    if (readOnly) return;
    const next = sliderKey(e, value, D, depthStepCm(store));
    if (next === null) return;
    // The studio's own shortcuts (arrows nudge, PageUp moves the selected lamp) must not run as well.
    e.preventDefault();
    e.stopPropagation();
    set(clampDepth(design, next));
  };

  return (
    <section
      aria-label="Top view: depth"
      className="border-b border-basalt-200 px-3 py-2"
      data-testid="depth-strip"
    >
      <div className="flex items-baseline justify-between gap-2 text-caption">
        <h3 className="font-medium text-basalt-800">Top view</h3>
        <span className="text-basalt-600" data-testid="depth-section-text">
          Side view {L(section)} from the front
        </span>
      </div>
      <div ref={outer} className="mt-1 w-full">
        <p className="text-center text-[0.65rem] leading-3 text-basalt-500" aria-hidden="true">
          back
        </p>
        <div
          ref={drawing}
          data-testid="depth-drawing"
          className={`relative mx-auto my-0.5 rounded-sm border border-basalt-400 bg-basalt-50 ${readOnly ? '' : 'cursor-ns-resize'}`}
          style={{ width: W * scale, height: D * scale, touchAction: 'none' }}
          onPointerDown={onPointerDown}
          onPointerMove={onPointerMove}
          onPointerUp={(e) => endDrag(e, true)}
          onPointerCancel={(e) => endDrag(e, false)}
        >
          {lamps.map((l) => {
            const z = lampDepth(design, l);
            const selected = selection.includes(l.id);
            const tube = l.form === 'tube';
            const len = tube ? (l.length ?? 0) * scale : 0;
            const left = tube ? (l.x - (l.length ?? 0) / 2) * scale : l.x * scale - 7;
            const name = l.name ?? l.id;
            return (
              <div
                key={l.id}
                role="slider"
                tabIndex={0}
                data-depth-handle="lamp"
                data-lamp-id={l.id}
                data-testid={`depth-lamp-${l.id}`}
                aria-label={`Depth of lamp ${name}`}
                aria-orientation="vertical"
                aria-valuemin={0}
                aria-valuemax={D}
                aria-valuenow={z}
                aria-valuetext={`${L(z)} from the front, ${depthRelation(design, l, unit)}`}
                aria-readonly={readOnly || undefined}
                onKeyDown={keysFor(z, (v) => {
                  if (!selected) select(store, [l.id]);
                  setLampDepth(store, l.id, v);
                })}
                className={`absolute flex items-center justify-center rounded-full ${focusRing}`}
                style={{ left, top: top(z) - 7, width: tube ? Math.max(len, 14) : 14, height: 14 }}
              >
                <span
                  className={`block rounded-full ${selected ? 'bg-sky-600 ring-2 ring-sky-300' : 'bg-sand-600'}`}
                  style={tube ? { width: '100%', height: 5 } : { width: 10, height: 10 }}
                />
              </div>
            );
          })}
          <div
            role="slider"
            tabIndex={0}
            data-depth-handle="section"
            data-testid="depth-section"
            aria-label="Side view plane"
            aria-orientation="vertical"
            aria-valuemin={0}
            aria-valuemax={D}
            aria-valuenow={section}
            aria-valuetext={`${L(section)} from the front`}
            aria-readonly={readOnly || undefined}
            onKeyDown={keysFor(section, (v) => setSection(store, v))}
            className={`absolute left-0 w-full ${focusRing}`}
            style={{ top: top(section) - 6, height: 12 }}
          >
            <span
              className="absolute left-0 top-[5px] w-full border-t-2 border-dashed border-moss-700"
              aria-hidden="true"
            />
          </div>
        </div>
        <p className="text-center text-[0.65rem] leading-3 text-basalt-500" aria-hidden="true">
          front
        </p>
      </div>
      <p className="mt-1 text-caption text-basalt-600" data-testid="depth-lamp-text">
        {selectedLamps.length === 1
          ? `${selectedLamps[0]!.name ?? selectedLamps[0]!.id}: ${L(lampDepth(design, selectedLamps[0]!))} from the front, ${depthRelation(design, selectedLamps[0]!, unit)}.`
          : readOnly
            ? 'The fields are computed in the side view’s plane.'
            : 'Drag the dashed line or a lamp, or focus it and use the arrow keys. The fields are computed in the side view’s plane.'}
      </p>
    </section>
  );
}
