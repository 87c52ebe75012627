import { describe, expect, it } from 'vitest';
import { designSchema } from '@/simulation';
import { CanvasInteraction, type Modifiers } from './interaction';
import { StudioStore } from '../state/store';
import { exampleDesign } from '../examples/exampleDesign';
import { designToStage, type Point } from '../geometry/camera';
import type { PerchObject } from '../state/types';

const none: Modifiers = { shift: false, mod: false, alt: false };

function setup() {
  // 5 px per cm, origin at (50, 400): design (x, y) is at stage (50 + 5x, 400 - 5y).
  const store = new StudioStore(exampleDesign(), { camera: { zoom: 5, originX: 50, originY: 400 } });
  const ui = new CanvasInteraction(store);
  const at = (x: number, y: number): Point => designToStage(store.session.camera, { x, y });
  const drag = (from: Point, to: Point, mods = none, steps = 5) => {
    ui.down(from, mods);
    for (let i = 1; i <= steps; i++) {
      ui.move({ x: from.x + ((to.x - from.x) * i) / steps, y: from.y + ((to.y - from.y) * i) / steps }, mods);
    }
    ui.up(to, mods);
  };
  const obj = (id: string) => store.design.objects.find((o) => o.id === id);
  return { store, ui, at, drag, obj };
}

describe('canvas interaction', () => {
  it('clicking an object selects it; shift-click adds; clicking empty space clears', () => {
    const { store, ui, at } = setup();
    ui.down(at(45, 29), none);
    ui.up(at(45, 29), none);
    expect(store.session.selection).toEqual(['b1']);
    ui.down(at(15, 7), { ...none, shift: true });
    ui.up(at(15, 7), none);
    expect(store.session.selection).toEqual(['b1', 'h1']);
    ui.down(at(60, 50), none);
    ui.up(at(60, 50), none);
    expect(store.session.selection).toEqual([]);
  });

  it('in a view-only studio a finger selects what it taps and its drag moves the view, not the object', () => {
    const { store, ui, at, drag } = setup();
    store.setReadOnly(true);
    const touch = { ...none, touch: true };
    const before = store.design;
    // The first finger of a pinch selects nothing: the selection waits for a lift without a drag.
    ui.down(at(45, 29), touch);
    expect(store.session.selection).toEqual([]);
    ui.cancel();
    expect(store.session.selection).toEqual([]);
    ui.down(at(45, 29), touch);
    ui.up(at(45, 29), touch);
    expect(store.session.selection).toEqual(['b1']);
    const cam = store.session.camera;
    drag(at(45, 29), { x: at(45, 29).x + 40, y: at(45, 29).y - 10 }, touch);
    expect(store.session.camera.originX).toBeCloseTo(cam.originX + 40);
    expect(store.session.camera.originY).toBeCloseTo(cam.originY - 10);
    expect(store.design).toBe(before);
    // A tap on empty space clears the selection; a mouse there still draws a selection box.
    ui.down(at(60, 50), touch);
    ui.up(at(60, 50), touch);
    expect(store.session.selection).toEqual([]);
    drag(at(40, 35), at(50, 25));
    expect(store.session.selection).toEqual(['b1']);
  });

  it('drags a perch with grid snapping as one undo step', () => {
    const { store, at, drag, obj } = setup();
    drag(at(45, 29), at(55.3, 30.2));
    const p = obj('b1') as PerchObject;
    expect(p.x1).toBe(30); // 20 + 10.3 → anchor snapped to the 1 cm grid
    expect(p.y1).toBe(21);
    expect(store.canUndo()).toBe(true);
    store.undo();
    expect(obj('b1')).toMatchObject({ x1: 20, y1: 20 });
    expect(store.canUndo()).toBe(false);
  });

  it('a press without movement changes nothing', () => {
    const { store, ui, at } = setup();
    const before = store.design;
    ui.down(at(45, 29), none);
    ui.move({ x: at(45, 29).x + 1, y: at(45, 29).y }, none);
    ui.up(at(45, 29), none);
    expect(store.design).toBe(before);
    expect(store.canUndo()).toBe(false);
  });

  it('resizes the selected box from a handle', () => {
    const { store, at, drag, obj } = setup();
    store.setSession({ selection: ['h1'] });
    drag(at(30, 14), at(40, 20)); // top-right corner of the hide
    expect(obj('h1')).toMatchObject({ x: 5, y: 0, width: 35, height: 20 });
  });

  it('selects by marquee', () => {
    const { store, at, drag } = setup();
    drag(at(3, 57), at(32, 1));
    expect(store.session.selection.sort()).toEqual(['b1', 'h1']);
    expect(store.session.marquee).toBeNull();
  });

  it('places by click and by drag, one undo step each, then returns to Select', () => {
    const { store, ui, at, drag, obj } = setup();
    store.setSession({ tool: 'hide' });
    ui.down(at(60, 1), none);
    ui.up(at(60, 1), none);
    expect(obj('hide-1')).toMatchObject({ y: 0 }); // snapped onto the floor
    expect(store.session.tool).toBe('select');
    store.setSession({ tool: 'perch' });
    drag(at(0.5, 10), at(50, 35));
    expect(obj('perch-1')).toMatchObject({ x1: 0, x2: 50, y2: 35 });
    expect(store.session.selection).toEqual(['perch-1']);
    store.undo();
    expect(obj('perch-1')).toBeUndefined();
    expect(obj('hide-1')).toBeDefined();
    expect(designSchema.safeParse(store.design).success).toBe(true);
  });

  it('centres a clicked perch on the click, and lands a dragged perch end on the floor', () => {
    const { store, ui, at, drag, obj } = setup();
    store.setSession({ tool: 'perch' });
    ui.down(at(60, 1), none);
    ui.up(at(60, 1), none);
    const p = obj('perch-1') as PerchObject;
    expect((p.x1 + p.x2) / 2).toBeCloseTo(60, 1);
    expect((p.y1 + p.y2) / 2).toBeCloseTo(1, 1); // not pulled onto the floor
    store.setSession({ tool: 'perch' });
    drag(at(50, 2.5), at(70, 30));
    expect(obj('perch-2')).toMatchObject({ x1: 50, y1: 2 }); // underside on the floor (4 cm thick)
  });

  it('pans with the pan tool without touching the document', () => {
    const { store, at, drag } = setup();
    store.setSession({ tool: 'pan' });
    const before = store.design;
    drag(at(10, 10), { x: at(10, 10).x + 40, y: at(10, 10).y - 20 });
    expect(store.session.camera.originX).toBe(90);
    expect(store.session.camera.originY).toBe(380);
    expect(store.design).toBe(before);
  });

  it('pins a probe with the probe tool and measures with the ruler', () => {
    const { store, ui, at, drag } = setup();
    store.setSession({ tool: 'probe' });
    ui.down(at(40, 30), none);
    ui.up(at(40, 30), none);
    expect(store.design.probes).toEqual([{ id: 'probe-1', x: 40, y: 30 }]);
    store.setSession({ tool: 'ruler' });
    drag(at(0, 0), at(30, 40));
    expect(store.session.ruler).toEqual({ a: { x: 0, y: 0 }, b: { x: 30, y: 40 } });
  });

  it('Escape during a drag puts everything back', () => {
    const { store, ui, at, obj } = setup();
    ui.down(at(45, 29), none);
    ui.move(at(80, 50), none);
    expect(obj('b1')).not.toMatchObject({ x1: 20 });
    ui.cancel();
    expect(obj('b1')).toMatchObject({ x1: 20, y1: 20 });
    expect(store.canUndo()).toBe(false);
  });
});
