import { describe, expect, it } from 'vitest';
import { assess, monthsUntilUnmet } from './assess';
import { reachableSurfaces } from './surfaces';
import type { Design, DesignObject } from '../model/schema';
import type { SpeciesSheet } from '../model/species';
import { emptyDesign, EXAMPLE_DESIGN } from '../testing/fixtures';

const zone3: SpeciesSheet = { name: 'Test skink', uvZone: 3, baskingSurfaceC: [35, 40], coolEndC: [22, 28] };
const design = (objects: DesignObject[], w = 120, h = 60): Design => ({ ...emptyDesign(w, h), objects });
const byId = (a: ReturnType<typeof assess>, id: string) => a.findings.find((f) => f.id === id)!;

// A bulb 30 cm over the floor giving UVI 4.0 straight below (100 µW/cm² × 0.04), ageing with a 12-month half-life.
const uvBulb = (extra: Partial<DesignObject> = {}): DesignObject =>
  ({
    type: 'lamp',
    id: 'uv',
    tech: 'compact',
    form: 'bulb',
    x: 30,
    y: 30,
    uvbAt30: 100,
    uviPerUvb: 0.04,
    beamDeg: 90,
    watts: 0,
    decay: { halfLifeMonths: 12 },
    ...extra,
  }) as DesignObject;
const lid: DesignObject = { type: 'screen', id: 'lid', x1: 0, y1: 45, x2: 120, y2: 45, uvbTransmission: 1 };

describe('reachable surfaces', () => {
  it('samples the floor, ledge tops, hide roofs and perch tops; not the floor under a ledge', () => {
    const s = reachableSurfaces(EXAMPLE_DESIGN);
    const ids = new Set(s.map((p) => p.surfaceId));
    expect([...ids].sort()).toEqual(['b1', 'floor', 'h1', 'r1']);
    expect(s.some((p) => p.surfaceId === 'floor' && p.x > 76 && p.x < 104)).toBe(false);
    const inHide = s.filter((p) => p.inHide);
    expect(inHide.length).toBeGreaterThan(0);
    expect(inHide.every((p) => p.x > 5 && p.x < 30 && p.y < 1)).toBe(true);
    // Perch top: the upper long side of the 4 cm thick branch, lifted just above it.
    const perch = s.filter((p) => p.surfaceId === 'b1');
    expect(perch.every((p) => p.y > 20 && p.y < 41)).toBe(true);
    const total = s.reduce((a, p) => a + p.length, 0);
    expect(total).toBeGreaterThan(120);
  });
});

describe('assess', () => {
  it('passes a zone 3 basking spot with shade, and every message reads as an estimate', () => {
    const hide: DesignObject = { type: 'hide', id: 'hide', x: 90, y: 0, width: 25, height: 10 };
    const a = assess(design([uvBulb(), lid, hide]), zone3);
    expect(byId(a, 'basking-uvi').status).toBe('pass');
    expect(byId(a, 'basking-uvi').numbers.maxUvi).toBeCloseTo(4.0, 2);
    expect(byId(a, 'uv-refuge').status).toBe('pass');
    expect(byId(a, 'uv-gradient').status).toBe('pass');
    expect(byId(a, 'basking-uvi').where).toMatchObject({ kind: 'segments' });
    for (const f of a.findings) expect(f.message).toMatch(/estimate|common practice|check/i);
    // No heat at all: the hot spot is the room temperature, too cool for the species.
    expect(byId(a, 'hot-spot').status).toBe('fail');
    expect(a.overall).toBe('fail');
  });

  it('fails the basking check and the gradient with no UV lamp', () => {
    const a = assess(design([lid]), zone3);
    expect(byId(a, 'basking-uvi').status).toBe('fail');
    expect(byId(a, 'uv-gradient').status).toBe('fail');
  });

  it('fails the refuge when UV reaches everywhere', () => {
    const wide = uvBulb({ beamDeg: 360, x: 60, uvbAt30: 200 } as Partial<DesignObject>);
    const a = assess(design([wide], 40, 45), { ...zone3 });
    expect(byId(a, 'uv-refuge').status).toBe('fail');
    expect(byId(a, 'uv-gradient').status).toBe('fail');
  });

  it('checks hot spot and cool end against the sheet', () => {
    const mv: DesignObject = {
      type: 'lamp',
      id: 'mv',
      tech: 'mercury-vapour',
      form: 'bulb',
      x: 30,
      y: 45,
      uvbAt30: 0,
      watts: 160,
    };
    const lid40: DesignObject = { type: 'screen', id: 'lid', x1: 0, y1: 40, x2: 120, y2: 40 };
    const a = assess({ ...design([mv, lid40], 120, 40) }, { ...zone3, baskingSurfaceC: [33, 38] });
    expect(byId(a, 'hot-spot').status).toBe('pass');
    expect(byId(a, 'hot-spot').numbers.hotC).toBeGreaterThan(33);
    expect(byId(a, 'cool-end').status).toBe('pass');
    expect(byId(a, 'cool-end').numbers.coolC).toBeCloseTo(24, 6);
    const cold = assess(design([mv, lid40], 120, 40), { ...zone3, coolEndC: [26, 28] });
    expect(byId(cold, 'cool-end').status).toBe('attention');
  });

  it('warns about a heat lamp within reach and an unshielded UV lamp near the animal', () => {
    const ledge: DesignObject = { type: 'ledge', id: 'rock', x: 50, y: 0, width: 30, height: 40 };
    const heat: DesignObject = {
      type: 'lamp',
      id: 'spot',
      tech: 'halogen',
      form: 'bulb',
      x: 65,
      y: 50,
      watts: 50,
    };
    const a = assess(design([ledge, heat]), zone3);
    expect(byId(a, 'lamp-in-reach').status).toBe('fail');
    expect(byId(a, 'lamp-in-reach').where).toEqual({ kind: 'object', objectIds: ['spot'] });
    const guarded = assess(
      design([ledge, heat, { type: 'screen', id: 'guard', x1: 40, y1: 45, x2: 90, y2: 45 }]),
      zone3,
    );
    expect(byId(guarded, 'lamp-in-reach').status).toBe('pass');
    const uvTube: DesignObject = {
      type: 'lamp',
      id: 'tube',
      tech: 't5',
      form: 'tube',
      x: 65,
      y: 56,
      length: 30,
      watts: 0,
    };
    const b = assess(design([ledge, uvTube]), zone3);
    expect(byId(b, 'eye-safety').status).toBe('attention');
    expect(byId(b, 'lamp-in-reach').status).toBe('pass'); // 16 cm away: beyond the 15 cm reach
  });

  it('adds a UVB target finding when the sheet has one', () => {
    const a = assess(design([uvBulb(), lid]), { ...zone3, uvbTargetUw: [80, 150] });
    expect(byId(a, 'basking-uvb').status).toBe('pass');
    expect(byId(a, 'basking-uvb').numbers.maxUvb).toBeCloseTo(100, 1);
  });
});

describe('monthsUntilUnmet', () => {
  it('finds the month the basking UV drops below the zone', () => {
    // UVI 4.0 × 2^(−m/12) < 2.9 from m > 12·log2(4/2.9) = 5.57: month 6.
    expect(monthsUntilUnmet(design([uvBulb(), lid]), zone3)).toBe(6);
    // Three months old already: three months left.
    expect(monthsUntilUnmet(design([uvBulb({ ageMonths: 3 } as Partial<DesignObject>), lid]), zone3)).toBe(3);
    // Zone 1 species: 4.0 is far too much from the start.
    expect(monthsUntilUnmet(design([uvBulb(), lid]), { ...zone3, uvZone: 1 })).toBe(0);
    // A lamp that does not age holds.
    expect(
      monthsUntilUnmet(
        design([uvBulb({ decay: { halfLifeMonths: 1e9 } } as Partial<DesignObject>), lid]),
        zone3,
      ),
    ).toBeNull();
  });
});
