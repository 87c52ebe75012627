import { InvalidImageError } from './errors';
import type { ImageType } from './sniff';

/**
 * A picture's size in pixels, read from its header without decoding it, so a small file that claims an
 * enormous picture (one that would take gigabytes to draw in the studio) is refused before it is kept.
 * PNG: IHDR (ISO/IEC 15948 §11.2.2). JPEG: the first SOFn segment (ISO/IEC 10918-1, B.2.2).
 * WebP: VP8X canvas, VP8L header or VP8 key frame (RFC 9649 §2.5–2.7).
 */
export type Dimensions = { width: number; height: number };

/** A tracing photo needs far less; these keep a decoded picture under about 160 MB of pixels. */
export const MAX_IMAGE_SIDE_PX = 12_000;
export const MAX_IMAGE_PIXELS = 40_000_000;

export function imageDimensions(type: ImageType, b: Uint8Array): Dimensions {
  const view = new DataView(b.buffer, b.byteOffset, b.byteLength);
  const format = type === 'image/png' ? 'PNG' : type === 'image/jpeg' ? 'JPEG' : 'WebP';
  const fail = () => new InvalidImageError(format);
  try {
    if (type === 'image/png') return { width: view.getUint32(16), height: view.getUint32(20) };
    if (type === 'image/jpeg') return jpegDimensions(b, view, fail);
    return webpDimensions(b, view, fail);
  } catch (e) {
    if (e instanceof RangeError) throw fail();
    throw e;
  }
}

function jpegDimensions(b: Uint8Array, view: DataView, fail: () => Error): Dimensions {
  let i = 2;
  while (i + 9 < b.length) {
    if (b[i] !== 0xff) throw fail();
    const marker = b[i + 1] as number;
    if (marker === 0xff) {
      i++;
      continue;
    }
    const isFrame = marker >= 0xc0 && marker <= 0xcf && ![0xc4, 0xc8, 0xcc].includes(marker);
    if (isFrame) return { height: view.getUint16(i + 5), width: view.getUint16(i + 7) };
    if (marker === 0xda || marker === 0xd9) break;
    if ((marker >= 0xd0 && marker <= 0xd7) || marker === 0x01) {
      i += 2;
      continue;
    }
    i += 2 + view.getUint16(i + 2);
  }
  throw fail();
}

function webpDimensions(b: Uint8Array, view: DataView, fail: () => Error): Dimensions {
  const fourcc = String.fromCharCode(...b.subarray(12, 16));
  if (fourcc === 'VP8X') {
    const w = 1 + (view.getUint16(24, true) | (b[26]! << 16));
    const h = 1 + (view.getUint16(27, true) | (b[29]! << 16));
    return { width: w, height: h };
  }
  if (fourcc === 'VP8L') {
    if (b[20] !== 0x2f) throw fail();
    const bits = view.getUint32(21, true);
    return { width: (bits & 0x3fff) + 1, height: ((bits >>> 14) & 0x3fff) + 1 };
  }
  if (fourcc === 'VP8 ') {
    // Key frame start code 9D 01 2A, then 14-bit width and height.
    if (b[23] !== 0x9d || b[24] !== 0x01 || b[25] !== 0x2a) throw fail();
    return { width: view.getUint16(26, true) & 0x3fff, height: view.getUint16(28, true) & 0x3fff };
  }
  throw fail();
}

/** Null when the picture is within the caps, else the sentence saying which cap it passes. */
export function dimensionProblem({ width, height }: Dimensions): string | null {
  if (width < 1 || height < 1) return 'The picture has no pixels.';
  if (width > MAX_IMAGE_SIDE_PX || height > MAX_IMAGE_SIDE_PX)
    return `The picture is ${width} × ${height} pixels; photos can be at most ${MAX_IMAGE_SIDE_PX} pixels on a side.`;
  if (width * height > MAX_IMAGE_PIXELS)
    return `The picture is ${width} × ${height} pixels; photos can have at most ${MAX_IMAGE_PIXELS / 1e6} million pixels.`;
  return null;
}
