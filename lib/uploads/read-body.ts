import { DomainError } from '@/lib/errors';

export const tooLarge = (limitBytes: number) =>
  new DomainError(
    'too_large',
    `The file is larger than ${Math.round(limitBytes / (1024 * 1024))} MB. Use a smaller photo (a phone photo resized to about 2000 px wide is plenty for tracing).`,
    { code: 'payload_too_large' },
  );

/**
 * Reads a raw request body of at most `limit` bytes, counting bytes as they arrive whatever
 * Content-Length claims, so an oversized upload is refused without being held in memory.
 */
export async function readRawBody(req: Request, limit: number): Promise<Uint8Array> {
  const declared = Number(req.headers.get('content-length') ?? '');
  if (Number.isFinite(declared) && declared > limit) throw tooLarge(limit);
  if (!req.body) throw new DomainError('invalid', 'The request has no file in it.', { field: 'file' });
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > limit) {
      await reader.cancel();
      throw tooLarge(limit);
    }
    chunks.push(value);
  }
  if (size === 0) throw new DomainError('invalid', 'The file is empty.', { field: 'file' });
  const out = new Uint8Array(size);
  let o = 0;
  for (const c of chunks) {
    out.set(c, o);
    o += c.byteLength;
  }
  return out;
}
