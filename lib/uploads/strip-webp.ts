import { InvalidImageError } from './errors';
import { concatBytes } from '@/lib/bytes';

/**
 * Removes metadata from a WebP (RFC 9649): only the chunks that draw the picture are kept ("EXIF", "XMP "
 * and unknown chunks are dropped), the matching flags
 * in the VP8X header are cleared (so decoders do not look for them), and the RIFF size is rewritten.
 * Chunks are little-endian FourCC + size + data, padded to an even length.
 */
/** The chunks that draw the picture (RFC 9649 §2.7); EXIF, XMP and anything unknown are dropped. */
const KEEP = new Set(['VP8X', 'VP8 ', 'VP8L', 'ALPH', 'ANIM', 'ANMF', 'ICCP']);
const VP8X_EXIF = 0x08;
const VP8X_XMP = 0x04;

export function stripWebp(input: Uint8Array): Uint8Array {
  if (input.length < 20) throw new InvalidImageError('WebP');
  const view = new DataView(input.buffer, input.byteOffset, input.byteLength);
  const riffEnd = Math.min(input.length, 8 + view.getUint32(4, true));
  const parts: Uint8Array[] = [];
  let i = 12;
  let sawImage = false;
  while (i + 8 <= riffEnd) {
    const fourcc = String.fromCharCode(...input.subarray(i, i + 4));
    const size = view.getUint32(i + 4, true);
    const end = i + 8 + size + (size & 1);
    if (i + 8 + size > riffEnd) throw new InvalidImageError('WebP');
    if (fourcc === 'VP8 ' || fourcc === 'VP8L' || fourcc === 'ANIM') sawImage = true;
    if (KEEP.has(fourcc)) {
      const chunk = input.slice(i, Math.min(end, riffEnd));
      if (fourcc === 'VP8X' && size >= 1) chunk[8] = (chunk[8] as number) & ~(VP8X_EXIF | VP8X_XMP);
      parts.push(chunk);
    }
    i = end;
  }
  if (!sawImage) throw new InvalidImageError('WebP');
  const body = concatBytes(parts);
  const header = new Uint8Array(12);
  header.set(input.subarray(0, 12));
  new DataView(header.buffer).setUint32(4, 4 + body.length, true);
  return concatBytes([header, body]);
}
