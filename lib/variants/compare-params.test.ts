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
});
