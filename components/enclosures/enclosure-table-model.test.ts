import { describe, expect, it } from 'vitest';
import {
  ariaSortFor,
  compareEnclosures,
  matchesEnclosureSearch,
  nextSort,
  visibleEnclosures,
} from './enclosure-table-model';
import type { EnclosureView } from './types';

function enclosure(over: Partial<EnclosureView> & { id: number; name: string }): EnclosureView {
  return {
    keeperId: 1,
    keeperName: 'Keeper',
    widthCm: 90,
    heightCm: 45,
    depthCm: 45,
    speciesName: null,
    animalName: null,
    notes: null,
    updatedAt: '2026-01-01T00:00:00.000Z',
    ...over,
  };
}

const desert = enclosure({
  id: 1,
  name: 'Desert vivarium',
  animalName: 'Saffron',
  speciesName: 'Central bearded dragon',
  keeperName: 'Ana Brook',
  widthCm: 120,
  depthCm: 60,
  heightCm: 60,
  updatedAt: '2026-03-01T10:00:00.000Z',
});
const forest = enclosure({
  id: 2,
  name: 'Forest tank',
  animalName: null,
  speciesName: 'Crested gecko',
  keeperName: 'Émile Dunn',
  widthCm: 45,
  depthCm: 45,
  heightCm: 60,
  updatedAt: '2026-05-01T10:00:00.000Z',
});
const tub = enclosure({
  id: 3,
  name: 'bench tub',
  keeperName: null,
  widthCm: 60,
  depthCm: 40,
  heightCm: 30,
  updatedAt: '2026-01-15T10:00:00.000Z',
});
const rows = [desert, forest, tub];

describe('matchesEnclosureSearch', () => {
  it('finds by name, animal, species and keeper, ignoring case and accents', () => {
    expect(matchesEnclosureSearch(desert, 'desert')).toBe(true);
    expect(matchesEnclosureSearch(desert, 'SAFFRON')).toBe(true);
    expect(matchesEnclosureSearch(forest, 'crested')).toBe(true);
    expect(matchesEnclosureSearch(forest, 'emile')).toBe(true);
    expect(matchesEnclosureSearch(desert, 'gecko')).toBe(false);
  });

  it('needs every word, in any order; an empty query matches everything', () => {
    expect(matchesEnclosureSearch(desert, 'brook dragon')).toBe(true);
    expect(matchesEnclosureSearch(desert, 'brook gecko')).toBe(false);
    expect(matchesEnclosureSearch(tub, '   ')).toBe(true);
  });
});

describe('visibleEnclosures', () => {
  it('sorts by updated, newest first, by default', () => {
    expect(visibleEnclosures(rows, '').map((e) => e.id)).toEqual([2, 1, 3]);
  });

  it('sorts names A–Z without regard to case', () => {
    const ids = visibleEnclosures(rows, '', { column: 'name', descending: false }).map((e) => e.id);
    expect(ids).toEqual([3, 1, 2]);
  });

  it('sorts size by floor area, largest first when descending', () => {
    // 120×60 = 7200, 60×40 = 2400, 45×45 = 2025
    const ids = visibleEnclosures(rows, '', { column: 'size', descending: true }).map((e) => e.id);
    expect(ids).toEqual([1, 3, 2]);
  });

  it('puts enclosures without a keeper or animal after the named ones', () => {
    expect(visibleEnclosures(rows, '', { column: 'keeper', descending: false }).map((e) => e.id)).toEqual([
      1, 2, 3,
    ]);
    expect(compareEnclosures(tub, forest, 'animal')).toBeGreaterThan(0);
  });

  it('filters before sorting and returns nothing when nothing matches', () => {
    expect(visibleEnclosures(rows, 'tank').map((e) => e.id)).toEqual([2]);
    expect(visibleEnclosures(rows, 'python')).toEqual([]);
  });

  it('does not reorder the array it was given', () => {
    const copy = [...rows];
    visibleEnclosures(rows, '', { column: 'name', descending: true });
    expect(rows).toEqual(copy);
  });
});

describe('header sorting', () => {
  it('flips direction on the same column and picks a sensible first direction on a new one', () => {
    expect(nextSort({ column: 'updated', descending: true }, 'updated')).toEqual({
      column: 'updated',
      descending: false,
    });
    expect(nextSort({ column: 'updated', descending: true }, 'name')).toEqual({
      column: 'name',
      descending: false,
    });
    expect(nextSort({ column: 'name', descending: false }, 'size')).toEqual({
      column: 'size',
      descending: true,
    });
  });

  it('reports aria-sort only on the sorted column', () => {
    const sort = { column: 'name', descending: false } as const;
    expect(ariaSortFor('name', sort)).toBe('ascending');
    expect(ariaSortFor('updated', sort)).toBe('none');
    expect(ariaSortFor('updated', { column: 'updated', descending: true })).toBe('descending');
  });
});
