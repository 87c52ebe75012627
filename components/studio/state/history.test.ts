import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  beginGesture,
  canRedo,
  canUndo,
  cancelGesture,
  commit,
  createHistory,
  endGesture,
  HISTORY_LIMIT,
  redo,
  undo,
} from './history';

describe('history', () => {
  it('undoes and redoes single commits', () => {
    let h = createHistory('a');
    h = commit(h, 'b');
    h = commit(h, 'c');
    expect(h.present).toBe('c');
    h = undo(h);
    expect(h.present).toBe('b');
    h = undo(h);
    expect(h.present).toBe('a');
    expect(canUndo(h)).toBe(false);
    h = redo(h);
    expect(h.present).toBe('b');
    h = commit(h, 'd');
    expect(canRedo(h)).toBe(false);
    expect(undo(h).present).toBe('b');
  });

  it('records one step per gesture however many moves it had', () => {
    let h = createHistory(0);
    h = beginGesture(h);
    for (let i = 1; i <= 30; i++) h = commit(h, i);
    expect(h.present).toBe(30);
    expect(canUndo(h)).toBe(false); // not while the gesture runs
    h = endGesture(h);
    expect(h.past).toEqual([0]);
    h = undo(h);
    expect(h.present).toBe(0);
    expect(redo(h).present).toBe(30);
  });

  it('records nothing for a gesture that changed nothing, and cancelling restores the start', () => {
    let h = commit(createHistory('x'), 'y');
    h = endGesture(beginGesture(h));
    expect(h.past).toEqual(['x']);
    h = beginGesture(h);
    h = commit(h, 'moved');
    h = cancelGesture(h);
    expect(h.present).toBe('y');
    expect(h.past).toEqual(['x']);
    expect(h.gestureBase).toBeNull();
  });

  it('ignores a commit of the same reference', () => {
    const h = createHistory({ a: 1 });
    expect(commit(h, h.present)).toBe(h);
  });

  it('keeps at most HISTORY_LIMIT steps', () => {
    let h = createHistory(0);
    for (let i = 1; i <= HISTORY_LIMIT + 50; i++) h = commit(h, i);
    expect(h.past.length).toBe(HISTORY_LIMIT);
    expect(h.past[0]).toBe(50);
  });

  it('undo then redo of everything returns to the same present (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer(), { minLength: 1, maxLength: 40 }), (values) => {
        let h = createHistory(-1);
        for (const v of values) h = commit(h, v);
        const top = h.present;
        let n = 0;
        while (canUndo(h)) {
          h = undo(h);
          n++;
        }
        expect(h.present).toBe(-1);
        for (let i = 0; i < n; i++) h = redo(h);
        expect(h.present).toBe(top);
      }),
    );
  });
});
