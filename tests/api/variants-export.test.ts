import { PDFDocument } from 'pdf-lib';
import { PNG } from 'pngjs';
import { describe, expect, it } from 'vitest';
import * as enclosureDesignsRoute from '@/app/api/enclosures/[id]/designs/route';
import * as variantRoute from '@/app/api/variants/[id]/route';
import { Organisation } from '@/models';
import { EXAMPLE_DATA_NOTE } from '@/shared/example-data';
import { withTestDatabase } from '../helpers/db';
import { createKeeperWorld } from '../helpers/world';
import { call, exportVariant, pdfDrawnText, postDesign } from './variants.helpers';

withTestDatabase();

const design = {
  format: 'baskwell.design',
  version: 2,
  enclosure: { width: 120, height: 60, depth: 60 },
  objects: [
    {
      type: 'lamp',
      id: 'uv1',
      name: 'Basking tube',
      tech: 't5',
      form: 'tube',
      x: 90,
      y: 62,
      length: 55,
      uvbAt30: 42.5,
    },
    { type: 'lamp', id: 'heat1', tech: 'halogen', form: 'bulb', x: 95, y: 62, watts: 75, beamDeg: 30 },
    { type: 'screen', id: 'lid', x1: 0, y1: 60, x2: 120, y2: 60 },
    { type: 'ledge', id: 'rock', x: 80, y: 0, width: 30, height: 25 },
  ],
};

async function world(speciesName: string | null, body: Record<string, unknown> = design) {
  const { keeper, enclosure } = await createKeeperWorld('Fernhollow Test Rooms', {
    enclosure: { name: 'Desert tank', speciesName },
    catalogue: true,
  });
  const { variantId } = await postDesign(keeper, enclosure.id, {
    name: 'Summer plan',
    variantName: 'Rock under the tube',
    design: body,
  });
  return { keeper, enclosure, variantId };
}

describe('export', () => {
  it('downloads the design file as JSON, the same document the API stores', async () => {
    const w = await world(null);
    const r = await exportVariant(w.keeper, w.variantId, 'format=json');
    expect(r.status).toBe(200);
    expect(r.res.headers.get('content-disposition')).toBe(
      'attachment; filename="rock-under-the-tube.baskwell.json"',
    );
    expect(r.body).toEqual(design);
    const stored = await call(variantRoute.GET, {
      path: `/api/variants/${w.variantId}`,
      params: { id: w.variantId },
      user: w.keeper,
    });
    expect(r.body).toEqual(stored.body.variant.design);
  });

  it('keeps a photo backdrop through upload, save and download; a bad one is refused naming the field', async () => {
    const backdrop = { uploadId: 5, x: -2, y: 0, width: 124, height: 61.5, opacity: 0.45, visible: false };
    const withPhoto = { ...design, backdrop };
    const w = await world(null, withPhoto);
    const r = await exportVariant(w.keeper, w.variantId, 'format=json');
    expect(r.body).toEqual(withPhoto);
    const bad = await call(enclosureDesignsRoute.POST, {
      method: 'POST',
      path: `/api/enclosures/${w.enclosure.id}/designs`,
      params: { id: w.enclosure.id },
      user: w.keeper,
      body: { name: 'Bad photo', design: { ...design, backdrop: { ...backdrop, opacity: 3 } } },
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('design.backdrop.opacity');
    expect(bad.body.error.message).toMatch(/backdrop\.opacity: .*<=1/);
  });

  it('renders a field as a PNG picture', async () => {
    const w = await world(null);
    const r = await exportVariant(w.keeper, w.variantId, 'format=png&field=tempC');
    expect(r.status).toBe(200);
    expect(r.res.headers.get('content-type')).toBe('image/png');
    const png = PNG.sync.read(Buffer.from(await r.res.arrayBuffer()));
    // 120 × 62 cm (the lamps sit on the lid) drawn 960 px wide at most.
    expect(png.width).toBeGreaterThan(500);
    expect(png.width).toBeLessThanOrEqual(960);
    expect(png.height).toBeGreaterThan(200);
    // More than a blank picture: several distinct band colours.
    const colours = new Set<number>();
    for (let k = 0; k < png.data.length; k += 4 * 97) colours.add(png.data.readUInt32BE(k));
    expect(colours.size).toBeGreaterThan(4);
  });

  it('writes a PDF report titled and headed with the variant’s name, with lamps and cautions', async () => {
    const w = await world(null);
    const r = await exportVariant(w.keeper, w.variantId, 'format=pdf');
    expect(r.status).toBe(200);
    const bytes = new Uint8Array(await r.res.arrayBuffer());
    expect(Buffer.from(bytes.subarray(0, 5)).toString('latin1')).toBe('%PDF-');
    const doc = await PDFDocument.load(bytes);
    expect(doc.getTitle()).toBe('Rock under the tube');
    const text = pdfDrawnText(bytes);
    for (const expected of [
      'Rock under the tube',
      'Summer plan',
      'Desert tank',
      'Fernhollow Test Rooms',
      'Basking tube',
      'No species is attached',
      'UV can injure eyes and skin',
      'Lamps within reach burn',
      'Heat sources can start fires',
      'Control each lamp the way its type allows',
      'Every figure is an estimate',
      'verify with a meter and thermometer',
      'reptile-experienced vet',
      // Both unit systems, for readers we know nothing about (1 in = 2.54 cm exactly).
      '120 × 60 × 60 cm (47.2 × 23.6 × 23.6 in)',
    ]) {
      expect(text).toContain(expected);
    }
    // The basking tube is a fluorescent UV lamp: switched by a timer, never dimmed (common practice, no
    // published source).
    expect(text).toMatch(/by a timer\s+only/);
    // With no species the safety checks still run, against general limits, and are printed.
    expect(text).toMatch(/Safety checks — overall (Pass|Attention|Fail)/);
    expect(text).toContain('Lamps out of reach');
    expect(text).toContain('Surfaces too hot to touch');
    expect(text).not.toMatch(/Run every heat source on a thermostat/);
    expect(text).toMatch(/Hot spot \(warmest surface\)\s+[\d.]+ °C \([\d.]+ °F\)/);
  });

  it('marks the report of an example-data organisation (the demo) as invented, and no other', async () => {
    const real = await world(null);
    expect(
      pdfDrawnText(
        new Uint8Array(
          await (await exportVariant(real.keeper, real.variantId, 'format=pdf')).res.arrayBuffer(),
        ),
      ),
    ).not.toContain('Example data');
    await Organisation.update({ exampleData: true }, { where: { id: real.enclosure.organisationId } });
    const text = pdfDrawnText(
      new Uint8Array(
        await (await exportVariant(real.keeper, real.variantId, 'format=pdf')).res.arrayBuffer(),
      ),
    );
    // The note's first words, on its first line (a long note wraps).
    expect(text).toContain(EXAMPLE_DATA_NOTE.slice(0, 44));
  });

  it('includes the assessment when the enclosure’s species has a sheet', async () => {
    const w = await world('Bearded dragon');
    const r = await exportVariant(w.keeper, w.variantId, 'format=pdf');
    const text = pdfDrawnText(new Uint8Array(await r.res.arrayBuffer()));
    expect(text).toMatch(/Species: Bearded dragon — overall (Pass|Attention|Fail)/);
    expect(text).not.toContain('No species is attached');
    expect(text).not.toContain('Safety checks — overall');
  });

  it('refuses an unknown format or field with 400', async () => {
    const w = await world(null);
    const r = await exportVariant(w.keeper, w.variantId, 'format=docx');
    expect(r.status).toBe(400);
    expect(r.body.error.field).toBe('format');
    expect((await exportVariant(w.keeper, w.variantId, 'format=png&field=light')).body.error.field).toBe(
      'field',
    );
  });
});
