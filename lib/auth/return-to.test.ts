import { describe, expect, it } from 'vitest';
import { safeReturnTo } from './return-to';

describe('safeReturnTo', () => {
  it.each([
    ['/enclosures/3', '/enclosures/3'],
    ['/invite/abc?x=1', '/invite/abc?x=1'],
    [['/members', '/other'], '/members'],
  ])('follows the same-site path %j', (value, expected) => {
    expect(safeReturnTo(value)).toBe(expected);
  });

  it.each([
    ['https://evil.example/'],
    ['//evil.example/x'],
    ['/\\evil.example'],
    ['javascript:alert(1)'],
    [''],
    [undefined],
  ])('ignores %j and goes to the default page', (value) => {
    expect(safeReturnTo(value)).toBe('/enclosures');
  });
});
