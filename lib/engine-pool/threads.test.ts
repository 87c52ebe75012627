import { describe, expect, it } from 'vitest';
import { defaultThreads } from '.';

describe('defaultThreads', () => {
  it('gives one server process the cores but one, at most 4', () => {
    expect(defaultThreads(1, { WEB_PROCESSES: 1 })).toBe(1);
    expect(defaultThreads(2, { WEB_PROCESSES: 1 })).toBe(1);
    expect(defaultThreads(4, { WEB_PROCESSES: 1 })).toBe(3);
    expect(defaultThreads(16, { WEB_PROCESSES: 1 })).toBe(4);
  });

  it('shares those cores among the server processes, at least one thread each', () => {
    expect(defaultThreads(2, { WEB_PROCESSES: 2 })).toBe(1);
    expect(defaultThreads(8, { WEB_PROCESSES: 2 })).toBe(3);
    expect(defaultThreads(8, { WEB_PROCESSES: 8 })).toBe(1);
    expect(defaultThreads(16, { WEB_PROCESSES: 3 })).toBe(4);
  });

  it('takes ENGINE_THREADS as given', () => {
    expect(defaultThreads(2, { ENGINE_THREADS: 6, WEB_PROCESSES: 2 })).toBe(6);
  });
});
