import { InvalidImageError } from './errors';
import { concatBytes } from '@/lib/bytes';

/**
 * Keeps only the chunks of a PNG needed to draw it (ISO/IEC 15948 / W3C PNG, §11): the critical ones and
 * the colour, transparency and density chunks. Everything else goes — tEXt, zTXt and iTXt (authors,
 * comments), eXIf (camera data, possibly a position), private and unknown chunks (an `htMl` chunk
 * carrying a script was once accepted) and anything after IEND. Kept chunks are copied as they are, so
 * the picture is unchanged and every kept chunk's CRC stays valid. The structure is checked on the way:
 * IHDR first, IEND last, every chunk inside the file.
 */
const KEEP = new Set([
  'IHDR',
  'PLTE',
  'IDAT',
  'IEND',
  'tRNS',
  'gAMA',
  'cHRM',
  'sRGB',
  'iCCP',
  'sBIT',
  'bKGD',
  'pHYs',
]);

export function stripPng(input: Uint8Array): Uint8Array {
  const view = new DataView(input.buffer, input.byteOffset, input.byteLength);
  const parts: Uint8Array[] = [input.subarray(0, 8)];
  let i = 8;
  let first = true;
  while (i + 12 <= input.length) {
    const length = view.getUint32(i);
    const type = String.fromCharCode(...input.subarray(i + 4, i + 8));
    const end = i + 12 + length;
    if (end > input.length || !/^[A-Za-z]{4}$/.test(type)) throw new InvalidImageError('PNG');
    if (first && type !== 'IHDR') throw new InvalidImageError('PNG');
    first = false;
    if (KEEP.has(type)) parts.push(input.subarray(i, end));
    if (type === 'IEND') return concatBytes(parts);
    i = end;
  }
  throw new InvalidImageError('PNG');
}
