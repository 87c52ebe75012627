/**
 * Depth: lamps in front of or behind the plane the side view shows. Each check value comes from a closed
 * form written out here, independently of the engine's code, with its source beside it.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { computeFields, probe } from './grid';
import { FieldSolver } from './solver';
import { parseDesign } from '../model/parse';
import type { Design, DesignObject, LampObject } from '../model/schema';
import { arbDesign } from '../testing/arbitraries';
import { referenceProbe } from '../testing/reference';
import { EXAMPLE_DESIGN } from '../testing/fixtures';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

function design(lamp: Omit<LampObject, 'type' | 'id'>, sectionZ?: number): Design {
  return {
    format: 'baskwell.design',
    version: 2,
    enclosure: { width: 120, height: 60, depth: 60, ...(sectionZ === undefined ? {} : { sectionZ }) },
    objects: [{ type: 'lamp', id: 'l', ...lamp }],
  };
}

/** A bulb of UVB 100 µW/cm² at 30 cm over the middle of the floor, z cm from the front. */
const bulb = (z: number, beamDeg = 160) =>
  design({ tech: 'mercury-vapour', form: 'bulb', x: 60, y: 60, z, uvbAt30: 100, beamDeg });

/** The UVB value read at one exact point. */
const uvbAt = (d: Design, x: number, y: number) => probe(d, [{ x, y }])[0]!.uvb;

describe('a bulb off the section plane', () => {
  // Inverse-square and cosine laws for a point source and an upward-facing receiver (any radiometry text,
  // e.g. McCluney, Introduction to Radiometry and Photometry): E = I·cosθ / r², cosθ = h / r,
  // r² = h² + dx² + dz². The bulb is normalised so that E = uvbAt30 straight below at 30 cm: I = E30·30².
  const E30 = 100;
  const closed = (h: number, dx: number, dz: number) => {
    const r = Math.sqrt(h * h + dx * dx + dz * dz);
    return (E30 * 900 * (h / r)) / (r * r);
  };

  it('reads the 3-D value 20 cm behind the plane (within 3 %), not the drawn one', () => {
    // Section at the default half depth (30 cm); the lamp at 50 cm: 20 cm behind it.
    const d = bulb(50);
    for (const [x, y] of [
      [60, 30],
      [75, 10],
      [40, 45],
    ] as const) {
      const want = closed(60 - y, x - 60, 20);
      expect(rel(uvbAt(d, x, y), want)).toBeLessThan(0.03);
      // The drawn (in-plane) distance would read far more: the test fails if depth is ignored.
      expect(closed(60 - y, x - 60, 0) / want).toBeGreaterThan(1.1);
    }
    // Straight below at 30 cm, 20 cm off the plane: 100·(30/36.06)³ = 57.6 µW/cm².
    expect(uvbAt(d, 60, 30)).toBeCloseTo(57.6, 1);
  });

  it('in front of or behind the plane is the same', () => {
    expect(uvbAt(bulb(10), 70, 20)).toBeCloseTo(uvbAt(bulb(50), 70, 20), 9);
  });

  it('a narrow beam passes beside the section plane: nothing from it there', () => {
    // A 30° beam 30 cm below reaches 30·tan15° = 8.0 cm from its axis; the plane is 20 cm away.
    const d = bulb(50, 30);
    expect(uvbAt(d, 60, 30)).toBe(0);
    // 5 cm off the plane the beam still crosses it, over |dx| ≤ √(8.04² − 5²) = 6.3 cm.
    const near = bulb(35, 30);
    expect(uvbAt(near, 60, 30)).toBeGreaterThan(0);
    expect(uvbAt(near, 66, 30)).toBeGreaterThan(0);
    expect(uvbAt(near, 67, 30)).toBe(0);
  });
});

describe('a tube off the section plane', () => {
  // A diffuse line source (cos-distributed elements) parallel to an upward-facing receiver's plane: the
  // line-source form at the perpendicular distance d = √(h² + dz²) times the cosine h/d between the
  // receiver's normal and that perpendicular. Aspect-factor method for linear sources, IES Lighting
  // Handbook: E = (I / 2d) · cosφ · [AF(θ₂) − AF(θ₁)], AF(θ) = θ + sinθ cosθ, θ = atan(u / d)
  // (the handbook's form recalled from memory; the numerical integration below checks it independently).
  const L = 60;
  const E30 = 80;
  const AF = (u: number, d: number) => {
    const t = Math.atan(u / d);
    return t + Math.sin(t) * Math.cos(t);
  };
  const lineForm = (u1: number, u2: number, h: number, dz: number) => {
    const d = Math.hypot(h, dz);
    return (1 / (2 * d)) * (h / d) * (AF(u2, d) - AF(u1, d));
  };
  // Normalised to E30 30 cm straight below the centre of the tube, in its own plane.
  // The tube spans x = 30..90; u runs from each end to the receiver.
  const closed = (x: number, h: number, dz: number) =>
    (E30 * lineForm(30 - x, 90 - x, h, dz)) / lineForm(-L / 2, L / 2, 30, 0);
  const tube = (z: number, sectionZ?: number) =>
    design({ tech: 't5', form: 'tube', x: 60, y: 60, z, length: L, uvbAt30: E30 }, sectionZ);

  it('reads the 3-D value 20 cm behind the plane (within 3 %)', () => {
    const d = tube(50);
    for (const [x, y] of [
      [60, 20], // below the centre
      [30, 30], // below one end
      [100, 40], // beyond the end
    ] as const) {
      const want = closed(x, 60 - y, 20);
      expect(rel(uvbAt(d, x, y), want)).toBeLessThan(0.03);
    }
    // Below the centre, 40 cm down and 20 cm back, the drawn distance would overstate it by more than 10 %.
    expect(closed(60, 40, 0) / closed(60, 40, 20)).toBeGreaterThan(1.1);
  });

  it('agrees with a numerical integration over the tube’s elements (the slow reference)', () => {
    // Each element ds: intensity i·cosψ (cosψ = d/r), receiver cosine h/r, inverse square.
    const d = tube(8); // 22 cm in front of the plane
    for (const [x, y] of [
      [60, 20],
      [25, 5],
      [110, 50],
    ] as const) {
      const ref = referenceProbe(d, [{ x, y }], { samples: 4000 })[0]!.uvb;
      expect(rel(uvbAt(d, x, y), ref)).toBeLessThan(0.01);
    }
  });

  it('the infinitely long tube tends to (π i / 2d)·cosφ', () => {
    // Limit of the aspect-factor form for an infinite line (θ → ±π/2); here a 1000 cm tube at 20 cm.
    const long = design({ tech: 't5', form: 'tube', x: 60, y: 60, z: 50, length: 1000, uvbAt30: E30 });
    long.enclosure.width = 120;
    const i = E30 / lineForm(-500, 500, 30, 0);
    const h = 30;
    const dist = Math.hypot(h, 20);
    expect(rel(uvbAt(long, 60, 30), ((Math.PI * i) / (2 * dist)) * (h / dist))).toBeLessThan(0.03);
  });

  it('moving the section plane to the lamp gives the in-plane value', () => {
    expect(uvbAt(tube(12, 12), 45, 20)).toBe(uvbAt(tube(30), 45, 20));
  });
});

describe('depth and version 1', () => {
  it('a version-1 design computes exactly the fields it always did (everything at half depth)', () => {
    const v1 = { ...structuredClone(EXAMPLE_DESIGN), version: 1 };
    const r = parseDesign(v1);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const explicit: Design = {
      ...structuredClone(EXAMPLE_DESIGN),
      enclosure: { ...EXAMPLE_DESIGN.enclosure, sectionZ: 30 },
      objects: EXAMPLE_DESIGN.objects.map((o) => (o.type === 'lamp' ? { ...o, z: 30 } : o)),
    };
    const a = computeFields(r.design, { cellCm: 2 });
    const b = computeFields(explicit, { cellCm: 2 });
    expect(a.uvb).toEqual(b.uvb);
    expect(a.tempC).toEqual(b.tempC);
  });

  it('barriers span the whole depth: a lamp behind the plane is still shaded by a ledge in the section', () => {
    const d = bulb(50, 160);
    d.objects.push({ type: 'ledge', id: 'shelf', x: 50, y: 40, width: 20, height: 2 });
    expect(uvbAt(d, 60, 20)).toBe(0);
    expect(uvbAt(d, 60, 50)).toBeGreaterThan(0);
  });
});

describe('the solver with depth', () => {
  const withLamps = (zs: number[], sectionZ?: number): Design => ({
    ...structuredClone(EXAMPLE_DESIGN),
    enclosure: { ...EXAMPLE_DESIGN.enclosure, ...(sectionZ === undefined ? {} : { sectionZ }) },
    objects: [
      ...EXAMPLE_DESIGN.objects,
      { type: 'lamp', id: 'uv2', tech: 't8', form: 'tube', x: 80, y: 62, length: 45 } as DesignObject,
    ].map((o, k) => (o.type === 'lamp' ? ({ ...o, z: zs[k % zs.length] } as DesignObject) : o)),
  });

  it('one lamp moved in depth recomputes that lamp only, and equals a fresh computation', () => {
    const solver = new FieldSolver();
    const opts = { cellCm: 2 };
    solver.compute(withLamps([30, 30, 30]), opts);
    const moved = withLamps([30, 30, 30]);
    (moved.objects[0] as LampObject).z = 52;
    const cached = solver.compute(moved, opts);
    expect(solver.stats).toMatchObject({ full: 1, cached: 2 });
    const fresh = computeFields(moved, opts);
    expect(cached.uvb).toEqual(fresh.uvb);
    expect(cached.tempC).toEqual(fresh.tempC);
  });

  it('moving the section plane recomputes every lamp', () => {
    const solver = new FieldSolver();
    solver.compute(withLamps([10, 30, 50]), { cellCm: 2 });
    const next = solver.compute(withLamps([10, 30, 50], 20), { cellCm: 2 });
    expect(solver.stats).toMatchObject({ full: 3, cached: 0 });
    expect(next.uvb).toEqual(computeFields(withLamps([10, 30, 50], 20), { cellCm: 2 }).uvb);
  });
});

describe('depth properties', () => {
  it('moving bulbs further from the section plane never raises a cell', () => {
    fc.assert(
      fc.property(
        arbDesign({ maxObjects: 6, depth: 60 }),
        fc.double({ min: 0.5, max: 30, noNaN: true }),
        (d, extra) => {
          const section = 30;
          const base: Design = { ...d, enclosure: { ...d.enclosure, sectionZ: section } };
          const bulbsOnly = base.objects.filter((o) => o.type !== 'lamp' || o.form === 'bulb');
          const near: Design = { ...base, objects: bulbsOnly };
          const far: Design = {
            ...base,
            objects: bulbsOnly.map((o) => {
              if (o.type !== 'lamp') return o;
              const dz = (o.z ?? 30) - section;
              const z = Math.min(60, Math.max(0, section + (dz >= 0 ? dz + extra : dz - extra)));
              return { ...o, z };
            }),
          };
          const a = computeFields(near, { cellCm: 6 });
          const b = computeFields(far, { cellCm: 6 });
          for (let c = 0; c < a.uvb.length; c++) {
            expect(b.uvb[c]!).toBeLessThanOrEqual(a.uvb[c]! * (1 + 1e-6) + 1e-9);
            expect(b.tempC[c]!).toBeLessThanOrEqual(a.tempC[c]! + 1e-6);
          }
        },
      ),
      { numRuns: 30, seed: 20261203 },
    );
  });
});
