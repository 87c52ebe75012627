/**
 * A field drawn as a raster: each pixel takes the colour of its band on the shared scale, with the
 * enclosure outline and its objects drawn over it in dark lines. Pure RGBA pixels; png.ts encodes them.
 */
import type { Design, FieldGrid } from '@/simulation';
import { bandOf, type FieldScale } from '@/shared/field-scale';
import { hexRgb, kindOf, type RasterPen, type Rgb } from '@/shared/object-kinds';
import { drawingTop } from '@/shared/object-kinds/drawing';

export type Raster = { width: number; height: number; data: Uint8Array };

/** An opaque colour as one 32-bit pixel, in the machine's byte order (the raster's bytes stay RGBA). */
function pixelWord([r, g, b]: Rgb): number {
  return new Uint32Array(Uint8Array.of(r, g, b, 255).buffer)[0]!;
}
const INK: Rgb = [28, 31, 26];
const PAPER: Rgb = [255, 255, 255];

/** Longest side of the picture, px: readable in a report and on a phone. */
export const RASTER_LONG_SIDE = 960;
const MARGIN = 16;

export function renderFieldRaster(
  design: Design,
  grid: FieldGrid,
  scale: FieldScale,
  field = scale.field,
): Raster {
  const { width: w, height: h } = design.enclosure;
  // Room above the enclosure for lamps on the lid.
  const lampTop = drawingTop(design);
  const pxPerCm = (RASTER_LONG_SIDE - 2 * MARGIN) / Math.max(w, lampTop);
  const width = Math.round(w * pxPerCm) + 2 * MARGIN;
  const height = Math.round(lampTop * pxPerCm) + 2 * MARGIN;
  const data = new Uint8Array(width * height * 4);
  const put = (x: number, y: number, c: Rgb) => {
    if (x < 0 || y < 0 || x >= width || y >= height) return;
    const k = (y * width + x) * 4;
    data[k] = c[0];
    data[k + 1] = c[1];
    data[k + 2] = c[2];
    data[k + 3] = 255;
  };
  // Design cm → pixel (y up in the design, down in the picture).
  const px = (x: number) => Math.round(MARGIN + x * pxPerCm);
  const py = (y: number) => Math.round(height - MARGIN - y * pxPerCm);

  // The paper and the field are most of the pixels: written a whole pixel at a time, each cell's colour
  // worked out once rather than at every pixel it covers.
  const pixels = new Uint32Array(data.buffer, data.byteOffset, width * height);
  pixels.fill(pixelWord(PAPER));
  const words = scale.colors.map((c) => pixelWord(hexRgb(c)));
  const values = grid[field];
  const cellWord = new Uint32Array(grid.nx * grid.ny);
  for (let k = 0; k < cellWord.length; k++) cellWord[k] = words[bandOf(scale, values[k]!)]!;
  const [left, right] = [Math.max(0, px(0)), Math.min(width, px(w))];
  const column = new Int32Array(Math.max(0, right - left));
  for (let x = left; x < right; x++) {
    column[x - left] = Math.min(
      grid.nx - 1,
      Math.max(0, Math.floor((x + 0.5 - MARGIN) / pxPerCm / grid.cellCm)),
    );
  }
  for (let y = Math.max(0, py(h)); y < Math.min(height, py(0)); y++) {
    const j = Math.min(
      grid.ny - 1,
      Math.max(0, Math.floor((height - MARGIN - y - 0.5) / pxPerCm / grid.cellCm)),
    );
    const row = y * width;
    const cells = j * grid.nx;
    for (let x = left; x < right; x++) pixels[row + x] = cellWord[cells + column[x - left]!]!;
  }

  const line = (x1: number, y1: number, x2: number, y2: number, c: Rgb, thick = 2, dash = 0) => {
    const [ax, ay, bx, by] = [px(x1), py(y1), px(x2), py(y2)];
    const n = Math.max(1, Math.abs(bx - ax), Math.abs(by - ay));
    for (let s = 0; s <= n; s++) {
      if (dash && Math.floor(s / dash) % 2 === 1) continue;
      const x = Math.round(ax + ((bx - ax) * s) / n);
      const y = Math.round(ay + ((by - ay) * s) / n);
      const r = Math.floor(thick / 2);
      for (let dy = -r; dy < thick - r; dy++) for (let dx = -r; dx < thick - r; dx++) put(x + dx, y + dy, c);
    }
  };
  const box = (x: number, y: number, bw: number, bh: number, c: Rgb, fill?: Rgb) => {
    if (fill) {
      for (let yy = py(y + bh); yy <= py(y); yy++)
        for (let xx = px(x); xx <= px(x + bw); xx++) put(xx, yy, fill);
    }
    line(x, y, x + bw, y, c);
    line(x + bw, y, x + bw, y + bh, c);
    line(x + bw, y + bh, x, y + bh, c);
    line(x, y + bh, x, y, c);
  };

  const pen: RasterPen = { pxPerCm, ink: INK, line, box };
  for (const o of design.objects) kindOf(o.type).raster(o, pen);
  box(0, 0, w, h, INK);
  return { width, height, data };
}
