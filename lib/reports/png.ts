import 'server-only';
import { deflateSync } from 'node:zlib';
import { PNG } from 'pngjs';
import type { Raster } from './raster';

/**
 * Encodes an RGBA raster as a PNG file. No row filters and zlib's default strategy: the picture is flat
 * bands of colour, which plain deflate packs as small as pngjs's default (every filter tried on every
 * row, then run-length only) in about half the time.
 */
export function encodePng(r: Raster): Buffer {
  const png = new PNG({ width: r.width, height: r.height });
  png.data = Buffer.from(r.data.buffer, r.data.byteOffset, r.data.byteLength);
  return PNG.sync.write(png, { filterType: 0, deflateStrategy: 0 });
}

/** A raster as a report embeds it: width, height and its RGB samples, deflated (a PDF FlateDecode image). */
export type FlateImage = { width: number; height: number; rgb: Uint8Array };

/**
 * The raster's colour samples deflated by zlib, ready to go into a PDF as they are. Every pixel is
 * opaque, so the alpha channel is left out (no soft mask).
 */
export function flateRgb(r: Raster): FlateImage {
  const rgb = new Uint8Array(r.width * r.height * 3);
  for (let k = 0, j = 0; k < r.data.length; k += 4, j += 3) {
    rgb[j] = r.data[k]!;
    rgb[j + 1] = r.data[k + 1]!;
    rgb[j + 2] = r.data[k + 2]!;
  }
  return { width: r.width, height: r.height, rgb: deflateSync(rgb) };
}
