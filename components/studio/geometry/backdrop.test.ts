import { describe, expect, it } from 'vitest';
import {
  MIN_BACKDROP_CM,
  backdropCornerAt,
  backdropCornerPoint,
  backdropStageRect,
  dragBackdropCorner,
  fitToEnclosure,
  insideBackdrop,
  moveBackdrop,
} from './backdrop';

const ENCLOSURE = { width: 120, height: 60 };
const fitted = fitToEnclosure(ENCLOSURE, 7);

describe('photo backdrop placement', () => {
  it('is stretched over the enclosure’s inner rectangle by default, keeping opacity and visibility', () => {
    expect(fitted).toEqual({ uploadId: 7, x: 0, y: 0, width: 120, height: 60, opacity: 0.6, visible: true });
    const moved = { ...moveBackdrop(fitted, 9, -3), opacity: 0.3, visible: false };
    expect(fitToEnclosure(ENCLOSURE, 7, moved)).toEqual({ ...fitted, opacity: 0.3, visible: false });
  });

  it('moves whole, by a design offset, rounded to 0.01 cm', () => {
    expect(moveBackdrop(fitted, 2.5, -1.004)).toMatchObject({ x: 2.5, y: -1, width: 120, height: 60 });
  });

  it('stretches by one corner while the opposite corner stays put', () => {
    // Top-right corner from (120, 60) to (130, 66): the bottom-left stays at (0, 0).
    expect(dragBackdropCorner(fitted, 'ne', { x: 130, y: 66 })).toMatchObject({
      x: 0,
      y: 0,
      width: 130,
      height: 66,
    });
    // Bottom-left from (0, 0) to (-5, -4): the top-right stays at (120, 60).
    const sw = dragBackdropCorner(fitted, 'sw', { x: -5, y: -4 });
    expect(sw).toMatchObject({ x: -5, y: -4, width: 125, height: 64 });
    expect(backdropCornerPoint(sw, 'ne')).toEqual({ x: 120, y: 60 });
    // Top-left: its left edge and top move; the right edge and the bottom stay.
    const nw = dragBackdropCorner(fitted, 'nw', { x: 10, y: 50 });
    expect(nw).toMatchObject({ x: 10, y: 0, width: 110, height: 50 });
    // Bottom-right.
    expect(dragBackdropCorner(fitted, 'se', { x: 100, y: 5 })).toMatchObject({
      x: 0,
      y: 5,
      width: 100,
      height: 55,
    });
  });

  it('never turns inside out: a corner dragged past the opposite one stops at the smallest size', () => {
    const squeezed = dragBackdropCorner(fitted, 'ne', { x: -40, y: -20 });
    expect(squeezed).toMatchObject({ x: 0, y: 0, width: MIN_BACKDROP_CM, height: MIN_BACKDROP_CM });
    const other = dragBackdropCorner(fitted, 'sw', { x: 500, y: 500 });
    expect(other).toMatchObject({ width: MIN_BACKDROP_CM, height: MIN_BACKDROP_CM });
    expect(backdropCornerPoint(other, 'ne')).toEqual({ x: 120, y: 60 });
  });

  it('finds a corner under the pointer on the stage, and whether a point is on the photo', () => {
    // 5 px per cm, origin at (50, 400): design (x, y) is at stage (50 + 5x, 400 - 5y).
    const cam = { zoom: 5, originX: 50, originY: 400 };
    expect(backdropStageRect(cam, fitted)).toEqual({ x: 50, y: 100, width: 600, height: 300 });
    expect(backdropCornerAt(cam, fitted, { x: 53, y: 103 }, 9)).toBe('nw');
    expect(backdropCornerAt(cam, fitted, { x: 648, y: 398 }, 9)).toBe('se');
    expect(backdropCornerAt(cam, fitted, { x: 350, y: 250 }, 9)).toBeNull();
    expect(insideBackdrop(fitted, { x: 60, y: 30 })).toBe(true);
    expect(insideBackdrop(fitted, { x: 121, y: 30 })).toBe(false);
  });
});
