import { describe, expect, it, vi } from 'vitest';
import { StudioStore } from './store';
import { exampleDesign } from '../examples/exampleDesign';
import { moveObjects } from './document';
import { placeObject, select } from './actions';

describe('StudioStore', () => {
  it('keeps document and session apart: session changes are not undoable', () => {
    const s = new StudioStore(exampleDesign());
    s.setSession({ tool: 'perch', selection: ['b1'] });
    expect(s.canUndo()).toBe(false);
    s.edit((d) => moveObjects(d, ['b1'], 1, 0));
    s.setSession({ tool: 'select' });
    s.undo();
    expect(s.session.tool).toBe('select');
    expect(s.session.selection).toEqual(['b1']);
  });

  it('records one drag as one step', () => {
    const s = new StudioStore(exampleDesign());
    s.beginGesture();
    for (let i = 0; i < 10; i++) s.edit((d) => moveObjects(d, ['b1'], 1, 0));
    s.endGesture();
    expect(s.design.objects.find((o) => o.id === 'b1')).toMatchObject({ x1: 30 });
    s.undo();
    expect(s.design.objects.find((o) => o.id === 'b1')).toMatchObject({ x1: 20 });
    expect(s.canUndo()).toBe(false);
  });

  it('drops selected ids that no longer exist after undo', () => {
    const s = new StudioStore(exampleDesign());
    const id = placeObject(s, 'hide', { x: 60, y: 0 });
    expect(s.session.selection).toEqual([id]);
    s.undo();
    expect(s.session.selection).toEqual([]);
  });

  it('notifies listeners once per change and not for no-op session patches', () => {
    const s = new StudioStore(exampleDesign());
    const fn = vi.fn();
    s.subscribe(fn);
    s.setSession({ tool: 'select' });
    expect(fn).not.toHaveBeenCalled();
    select(s, ['b1', 'h1']);
    select(s, ['b1'], 'toggle');
    expect(s.session.selection).toEqual(['h1']);
    expect(fn).toHaveBeenCalledTimes(2);
  });

  it('load forgets history', () => {
    const s = new StudioStore(exampleDesign());
    s.edit((d) => moveObjects(d, ['b1'], 1, 0));
    s.load(exampleDesign());
    expect(s.canUndo()).toBe(false);
  });

  it('ignores document edits when read-only, but not session changes', () => {
    const s = new StudioStore(exampleDesign(), {}, { readOnly: true });
    const before = s.design;
    s.beginGesture();
    s.edit((d) => moveObjects(d, ['b1'], 1, 0));
    s.endGesture();
    expect(s.design).toBe(before);
    select(s, ['b1']);
    expect(s.session.selection).toEqual(['b1']);
  });

  it('switches to read-only mid-drag: the drag is abandoned, a placing tool put down, edits ignored', () => {
    const s = new StudioStore(exampleDesign(), { tool: 'hide' });
    const fn = vi.fn();
    s.subscribe(fn);
    s.beginGesture();
    s.edit((d) => moveObjects(d, ['b1'], 5, 0));
    s.setReadOnly(true);
    expect(fn).toHaveBeenCalled();
    expect(s.readOnly).toBe(true);
    expect(s.getState().readOnly).toBe(true);
    expect(s.inGesture).toBe(false);
    expect(s.design.objects.find((o) => o.id === 'b1')).toMatchObject({ x1: 20 });
    expect(s.session.tool).toBe('select');
    s.edit((d) => moveObjects(d, ['b1'], 1, 0));
    expect(s.design.objects.find((o) => o.id === 'b1')).toMatchObject({ x1: 20 });
    s.setReadOnly(false);
    s.edit((d) => moveObjects(d, ['b1'], 1, 0));
    expect(s.design.objects.find((o) => o.id === 'b1')).toMatchObject({ x1: 21 });
  });
});
