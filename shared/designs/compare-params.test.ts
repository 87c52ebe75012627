import { describe, expect, it } from 'vitest';
import { compareQuery, parseCompareParams } from './compare-params';

describe('compare page parameters', () => {
  it('reads the choices from the URL', () => {
    expect(parseCompareParams({ a: '4', b: '9', field: 'tempC', months: '6', species: '2' })).toEqual({
      a: 4,
      b: 9,
      field: 'tempC',
      months: 6,
      species: 2,
    });
  });
  it('falls back to defaults for anything malformed', () => {
    expect(parseCompareParams({ a: 'x', b: '-3', field: 'light', months: 'soon' })).toEqual({
      a: undefined,
      b: undefined,
      field: 'uvi',
      months: 0,
      species: undefined,
    });
    expect(parseCompareParams({ a: ['5', '6'] }).a).toBe(5);
  });
  it('writes them back so a reload shows the same comparison', () => {
    const p = { a: 1, b: 2, field: 'uvb' as const, months: 12, species: undefined };
    expect(compareQuery(p)).toBe('a=1&b=2&field=uvb&months=12');
    expect(parseCompareParams(Object.fromEntries(new URLSearchParams(compareQuery(p))))).toEqual(p);
  });
  it('tells "no species" (species=none) from "the enclosure’s species" (no species at all)', () => {
    expect(parseCompareParams({ a: '1', species: 'none' }).species).toBe('none');
    expect(parseCompareParams({ a: '1' }).species).toBeUndefined();
    expect(parseCompareParams({ a: '1', species: 'all' }).species).toBeUndefined();
    const none = { a: 1, b: 2, field: 'uvi' as const, months: 0, species: 'none' as const };
    expect(compareQuery(none)).toBe('a=1&b=2&field=uvi&months=0&species=none');
    expect(parseCompareParams(Object.fromEntries(new URLSearchParams(compareQuery(none))))).toEqual(none);
  });
});
