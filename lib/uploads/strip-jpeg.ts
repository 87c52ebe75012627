import { concatBytes } from '@/lib/bytes';
import { InvalidImageError } from './errors';

/**
 * Removes metadata from a JPEG by walking its marker segments (ISO/IEC 10918-1, Annex B):
 * every application segment but APP0, APP2 and APP14 — among them APP1 (Exif, XMP: camera, time, often
 * GPS position) and APP13 (IPTC: names, places) — and COM (comments) are dropped, as is anything after
 * the end-of-image marker; everything needed to draw the picture (tables, frame, scan, APP0 JFIF, APP2 ICC colour
 * profile, APP14 Adobe colour transform) is kept byte for byte. After the first start-of-scan the
 * rest of the file is entropy-coded data and is copied as it is.
 */
const KEEP_APP = new Set([0xe0, 0xe2, 0xee]);
/** Application segments (APP0–APP15) and comments are kept only if they help draw the picture. */
const dropped = (marker: number) =>
  marker === 0xfe || (marker >= 0xe0 && marker <= 0xef && !KEEP_APP.has(marker));
// Markers that stand alone, with no length field.
const STANDALONE = new Set([0x01, 0xd0, 0xd1, 0xd2, 0xd3, 0xd4, 0xd5, 0xd6, 0xd7]);

export function stripJpeg(input: Uint8Array): Uint8Array {
  if (input.length < 4 || input[0] !== 0xff || input[1] !== 0xd8) throw new InvalidImageError('JPEG');
  const parts: Uint8Array[] = [input.subarray(0, 2)];
  let i = 2;
  let sawFrame = false;
  while (i < input.length) {
    if (input[i] !== 0xff) throw new InvalidImageError('JPEG');
    // Any number of 0xFF fill bytes may precede a marker.
    let j = i;
    while (j < input.length && input[j] === 0xff) j++;
    if (j >= input.length) throw new InvalidImageError('JPEG');
    const marker = input[j] as number;
    if (marker === 0xd9) {
      parts.push(input.subarray(i, j + 1));
      return finish(parts, sawFrame);
    }
    if (STANDALONE.has(marker)) {
      parts.push(input.subarray(i, j + 1));
      i = j + 1;
      continue;
    }
    if (j + 2 >= input.length) throw new InvalidImageError('JPEG');
    const length = ((input[j + 1] as number) << 8) | (input[j + 2] as number);
    const end = j + 1 + length;
    if (length < 2 || end > input.length) throw new InvalidImageError('JPEG');
    // SOF0–SOF15 except DHT (C4), JPG (C8) and DAC (CC): a frame header, i.e. a real picture.
    if (marker >= 0xc0 && marker <= 0xcf && marker !== 0xc4 && marker !== 0xc8 && marker !== 0xcc)
      sawFrame = true;
    if (marker === 0xda) {
      // Start of scan: the compressed picture follows; keep it up to the last end-of-image marker, and
      // nothing after it (bytes there are not part of the picture).
      let eoi = input.length - 2;
      while (eoi > j && !(input[eoi] === 0xff && input[eoi + 1] === 0xd9)) eoi--;
      if (eoi <= j) throw new InvalidImageError('JPEG');
      parts.push(input.subarray(i, eoi + 2));
      return finish(parts, sawFrame);
    }
    if (!dropped(marker)) parts.push(input.subarray(i, end));
    i = end;
  }
  throw new InvalidImageError('JPEG');
}

function finish(parts: Uint8Array[], sawFrame: boolean): Uint8Array {
  if (!sawFrame) throw new InvalidImageError('JPEG');
  return concatBytes(parts);
}
