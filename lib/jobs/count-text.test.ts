import { describe, expect, it } from 'vitest';
import { countPhrase } from './count-text';

describe('countPhrase', () => {
  it('makes the counted noun singular for one, whatever words follow it', () => {
    expect(countPhrase('e-mails queued', 1)).toBe('1 e-mail queued');
    expect(countPhrase('lamps due', 1)).toBe('1 lamp due');
    expect(countPhrase('customer lamps checked', 1)).toBe('1 customer lamp checked');
    expect(countPhrase('lamps brought up to date', 1)).toBe('1 lamp brought up to date');
  });

  it('keeps the plural for none and for many, with thousands separated', () => {
    expect(countPhrase('e-mails queued', 0)).toBe('0 e-mails queued');
    expect(countPhrase('lamps due', 2)).toBe('2 lamps due');
    expect(countPhrase('lamps brought up to date', 12000)).toBe('12,000 lamps brought up to date');
  });
});
