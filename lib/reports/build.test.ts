import { inflateSync } from 'node:zlib';
import { PDFDocument, PDFName, PDFNumber, PDFRawStream } from 'pdf-lib';
import { PNG } from 'pngjs';
import { beforeEach, describe, expect, it } from 'vitest';
import { exampleDesign, type Design } from '@/simulation';
import { bandOf } from '@/shared/field-scale';
import { computedCache, computedFor } from '@/lib/variants/computed';
import { fieldPng, reportPdf, type ReportSubject } from './build';
import type { FlateImage } from './png';
import { renderFieldRaster } from './raster';

const subject = (design: Design): ReportSubject => ({
  variantName: 'Tube moved left',
  version: 3,
  designName: 'Spring plan',
  enclosureName: 'Test tank',
  organisationName: 'Test Rooms',
  design,
});

/** The raster's pixels without alpha (every pixel of a field picture is opaque). */
function rgbOf(r: { data: Uint8Array }): Buffer {
  const out = Buffer.alloc((r.data.length / 4) * 3);
  for (let k = 0, j = 0; k < r.data.length; k += 4, j += 3) {
    out[j] = r.data[k]!;
    out[j + 1] = r.data[k + 1]!;
    out[j + 2] = r.data[k + 2]!;
  }
  return out;
}

/** The image objects of a PDF: their size and their samples, inflated. */
async function imagesOf(pdf: Uint8Array) {
  const doc = await PDFDocument.load(pdf);
  return doc.context
    .enumerateIndirectObjects()
    .map(([, object]) => object)
    .filter((o): o is PDFRawStream => o instanceof PDFRawStream)
    .filter((s) => s.dict.get(PDFName.of('Subtype')) === PDFName.of('Image'))
    .map((s) => ({
      width: (s.dict.get(PDFName.of('Width')) as PDFNumber).asNumber(),
      height: (s.dict.get(PDFName.of('Height')) as PDFNumber).asNumber(),
      samples: inflateSync(s.contents),
    }));
}

beforeEach(() => computedCache.clear());

describe('field picture raster', () => {
  it('paints each pixel of the enclosure in the band colour of the cell under it, paper around it', () => {
    const design = exampleDesign();
    const computed = computedFor(design);
    const { scale } = computed.view('uvi');
    const { grid } = computed.sim;
    const r = renderFieldRaster(design, grid, scale);
    const pixel = (x: number, y: number) =>
      Array.from(r.data.subarray((y * r.width + x) * 4, (y * r.width + x) * 4 + 4));
    expect(pixel(2, 2)).toEqual([255, 255, 255, 255]);
    // A point inside the enclosure away from every object's outline: 10 cm from the left, 5 cm up.
    const pxPerCm = (r.width - 32) / design.enclosure.width;
    const [x, y] = [Math.round(16 + 10 * pxPerCm), Math.round(r.height - 16 - 5 * pxPerCm)];
    const i = Math.floor((x + 0.5 - 16) / pxPerCm / grid.cellCm);
    const j = Math.floor((r.height - 16 - y - 0.5) / pxPerCm / grid.cellCm);
    const hex = scale.colors[bandOf(scale, grid.uvi[j * grid.nx + i]!)]!;
    const n = Number.parseInt(hex.slice(1), 16);
    expect(pixel(x, y)).toEqual([(n >> 16) & 255, (n >> 8) & 255, n & 255, 255]);
  });
});

describe('report exports of one design version', () => {
  it('encode the field picture once: a second PNG export of the same content is the same file', () => {
    const design = exampleDesign();
    const first = fieldPng(subject(design), { field: 'tempC', months: 0 });
    // The same version read again from the database is another object with the same content.
    const again = fieldPng(subject(structuredClone(design)), { field: 'tempC', months: 0 });
    expect(again).toBe(first);
    // The PNG holds exactly the raster's pixels.
    const computed = computedFor(design);
    const raster = renderFieldRaster(design, computed.sim.grid, computed.view('tempC').scale);
    const png = PNG.sync.read(Buffer.from(again));
    expect([png.width, png.height]).toEqual([raster.width, raster.height]);
    expect(Buffer.from(png.data).equals(Buffer.from(raster.data))).toBe(true);
  });

  it('draw a changed design, another field or another lamp age afresh', () => {
    const design = exampleDesign();
    const base = fieldPng(subject(design), { field: 'uvi', months: 0 });
    const moved = structuredClone(design);
    const tube = moved.objects[0]!;
    if (tube.type === 'lamp') tube.x += 20;
    expect(Buffer.from(fieldPng(subject(moved), { field: 'uvi', months: 0 })).equals(base)).toBe(false);
    expect(fieldPng(subject(design), { field: 'uvb', months: 0 })).not.toBe(base);
    expect(fieldPng(subject(design), { field: 'uvi', months: 12 })).not.toBe(base);
  });

  it('give the same PDF, byte for byte, for a second report at the same moment, with the field picture in it', async () => {
    const design = exampleDesign();
    const now = new Date('2026-05-04T10:00:00Z');
    const opts = { field: 'uvi' as const, months: 0, species: null };
    const first = await reportPdf(subject(design), opts, now);
    // The picture is kept with the design's engine run: a second report does not draw it again.
    const kept = computedFor(design).derived<FlateImage>('pdf-image:uvi', () => {
      throw new Error('the report picture was not kept');
    });
    const again = await reportPdf(subject(structuredClone(design)), opts, now);
    expect(Buffer.from(again).equals(Buffer.from(first))).toBe(true);
    const computed = computedFor(design);
    const raster = renderFieldRaster(design, computed.sim.grid, computed.view('uvi').scale);
    const [image, ...others] = await imagesOf(again);
    expect(others).toEqual([]);
    expect([image!.width, image!.height]).toEqual([raster.width, raster.height]);
    expect([kept.width, kept.height]).toEqual([raster.width, raster.height]);
    expect(image!.samples.equals(rgbOf(raster))).toBe(true);
  });
});
