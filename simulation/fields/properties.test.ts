import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { computeFields, probe } from './grid';
import { arbDesign, arbObject } from '../testing/arbitraries';
import type { Design, DesignObject } from '../model/schema';

const CELL = 4; // coarse grid keeps the properties fast
const room = (d: Design) => d.enclosure.roomTempC ?? 24;

describe('field invariants (property tests)', () => {
  it('adding a barrier never raises any cell', () => {
    const barrier = arbObject().filter((o) => o.type !== 'lamp');
    fc.assert(
      fc.property(arbDesign(), barrier, (design, extra) => {
        const before = computeFields(design, { cellCm: CELL });
        const more: Design = {
          ...design,
          objects: [...design.objects, { ...extra, id: 'extra' } as DesignObject],
        };
        const after = computeFields(more, { cellCm: CELL });
        let raised = 0;
        for (const f of ['uvb', 'uvi', 'tempC'] as const) {
          for (let c = 0; c < before[f].length; c++) {
            if (after[f][c]! > before[f][c]! + 1e-9 * Math.abs(before[f][c]!) + 1e-12) raised++;
          }
        }
        expect(raised).toBe(0);
      }),
      { numRuns: 60 },
    );
  });

  it('moving a probe straight away from a lone bulb never raises the UVB', () => {
    const setup = fc.record({
      design: arbDesign({ kinds: ['screen', 'glass', 'perch', 'ledge', 'hide', 'foliage'] }),
      lx: fc.double({ min: 0, max: 120, noNaN: true }),
      ly: fc.double({ min: 30, max: 70, noNaN: true }),
      beamDeg: fc.double({ min: 1, max: 360, noNaN: true }),
      angle: fc.double({ min: -1.5, max: 1.5, noNaN: true }), // radians from straight down
      t1: fc.double({ min: 0.1, max: 40, noNaN: true }),
      dt: fc.double({ min: 0, max: 40, noNaN: true }),
    });
    fc.assert(
      fc.property(setup, ({ design, lx, ly, beamDeg, angle, t1, dt }) => {
        const lamp: DesignObject = {
          type: 'lamp',
          id: 'bulb',
          tech: 'compact',
          form: 'bulb',
          x: lx,
          y: ly,
          // In the section plane, so the probe moves straight away from it (off the plane, a narrow beam
          // can reach farther points of the plane and miss nearer ones).
          z: design.enclosure.sectionZ ?? design.enclosure.depth / 2,
          uvbAt30: 50,
          beamDeg,
        };
        const d: Design = { ...design, objects: [...design.objects, lamp] };
        const dir = [Math.sin(angle), -Math.cos(angle)] as const;
        const [a, b] = probe(d, [
          { x: lx + dir[0] * t1, y: ly + dir[1] * t1 },
          { x: lx + dir[0] * (t1 + dt), y: ly + dir[1] * (t1 + dt) },
        ]);
        expect(b!.uvb).toBeLessThanOrEqual(a!.uvb * (1 + 1e-9) + 1e-12);
      }),
      { numRuns: 300 },
    );
  });

  it('every field is finite and non-negative, and no surface is colder than the room', () => {
    fc.assert(
      fc.property(arbDesign(), (design) => {
        const g = computeFields(design, { cellCm: CELL });
        const r = Math.fround(room(design));
        let bad = 0;
        for (let c = 0; c < g.uvb.length; c++) {
          if (!(Number.isFinite(g.uvb[c]!) && g.uvb[c]! >= 0)) bad++;
          if (!(Number.isFinite(g.uvi[c]!) && g.uvi[c]! >= 0)) bad++;
          if (!(Number.isFinite(g.tempC[c]!) && g.tempC[c]! >= r)) bad++;
        }
        expect(bad).toBe(0);
      }),
      { numRuns: 60 },
    );
  });

  it('with no heat sources every cell reads the room temperature', () => {
    fc.assert(
      fc.property(arbDesign(), (design) => {
        const cold: Design = {
          ...design,
          objects: design.objects.map((o) => (o.type === 'lamp' ? { ...o, watts: 0 } : o)),
        };
        const g = computeFields(cold, { cellCm: CELL });
        const r = Math.fround(room(design));
        expect(g.tempC.every((t) => t === r)).toBe(true);
      }),
      { numRuns: 60 },
    );
  });
});
