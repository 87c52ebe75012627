import { describe, expect, it } from 'vitest';
import { Lru } from './lru';

describe('Lru', () => {
  it('drops the least recently used entry beyond its capacity', () => {
    const lru = new Lru<string, number>(2);
    lru.set('a', 1);
    lru.set('b', 2);
    expect(lru.get('a')).toBe(1); // a is now the most recent
    lru.set('c', 3);
    expect(lru.size).toBe(2);
    expect(lru.get('b')).toBeUndefined();
    expect(lru.get('a')).toBe(1);
    expect(lru.get('c')).toBe(3);
  });

  it('computes a missing value once and serves it afterwards', () => {
    const lru = new Lru<string, { n: number }>(4);
    let made = 0;
    const make = () => ({ n: ++made });
    const first = lru.getOrSet('k', make);
    expect(lru.getOrSet('k', make)).toBe(first);
    expect(made).toBe(1);
  });

  it('forgets a deleted entry, so the next getOrSet makes it again', () => {
    const lru = new Lru<string, number>(4);
    lru.set('k', 1);
    lru.delete('k');
    expect(lru.get('k')).toBeUndefined();
    expect(lru.size).toBe(0);
    expect(lru.getOrSet('k', () => 2)).toBe(2);
  });

  it('refuses a capacity that is not a positive integer', () => {
    expect(() => new Lru(0)).toThrow(/capacity/);
    expect(() => new Lru(1.5)).toThrow(/capacity/);
  });
});
