import { describe, expect, it } from 'vitest';
import { computeFields, probe } from './grid';
import { emptyDesign, EXAMPLE_DESIGN } from '../testing/fixtures';
import type { Design, DesignObject, LampObject } from '../model/schema';
import { tubePiece, tubeBelowCentre } from '../sources/tube';

function withObjects(objects: DesignObject[], w = 120, h = 60): Design {
  return { ...emptyDesign(w, h), objects };
}
const bulb = (extra: Partial<LampObject> = {}): LampObject => ({
  type: 'lamp',
  id: 'b',
  tech: 'compact',
  form: 'bulb',
  x: 60,
  y: 90,
  uvbAt30: 100,
  watts: 0,
  ...extra,
});
const tube = (extra: Partial<LampObject> = {}): LampObject => ({
  type: 'lamp',
  id: 't',
  tech: 't5',
  form: 'tube',
  x: 60,
  y: 70,
  length: 60,
  uvbAt30: 50,
  watts: 0,
  ...extra,
});
const at = (d: Design, x: number, y: number, opts = {}) => probe(d, [{ x, y }], opts)[0]!;

describe('computeFields grid', () => {
  it('has the documented size and cell centres', () => {
    const g = computeFields(EXAMPLE_DESIGN);
    expect([g.nx, g.ny, g.cellCm]).toEqual([240, 120, 0.5]);
    expect(g.uvb.length).toBe(240 * 120);
    const g2 = computeFields(emptyDesign(10.2, 5), { cellCm: 1 });
    expect([g2.nx, g2.ny]).toEqual([11, 5]);
    expect(() => computeFields(emptyDesign(), { cellCm: 0 })).toThrow(RangeError);
    expect(() => computeFields(emptyDesign(), { cellCm: 0.01 })).toThrow(/larger cell/);
  });

  it('reads the room temperature everywhere and no UV with no lamps', () => {
    const g = computeFields({
      ...EXAMPLE_DESIGN,
      objects: EXAMPLE_DESIGN.objects.filter((o) => o.type !== 'lamp'),
    });
    expect(g.tempC.every((t) => t === 24)).toBe(true);
    expect(g.uvb.every((v) => v === 0)).toBe(true);
  });

  it('probe equals the grid at cell centres', () => {
    const g = computeFields(EXAMPLE_DESIGN, { cellCm: 2 });
    for (const [i, j] of [
      [20, 15],
      [5, 3],
      [45, 25],
      [33, 10],
    ] as const) {
      const p = at(EXAMPLE_DESIGN, (i + 0.5) * 2, (j + 0.5) * 2);
      const c = j * g.nx + i;
      expect(g.uvb[c]).toBeCloseTo(p.uvb, 3);
      expect(g.uvi[c]).toBeCloseTo(p.uvi, 5);
      expect(g.tempC[c]).toBeCloseTo(p.tempC, 3);
    }
  });
});

describe('light', () => {
  it('a bulb follows the inverse-square and cosine laws in the engine (radiometry)', () => {
    const d = withObjects([bulb({ x: 60, y: 90 })], 120, 80);
    expect(at(d, 60, 60).uvb).toBeCloseTo(100, 6);
    expect(at(d, 60, 30).uvb).toBeCloseTo(25, 6);
    expect(at(d, 90, 60).uvb).toBeCloseTo(35.355, 3);
    expect(at(d, 75, 60).uvb).toBeCloseTo(71.554, 3);
    expect(at(d, 60, 60).uvi).toBeCloseTo(100 * 0.04, 6);
  });

  it('a tube reads uvbAt30 below its centre and follows the closed form elsewhere', () => {
    const d = withObjects([tube()]);
    expect(at(d, 60, 40).uvb).toBeCloseTo(50, 6);
    const i = 50 / tubeBelowCentre(60, 30);
    expect(at(d, 85, 20).uvb).toBeCloseTo(i * tubePiece(30 - 85, 90 - 85, 50), 6);
  });

  it('shades a bulb fully behind a perch and passes a share through a screen', () => {
    const perch: DesignObject = { type: 'perch', id: 'p', x1: 50, y1: 40, x2: 70, y2: 40, thickness: 3 };
    const d = withObjects([bulb(), perch], 120, 80);
    expect(at(d, 60, 20).uvb).toBe(0);
    expect(at(d, 60, 41.6).uvb).toBeGreaterThan(0);
    const lid: DesignObject = {
      type: 'screen',
      id: 's',
      x1: 0,
      y1: 80,
      x2: 120,
      y2: 80,
      uvbTransmission: 0.6,
    };
    const d2 = withObjects([bulb(), lid], 120, 80);
    expect(at(d2, 60, 60).uvb).toBeCloseTo(60, 6);
  });

  it('glass passes no UVB (Duarte et al. 2009) but passes near-infrared from a halogen lamp', () => {
    const glass: DesignObject = { type: 'glass', id: 'g', x1: 0, y1: 62, x2: 120, y2: 62 };
    const uv = withObjects([bulb({ y: 70, watts: 0 }), glass]);
    expect(at(uv, 60, 40).uvb).toBe(0);
    const halogen = bulb({ tech: 'halogen', uvbAt30: 0, watts: 75, y: 70 });
    const bare = at(withObjects([halogen]), 60, 30).tempC;
    const behind = at(withObjects([halogen, glass]), 60, 30).tempC;
    const ceramic = bulb({ tech: 'ceramic', uvbAt30: 0, watts: 100, y: 70 });
    expect(behind).toBeGreaterThan(24 + 0.5 * (bare - 24));
    expect(at(withObjects([ceramic, glass]), 60, 30).tempC - 24).toBeLessThan(
      0.1 * (at(withObjects([ceramic]), 60, 30).tempC - 24),
    );
  });

  it('shades exactly the hidden part of a tube', () => {
    // An opaque ledge hides the left half of the tube from a point straight below the centre.
    const ledge: DesignObject = { type: 'ledge', id: 'l', x: 0, y: 44, width: 60, height: 2 };
    const d = withObjects([tube(), ledge]);
    const i = 50 / tubeBelowCentre(60, 30);
    // The ledge edge at x = 60 projects onto x = 60 on the tube: the right half stays visible.
    expect(at(d, 60, 20).uvb).toBeCloseTo(i * tubePiece(0, 30, 50), 6);
    // A mesh hiding the right half as well multiplies only that half.
    const mesh: DesignObject = {
      type: 'screen',
      id: 's',
      x1: 60,
      y1: 45,
      x2: 120,
      y2: 45,
      uvbTransmission: 0.5,
    };
    expect(at(withObjects([tube(), ledge, mesh]), 60, 20).uvb).toBeCloseTo(0.5 * i * tubePiece(0, 30, 50), 6);
  });

  it('gives nothing inside a hide and lights its roof', () => {
    const hide: DesignObject = { type: 'hide', id: 'h', x: 40, y: 0, width: 40, height: 15 };
    const d = withObjects([tube(), hide]);
    expect(at(d, 60, 5).uvb).toBe(0);
    expect(at(d, 60, 15).uvb).toBeGreaterThan(0);
    expect(at(d, 60, 15).uvb).toBeCloseTo(at(withObjects([tube()]), 60, 15).uvb, 9);
  });

  it('cuts a bulb off outside its beam and applies the reflector gain inside it', () => {
    const d = withObjects([bulb({ beamDeg: 60, reflectorGain: 2 })], 120, 80);
    expect(at(d, 60, 60).uvb).toBeCloseTo(200, 6);
    expect(at(d, 75, 60).uvb).toBeCloseTo(2 * 71.554, 2); // 26.6° off axis: inside the 30° half-angle
    expect(at(d, 80, 60).uvb).toBe(0); // 33.7° off axis: outside
  });

  it('ages the UVB by the decay curve', () => {
    const d = withObjects([bulb({ decay: { halfLifeMonths: 6 }, ageMonths: 3 })], 120, 80);
    expect(at(d, 60, 60, { addMonths: 3 }).uvb).toBeCloseTo(50, 6);
    expect(at(d, 60, 60).uvb).toBeCloseTo(100 / Math.SQRT2, 6);
  });
});

describe('heat', () => {
  it('a 160 W mercury vapour lamp on the mesh lid of a 40 cm tall enclosure heats the floor to about 35 °C', () => {
    // common practice, no published source: about 35 °C (95 °F) in a 24 °C room. Tolerance ±2 °C.
    // The lamp rests on the lid; its emitting centre is taken 5 cm above the mesh.
    const d: Design = {
      ...emptyDesign(90, 40, 45, 24),
      objects: [
        {
          type: 'lamp',
          id: 'mv',
          tech: 'mercury-vapour',
          form: 'bulb',
          x: 45,
          y: 45,
          uvbAt30: 225,
          watts: 160,
        },
        { type: 'screen', id: 'lid', x1: 0, y1: 40, x2: 90, y2: 40 },
      ],
    };
    expect(at(d, 45, 0).tempC).toBeGreaterThan(33);
    expect(at(d, 45, 0).tempC).toBeLessThan(37);
  });

  it('a 75 W halogen flood gives a basking surface of about 50 °C at 30 cm and about 35 °C from the lid', () => {
    // common practice, no published source (keepers' figures, from memory): 45–60 °C 30 cm below in the
    // open; on the mesh lid of a 40 cm tall enclosure, a floor hot spot like the 160 W mercury vapour lamp's.
    const open: Design = {
      ...emptyDesign(90, 60, 45, 24),
      objects: [
        { type: 'lamp', id: 'h', tech: 'halogen', form: 'bulb', x: 45, y: 50, watts: 75, beamDeg: 30 },
      ],
    };
    const t = at(open, 45, 20).tempC;
    expect(t).toBeGreaterThan(45);
    expect(t).toBeLessThan(60);
    const lidded: Design = {
      ...emptyDesign(90, 40, 45, 24),
      objects: [
        { type: 'lamp', id: 'h', tech: 'halogen', form: 'bulb', x: 45, y: 45, watts: 75, beamDeg: 30 },
        { type: 'screen', id: 'lid', x1: 0, y1: 40, x2: 90, y2: 40 },
      ],
    };
    expect(at(lidded, 45, 0).tempC).toBeGreaterThan(31);
    expect(at(lidded, 45, 0).tempC).toBeLessThan(39);
    // Outside the beam only the spread part of the heat arrives, and no UV.
    expect(at(open, 80, 20).tempC).toBeGreaterThan(24);
    expect(at(open, 80, 20).tempC).toBeLessThan(t);
  });

  it('warms the air under the lid only when lamps are present', () => {
    const g = computeFields(
      withObjects([bulb({ tech: 'ceramic', uvbAt30: 0, watts: 100, x: 112, y: 90, beamDeg: 10 })]),
      {
        cellCm: 2,
      },
    );
    // Far from the beam the surface reads the local air temperature: room at the bottom, warmer at the top.
    expect(g.tempC[0]).toBe(24);
    expect(g.tempC[(g.ny - 1) * g.nx + g.nx - 1]).toBeGreaterThan(24);
  });
});
