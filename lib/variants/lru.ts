/**
 * A small least-recently-used map with a fixed number of entries: a Map keeps insertion order, so the
 * first key is always the least recently used one (a hit moves its key to the end).
 */
export class Lru<K, V> {
  private readonly map = new Map<K, V>();

  constructor(readonly capacity: number) {
    if (!Number.isInteger(capacity) || capacity < 1) throw new Error('capacity must be a positive integer');
  }

  get size(): number {
    return this.map.size;
  }

  get(key: K): V | undefined {
    const value = this.map.get(key);
    if (value === undefined) return undefined;
    this.map.delete(key);
    this.map.set(key, value);
    return value;
  }

  set(key: K, value: V): void {
    this.map.delete(key);
    this.map.set(key, value);
    while (this.map.size > this.capacity) {
      const oldest = this.map.keys().next();
      if (oldest.done) break;
      this.map.delete(oldest.value);
    }
  }

  /** The cached value, or `make()`'s, stored. */
  getOrSet(key: K, make: () => V): V {
    const hit = this.get(key);
    if (hit !== undefined) return hit;
    const value = make();
    this.set(key, value);
    return value;
  }

  delete(key: K): void {
    this.map.delete(key);
  }

  clear(): void {
    this.map.clear();
  }
}
