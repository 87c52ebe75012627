/**
 * Husbandry judgement a keeper can stand behind: UV and heat on one basking spot, climbers on mesh,
 * safety without a species sheet. Check values say where they come from.
 */
import { describe, expect, it } from 'vitest';
import { assess } from './assess';
import { reachableSurfaces } from './surfaces';
import { neededBaskingCm } from './sharedBasking';
import { climberMeshRisks } from './safetyFindings';
import type { Design, DesignObject } from '../model/schema';
import type { SpeciesSheet } from '../model/species';
import { emptyDesign } from '../testing/fixtures';

const byId = (a: ReturnType<typeof assess>, id: string) => a.findings.find((f) => f.id === id);

// Zone 4 lizard (Ferguson et al. 2010 zone 4, basking UVI 4.5–9.5), 50 cm long: it needs a shared
// basking spot of 0.4 × 50 = 20 cm (about the head and body; common practice, no published source).
const lizard: SpeciesSheet = {
  name: 'Test dragon',
  uvZone: 4,
  baskingSurfaceC: [40, 45],
  coolEndC: [22, 28],
  adultLengthCm: 50,
};

const tube: DesignObject = {
  type: 'lamp',
  id: 'uv',
  tech: 't5',
  form: 'tube',
  x: 40,
  y: 62,
  length: 55,
  uvbAt30: 42.5,
  reflectorGain: 2.2,
  watts: 24,
};
const lid: DesignObject = { type: 'screen', id: 'lid', x1: 0, y1: 60, x2: 180, y2: 60 };
const perch: DesignObject = { type: 'perch', id: 'perch', x1: 25, y1: 44, x2: 55, y2: 44, thickness: 4 };
const ledge: DesignObject = { type: 'ledge', id: 'ledge', x: 135, y: 25, width: 30, height: 8 };
const hide: DesignObject = { type: 'hide', id: 'hide', x: 80, y: 0, width: 25, height: 12 };
const d180 = (objects: DesignObject[]): Design => ({ ...emptyDesign(180, 60, 60, 24), objects });

/** T5 HO + reflector over a perch at the left, a 75 W halogen flood over a ledge at the right. */
const split = d180([
  tube,
  { type: 'lamp', id: 'heat', tech: 'halogen', form: 'bulb', x: 150, y: 63, watts: 75, beamDeg: 30 },
  lid,
  perch,
  ledge,
  hide,
]);
/** The same tube with a 60 W reflector lamp on a stand over the same perch. */
const together = d180([
  tube,
  { type: 'lamp', id: 'heat', tech: 'incandescent', form: 'bulb', x: 40, y: 70, watts: 60, beamDeg: 60 },
  lid,
  perch,
  ledge,
  hide,
]);

describe('UV and heat on one basking spot', () => {
  it('fails the split design although every other finding passes', () => {
    const a = assess(split, lizard);
    const f = byId(a, 'shared-basking')!;
    expect(f.status).toBe('fail');
    expect(f.numbers.overlapCm).toBe(0);
    // The UV spot is on the perch and the heat spot on the ledge, far apart.
    expect(f.numbers.uvSpotCm).toBeGreaterThanOrEqual(20);
    expect(f.numbers.heatSpotCm).toBeGreaterThan(0);
    expect(f.message).toMatch(/same place/);
    expect(f.message).toMatch(/Baines et al\. 2016/);
    for (const other of a.findings.filter((x) => x.id !== 'shared-basking')) {
      expect(other.status, `${other.id}: ${other.message}`).toBe('pass');
    }
    expect(a.overall).toBe('fail');
    // The studio draws both places.
    expect(f.basking?.uv.length).toBeGreaterThan(0);
    expect(f.basking?.heat.length).toBeGreaterThan(0);
    expect(f.basking?.both).toEqual([]);
    const uvX = f.basking!.uv.map((s) => (s.x1 + s.x2) / 2);
    const heatX = f.basking!.heat.map((s) => (s.x1 + s.x2) / 2);
    expect(Math.max(...uvX)).toBeLessThan(60);
    expect(Math.min(...heatX)).toBeGreaterThan(130);
  });

  it('passes a tube and a heat lamp over the same perch', () => {
    const a = assess(together, lizard);
    const f = byId(a, 'shared-basking')!;
    expect(f.status, f.message).toBe('pass');
    expect(f.numbers.overlapCm).toBeGreaterThanOrEqual(20);
    expect(f.basking?.both.length).toBeGreaterThan(0);
    expect(a.overall).toBe('pass');
  });

  it('asks for a longer spot for a longer animal', () => {
    // 0.4 × total length (engine's rule, common practice); 5 cm without a length.
    expect(neededBaskingCm({ adultLengthCm: 50 })).toBe(20);
    expect(neededBaskingCm({})).toBe(5);
    const a = assess(together, { ...lizard, adultLengthCm: 100 });
    expect(byId(a, 'shared-basking')!.status).toBe('attention');
  });
});

// A climber hanging from the mesh lid: a halogen resting on the lid (3 cm above it).
const climber: SpeciesSheet = {
  name: 'Test chameleon',
  uvZone: 3,
  baskingSurfaceC: [32, 35],
  coolEndC: [22, 26],
  climbs: true,
};
const onMesh = (tech: 'halogen' | 't5'): Design => ({
  ...emptyDesign(60, 120, 60, 22),
  objects: [
    tech === 'halogen'
      ? { type: 'lamp', id: 'lamp', tech: 'halogen', form: 'bulb', x: 30, y: 123, watts: 50, beamDeg: 30 }
      : { type: 'lamp', id: 'lamp', tech: 't5', form: 'tube', x: 30, y: 122, length: 55, uvbAt30: 42.5 },
    { type: 'screen', id: 'lid', x1: 0, y1: 120, x2: 60, y2: 120 },
    { type: 'perch', id: 'branch', x1: 10, y1: 70, x2: 50, y2: 70, thickness: 3 },
  ],
});

describe('climbers and mesh', () => {
  it('makes the underside of a mesh lid a reachable surface for climbers only', () => {
    const d = onMesh('halogen');
    expect(reachableSurfaces(d).some((s) => s.surfaceId === 'lid')).toBe(false);
    const climb = reachableSurfaces(d, 1, { climbs: true }).filter((s) => s.surfaceId === 'lid');
    expect(climb.length).toBe(60);
    expect(climb.every((s) => s.y < 120 && s.kind === 'screen')).toBe(true);
  });

  it('a climber under a lamp on mesh gets a reach finding a non-climber does not', () => {
    const d = onMesh('halogen');
    const { climbs: _c, ...walker } = climber;
    expect(byId(assess(d, walker), 'lamp-in-reach')!.status).toBe('pass');
    const f = byId(assess(d, climber), 'lamp-in-reach')!;
    expect(f.status).toBe('fail');
    expect(f.message).toMatch(/mesh is no guard for a climber/);
    // The mesh underside is the hottest reachable surface (a burn), not the branch.
    const hot = byId(assess(d, climber), 'hot-spot')!;
    expect(hot.numbers.hotC).toBeGreaterThan(byId(assess(d, walker), 'hot-spot')!.numbers.hotC! + 10);
    // The radiant model's figure a few cm under the bulb is hundreds of degrees: the sentence says
    // "over 100 °C" rather than a figure no thermometer would confirm; the numbers keep the estimate.
    expect(hot.numbers.hotC).toBeGreaterThan(100);
    expect(hot.message).toMatch(/hottest surface the animal can reach is over 100 °C;/);
    expect(byId(assess(d, walker), 'hot-spot')!.message).toMatch(/reach is about \d+\.\d °C;/);
  });

  it('sees the UV under the mesh right below a tube: far above the zone for a climber', () => {
    const d = onMesh('t5');
    const walker = assess(d, { ...climber, climbs: false });
    const climbing = assess(d, climber);
    expect(byId(climbing, 'basking-uvi')!.numbers.maxUvi).toBeGreaterThan(
      2 * byId(walker, 'basking-uvi')!.numbers.maxUvi!,
    );
    expect(byId(climbing, 'eye-safety')!.status).toBe('attention');
    expect(byId(walker, 'eye-safety')!.status).toBe('pass');
  });

  it('names, for each mesh a climber holds on to, the lamps that make it a burn or a UV risk', () => {
    // Reach 15 cm, eyes 20 cm (common practice, no published source); the halogen rests 3 cm above the
    // lid, the tube 2 cm above it.
    const [heat] = climberMeshRisks(onMesh('halogen'));
    expect(heat!.screenId).toBe('lid');
    expect(heat!.burn.map((b) => b.lampId)).toEqual(['lamp']);
    expect(heat!.burn[0]!.distanceCm).toBeCloseTo(3, 0);
    expect(heat!.uv).toEqual([]);
    const [uv] = climberMeshRisks(onMesh('t5'));
    expect(uv!.uv.map((b) => b.lampId)).toEqual(['lamp']);
    expect(uv!.burn).toEqual([]);
    // 25 cm above the lid: no risk to name.
    const high = onMesh('halogen');
    high.objects[0] = { ...(high.objects[0] as Extract<DesignObject, { type: 'lamp' }>), y: 145 };
    expect(climberMeshRisks(high)).toEqual([{ screenId: 'lid', burn: [], uv: [] }]);
  });

  it('treats a wire guard around a bulb as screens: its outside is reachable for a climber', () => {
    const guard: DesignObject[] = [
      { type: 'screen', id: 'g-left', x1: 20, y1: 100, x2: 20, y2: 118 },
      { type: 'screen', id: 'g-bottom', x1: 20, y1: 100, x2: 40, y2: 100 },
      { type: 'screen', id: 'g-right', x1: 40, y1: 100, x2: 40, y2: 118 },
    ];
    const d: Design = {
      ...emptyDesign(60, 120, 60, 22),
      objects: [
        { type: 'lamp', id: 'bulb', tech: 'halogen', form: 'bulb', x: 30, y: 110, watts: 50, beamDeg: 30 },
        ...guard,
        { type: 'perch', id: 'branch', x1: 5, y1: 60, x2: 55, y2: 60, thickness: 3 },
      ],
    };
    const s = reachableSurfaces(d, 1, { climbs: true });
    const bottom = s.filter((p) => p.surfaceId === 'g-bottom');
    expect(bottom.every((p) => p.y < 100)).toBe(true);
    expect(s.filter((p) => p.surfaceId === 'g-left').every((p) => p.x < 20)).toBe(true);
    expect(s.filter((p) => p.surfaceId === 'g-right').every((p) => p.x > 40)).toBe(true);
    // 10 cm from bulb to guard: within the 15 cm reach distance (common practice, no published source).
    expect(byId(assess(d, climber), 'lamp-in-reach')!.status).toBe('fail');
    expect(byId(assess(d, { ...climber, climbs: false }), 'lamp-in-reach')!.status).toBe('pass');
  });
});

describe('safety without a species sheet', () => {
  it('runs the reach, eye and hot-surface checks with general limits', () => {
    const d: Design = {
      ...emptyDesign(90, 45, 45, 24),
      objects: [
        { type: 'lamp', id: 'heat', tech: 'halogen', form: 'bulb', x: 45, y: 40, watts: 75, beamDeg: 30 },
        { type: 'ledge', id: 'rock', x: 35, y: 0, width: 20, height: 30 },
      ],
    };
    const a = assess(d, undefined);
    expect(a.findings.map((f) => f.id).sort()).toEqual(['eye-safety', 'hot-surface', 'lamp-in-reach']);
    expect(byId(a, 'lamp-in-reach')!.status).toBe('fail');
    const hot = byId(a, 'hot-surface')!;
    // General limit 55 °C for burns (from memory).
    expect(hot.numbers.limitC).toBe(55);
    expect(hot.status).toBe('fail');
    expect(hot.message).toMatch(/dimming thermostat/);
    expect(a.overall).toBe('fail');
  });

  it('passes a design with everything out of reach, even of a climber on the lid', () => {
    // 30 cm above the mesh: beyond the 15 cm reach distance (common practice, no published source), and
    // the mesh under it stays below the 55 °C general limit for burns (from memory).
    const d: Design = {
      ...emptyDesign(90, 45, 45, 24),
      objects: [
        { type: 'lamp', id: 'heat', tech: 'halogen', form: 'bulb', x: 45, y: 75, watts: 50, beamDeg: 30 },
        { type: 'screen', id: 'lid', x1: 0, y1: 45, x2: 90, y2: 45 },
      ],
    };
    const a = assess(d, undefined);
    expect(a.overall).toBe('pass');
  });

  it('does not pass a lamp on the mesh when nobody has said whether the animal climbs', () => {
    // The chameleon's set-up above with no sheet: the halogen 3 cm above the lid, a UV tube 2 cm above.
    for (const tech of ['halogen', 't5'] as const) {
      const a = assess(onMesh(tech), undefined);
      const reach = byId(a, 'lamp-in-reach')!;
      expect(reach.status, reach.message).toBe('attention');
      expect(reach.message).toMatch(
        /^lamp is within 15 cm \(about [23] cm\) of mesh an animal could hang from/,
      );
      expect(reach.message).toMatch(/for a climbing species that is a burn/);
      expect(reach.where).toEqual({ kind: 'object', objectIds: ['lamp'] });
      // Marked as holding only if the animal climbs (the studio lists it, without a banner).
      expect(reach.ifClimbs).toBe(true);
      expect(byId(a, 'eye-safety')!.status).toBe(tech === 't5' ? 'attention' : 'pass');
      expect(a.overall).toBe('attention');
    }
    // The mesh under the halogen is far above the 55 °C general limit for burns (from memory), the
    // branch is not: an attention that says so, with the mesh marked, never a pass.
    const hot = byId(assess(onMesh('halogen'), undefined), 'hot-surface')!;
    expect(hot.status).toBe('attention');
    expect(hot.message).toMatch(/^Mesh an animal could hang from gets over 100 °C under a lamp/);
    expect(hot.numbers.hotC).toBeLessThan(55);
    expect(hot.numbers.meshHotC).toBeGreaterThan(100);
    expect(hot.where?.kind).toBe('segments');
    // A sheet settles it: a non-climber's mesh guards, a climber's fails.
    expect(byId(assess(onMesh('halogen'), { ...climber, climbs: false }), 'lamp-in-reach')!.status).toBe(
      'pass',
    );
    expect(byId(assess(onMesh('halogen'), climber), 'lamp-in-reach')!.status).toBe('fail');
  });
});
