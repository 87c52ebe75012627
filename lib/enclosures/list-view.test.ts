import { describe, expect, it } from 'vitest';
import {
  apiQueryForView,
  ariaSortFor,
  DEFAULT_ENCLOSURE_VIEW,
  ENCLOSURE_PAGE_SIZE,
  nextSort,
  pageCount,
  searchParamsForView,
  viewFromSearchParams,
} from './list-view';

const read = (qs: string) => viewFromSearchParams(new URLSearchParams(qs));

describe('the view in the address', () => {
  it('is newest first, page 1, no search, when the address names nothing', () => {
    expect(read('')).toEqual({ q: '', sort: { column: 'updated', descending: true }, page: 1 });
  });

  it('reads search, sort, direction and page', () => {
    expect(read('q=%20gecko%20&sort=keeper&dir=desc&page=3')).toEqual({
      q: 'gecko',
      sort: { column: 'keeper', descending: true },
      page: 3,
    });
  });

  it('takes the natural direction of a column when none is named', () => {
    expect(read('sort=name').sort).toEqual({ column: 'name', descending: false });
    expect(read('sort=size').sort).toEqual({ column: 'size', descending: true });
  });

  it('falls back to the default for anything unknown or out of range', () => {
    expect(read('sort=notes&dir=sideways&page=-2')).toEqual(DEFAULT_ENCLOSURE_VIEW);
    expect(read('page=1.5').page).toBe(1);
    expect(read('page=abc').page).toBe(1);
    expect(read(`q=${'x'.repeat(300)}`).q).toHaveLength(120);
  });

  it('round-trips through the address and keeps other parameters', () => {
    const view = { q: 'dragon tank', sort: { column: 'animal', descending: false }, page: 2 } as const;
    const params = searchParamsForView(view, new URLSearchParams('keeper=7&page=9'));
    expect(params.get('keeper')).toBe('7');
    expect(params.getAll('page')).toEqual(['2']);
    expect(viewFromSearchParams(params)).toEqual(view);
  });

  it('leaves defaults out, so the plain list keeps its plain address', () => {
    expect(searchParamsForView(DEFAULT_ENCLOSURE_VIEW).toString()).toBe('');
    // A non-default direction on the default column must be written, or it would be lost.
    const ascending = { ...DEFAULT_ENCLOSURE_VIEW, sort: { column: 'updated', descending: false } } as const;
    expect(searchParamsForView(ascending).toString()).toBe('sort=updated&dir=asc');
  });
});

describe('the API query of a view', () => {
  it('turns the page into an offset and names the scope', () => {
    const view = { q: 'gecko', sort: { column: 'size', descending: false }, page: 3 } as const;
    const q = apiQueryForView(view, { organisationId: 4, keeperId: 9 });
    expect(Object.fromEntries(q)).toEqual({
      organisationId: '4',
      keeperId: '9',
      q: 'gecko',
      sort: 'size',
      dir: 'asc',
      offset: String(2 * ENCLOSURE_PAGE_SIZE),
      limit: String(ENCLOSURE_PAGE_SIZE),
    });
    expect(apiQueryForView(DEFAULT_ENCLOSURE_VIEW, { organisationId: 4 }).has('keeperId')).toBe(false);
  });

  it('counts pages, at least one', () => {
    expect(pageCount(0)).toBe(1);
    expect(pageCount(ENCLOSURE_PAGE_SIZE)).toBe(1);
    expect(pageCount(ENCLOSURE_PAGE_SIZE + 1)).toBe(2);
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
