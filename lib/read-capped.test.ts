import { describe, expect, it } from 'vitest';
import { readCapped } from './read-capped';

const stream = (...chunks: number[][]) =>
  new ReadableStream<Uint8Array>({
    start(controller) {
      for (const c of chunks) controller.enqueue(Uint8Array.from(c));
      controller.close();
    },
  });

describe('readCapped', () => {
  it('joins the chunks in order', async () => {
    const bytes = await readCapped(stream([1, 2], [3], [4, 5]), 5, () => new Error('too large'));
    expect([...bytes]).toEqual([1, 2, 3, 4, 5]);
  });

  it('refuses a body one byte over the limit, however it is split', async () => {
    await expect(readCapped(stream([1, 2, 3], [4, 5, 6]), 5, () => new Error('too large'))).rejects.toThrow(
      'too large',
    );
  });

  it('reads an empty body as no bytes', async () => {
    expect((await readCapped(stream(), 5, () => new Error('too large'))).byteLength).toBe(0);
  });
});
