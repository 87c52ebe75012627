import 'server-only';
import { PNG } from 'pngjs';
import type { Raster } from './raster';

/** Encodes an RGBA raster as a PNG file. */
export function encodePng(r: Raster): Buffer {
  const png = new PNG({ width: r.width, height: r.height });
  png.data = Buffer.from(r.data.buffer, r.data.byteOffset, r.data.byteLength);
  return PNG.sync.write(png);
}
