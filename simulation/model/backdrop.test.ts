import { describe, expect, it } from 'vitest';
import { physicsOf, samePhysics } from './backdrop';
import { parseDesign } from './parse';
import type { Design } from './schema';
import { EXAMPLE_DESIGN } from '../testing/fixtures';
import { FieldSolver } from '../fields/solver';

const clone = <T>(v: T): T => JSON.parse(JSON.stringify(v)) as T;
const PHOTO = { uploadId: 12, x: -2.5, y: 0, width: 125, height: 64, opacity: 0.6, visible: true };

describe('design backdrop (the photo traced in the studio)', () => {
  it('round-trips through a design file unchanged', () => {
    const d = { ...clone(EXAMPLE_DESIGN), backdrop: PHOTO };
    const r = parseDesign(JSON.parse(JSON.stringify(d)));
    expect(r).toEqual({ ok: true, design: d });
    // And without one, nothing is added.
    const plain = parseDesign(clone(EXAMPLE_DESIGN));
    expect(plain.ok && 'backdrop' in plain.design).toBe(false);
  });

  it.each([
    [{ uploadId: 0 }, 'backdrop.uploadId', /photo id/],
    [{ uploadId: 1.5 }, 'backdrop.uploadId', /whole number/],
    [{ uploadId: '12' }, 'backdrop.uploadId', /expected number/],
    [{ width: 0 }, 'backdrop.width', /0/],
    [{ height: -4 }, 'backdrop.height', /0/],
    [{ x: Number.POSITIVE_INFINITY }, 'backdrop.x', /./],
    [{ opacity: 1.5 }, 'backdrop.opacity', /1/],
    [{ opacity: 0 }, 'backdrop.opacity', /0\.05/],
    [{ visible: 'yes' }, 'backdrop.visible', /expected boolean/],
    [{ rotation: 3 }, 'backdrop.rotation', /unknown field/],
  ])('rejects %j naming the field', (patch, path, message) => {
    const d = { ...clone(EXAMPLE_DESIGN), backdrop: { ...PHOTO, ...patch } };
    const r = parseDesign(d);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.path).toBe(path);
      expect(r.error.message).toMatch(message);
    }
  });

  it('rejects a backdrop missing a field, naming it', () => {
    const { opacity: _o, ...partial } = PHOTO;
    const r = parseDesign({ ...clone(EXAMPLE_DESIGN), backdrop: partial });
    expect(r).toMatchObject({ ok: false, error: { path: 'backdrop.opacity' } });
  });

  it('is not part of the physics: the engine computes the same fields with or without it', () => {
    const base = clone(EXAMPLE_DESIGN) as Design;
    const withPhoto: Design = { ...base, backdrop: PHOTO };
    expect(physicsOf(withPhoto)).toEqual(base);
    expect('backdrop' in physicsOf(withPhoto)).toBe(false);
    expect(physicsOf(base)).toBe(base);
    const a = new FieldSolver().compute(base, { cellCm: 4 });
    const b = new FieldSolver().compute(withPhoto, { cellCm: 4 });
    expect(Array.from(b.uvi)).toEqual(Array.from(a.uvi));
    expect(Array.from(b.tempC)).toEqual(Array.from(a.tempC));
  });

  it('tells a photo-only change from a change of the physics', () => {
    const base = clone(EXAMPLE_DESIGN) as Design;
    const moved: Design = { ...base, backdrop: PHOTO };
    expect(samePhysics(base, moved)).toBe(true);
    expect(samePhysics(base, { ...base, notes: 'new note' })).toBe(true);
    expect(samePhysics(base, { ...base, objects: [...base.objects] })).toBe(false);
    expect(samePhysics(base, { ...base, enclosure: { ...base.enclosure, width: 90 } })).toBe(false);
  });
});
