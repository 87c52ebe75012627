import { DomainError } from '@/lib/errors';
import { readCapped } from '@/lib/read-capped';

export const tooLarge = (limitBytes: number) =>
  new DomainError(
    'too_large',
    `The file is larger than ${Math.round(limitBytes / (1024 * 1024))} MB. Use a smaller photo (a phone photo resized to about 2000 px wide is plenty for tracing).`,
    { code: 'payload_too_large' },
  );

/** Reads a raw request body of at most `limit` bytes (an oversized upload is refused as it arrives). */
export async function readRawBody(req: Request, limit: number): Promise<Uint8Array> {
  const declared = Number(req.headers.get('content-length') ?? '');
  if (Number.isFinite(declared) && declared > limit) throw tooLarge(limit);
  if (!req.body) throw new DomainError('invalid', 'The request has no file in it.', { field: 'file' });
  const bytes = await readCapped(req.body, limit, () => tooLarge(limit));
  if (bytes.byteLength === 0) throw new DomainError('invalid', 'The file is empty.', { field: 'file' });
  return bytes;
}
