import { concatBytes } from '@/lib/bytes';

/**
 * Reads a request body of at most `limit` bytes, counting bytes as they arrive whatever Content-Length
 * claimed, so an oversized body is refused (`tooLarge`) without being held in memory.
 */
export async function readCapped(
  body: ReadableStream<Uint8Array>,
  limit: number,
  tooLarge: () => Error,
): Promise<Uint8Array> {
  const reader = body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > limit) {
      await reader.cancel();
      throw tooLarge();
    }
    chunks.push(value);
  }
  return concatBytes(chunks);
}
