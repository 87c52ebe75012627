import { describe, expect, it } from 'vitest';
import { hasControlCharacter, safeReturnTo } from './return-to';

describe('safeReturnTo', () => {
  it.each([
    ['/enclosures/3', '/enclosures/3'],
    ['/invite/abc?x=1', '/invite/abc?x=1'],
    [['/members', '/other'], '/members'],
    ['/studio/4#probe', '/studio/4#probe'],
  ])('follows the same-site path %j', (value, expected) => {
    expect(safeReturnTo(value)).toBe(expected);
  });

  it.each([
    ['https://evil.example/'],
    ['//evil.example/x'],
    ['/\\evil.example'],
    ['javascript:alert(1)'],
    // Browsers drop tabs and newlines from URLs, so these would become //evil.example.
    ['/\t/evil.example'],
    ['/\n/evil.example'],
    ['/\r\n/evil.example'],
    ['/%09/evil.example/../..//evil.example'],
    ['/\u0000/x'],
    ['/a\\b'],
    [''],
    [undefined],
  ])('ignores %j and goes to the default page', (value) => {
    expect(safeReturnTo(value)).toBe('/enclosures');
  });

  it('never returns something a browser reads as another origin', () => {
    for (const v of ['/.//evil.example', '/./\t/evil.example', '/%2F/evil.example', '/..//evil.example']) {
      const out = safeReturnTo(v);
      expect(new URL(out, 'https://app.example').origin, v).toBe('https://app.example');
    }
  });

  it('recognises control characters', () => {
    expect(hasControlCharacter('/a\tb')).toBe(true);
    expect(hasControlCharacter('/a\u007fb')).toBe(true);
    expect(hasControlCharacter('/a b')).toBe(false);
  });
});
