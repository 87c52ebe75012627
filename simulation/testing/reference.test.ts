import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { computeFields } from '../fields/grid';
import { maxRelativeError, rayHits, referenceFields } from './reference';
import { EXAMPLE_DESIGN } from './fixtures';
import { arbDesign } from './arbitraries';
import { compileOccluder } from '../geometry/occluders';

describe('reference implementation', () => {
  it('tests rays against boxes and segments', () => {
    const box = compileOccluder({ type: 'ledge', id: 'l', x: 0, y: 0, width: 10, height: 10 });
    expect(rayHits(5, -5, 5, 15, box)).toBe(true);
    expect(rayHits(-5, -5, -5, 15, box)).toBe(false);
    expect(rayHits(5, 10, 5, 20, box)).toBe(false); // starts on the top face, goes up
    expect(rayHits(5, 5, 5, 20, box)).toBe(true); // starts inside
    const seg = compileOccluder({ type: 'screen', id: 's', x1: 0, y1: 0, x2: 10, y2: 0 });
    expect(rayHits(5, -1, 5, 1, seg)).toBe(true);
    expect(rayHits(11, -1, 11, 1, seg)).toBe(false);
  });

  it('the engine agrees with the sampled reference within 1 % on the example design', () => {
    // Reference: tubes cut into 2000 point elements, every ray tested against every barrier.
    const cellCm = 3;
    const eng = computeFields(EXAMPLE_DESIGN, { cellCm });
    const ref = referenceFields(EXAMPLE_DESIGN, { cellCm });
    expect(maxRelativeError(eng, ref, 24)).toBeLessThan(0.01);
  });

  it('agrees on random designs (property, coarse grid)', () => {
    fc.assert(
      fc.property(arbDesign({ maxObjects: 6 }), (design) => {
        const eng = computeFields(design, { cellCm: 8 });
        const ref = referenceFields(design, { cellCm: 8, samples: 4000 });
        expect(maxRelativeError(eng, ref, design.enclosure.roomTempC ?? 24)).toBeLessThan(0.01);
      }),
      { numRuns: 25, seed: 20240601 },
    );
  });
});
