import { describe, expect, it, vi } from 'vitest';
import * as importRoute from '@/app/api/readings/import/route';
import { withFakeS3 } from '@/tests/helpers/fake-s3';
import { getObject } from '@/lib/storage/s3';
import { MAX_JSON_BODY_BYTES } from '@/lib/api/request';
import { MAX_CSV_BYTES, MAX_CSV_IMPORT_BODY_BYTES } from '@/lib/uploads/limits';
import { seedStartingCatalogue } from '@/lib/species/seed';
import { Lamp, LampType, Reading, Upload } from '@/models';
import { createEnclosure, createMember, createOrganisation, withTestDatabase } from '../helpers/db';
import { call } from './http';

// CSV import against the real test database and the fake S3 server.
withFakeS3();
withTestDatabase();

async function world() {
  const org = await createOrganisation();
  await seedStartingCatalogue(org.id);
  const { user: keeper } = await createMember('keeper', org);
  const { user: otherKeeper } = await createMember('keeper', org);
  const enclosure = await createEnclosure(org, keeper, { speciesName: 'Bearded dragon' });
  const type = (await LampType.findOne({ where: { organisationId: org.id, tech: 't5' } }))!;
  const make = (label: string) =>
    Lamp.create({
      enclosureId: enclosure.id,
      lampTypeId: type.id,
      label,
      firstUsedOn: '2025-01-01',
      hoursPerDay: 12,
      createdById: keeper.id,
    });
  return { keeper, otherKeeper, enclosure, tube: await make('Basking tube'), spot: await make('Spot lamp') };
}

const GOOD = [
  'lamp,taken_at,distance,distance_unit,value,unit,meter',
  'Basking tube,2025-02-01,30,cm,40.2,uvb,broadband meter',
  'Basking tube,2025-02-01,30,cm,1.6,uvi,index meter',
  'Spot lamp,2025-02-01 09:30,12,in,55,uvb,broadband meter',
  'Basking tube,2025-05-01,30,cm,35.9,uvb,broadband meter',
].join('\n');

const BAD =
  GOOD + '\nSpot lamp,2025-05-01,30,cm,lots,uvb,broadband meter\nBasking tube,2025-05-02,30,cm,35,uvb,';

type W = Awaited<ReturnType<typeof world>>;
const post = (w: W, body: Record<string, unknown>, as = w.keeper) =>
  call(importRoute.POST, {
    method: 'POST',
    path: '/api/readings/import',
    as,
    body: { enclosureId: w.enclosure.id, ...body },
  });

describe('CSV import of readings', () => {
  it('previews every row with per-row errors and saves nothing', async () => {
    const w = await world();
    const r = await post(w, { csv: BAD });
    expect(r.status).toBe(200);
    expect(r.body.ok).toBe(false);
    expect(r.body.rows).toHaveLength(5);
    expect(r.body.errors).toEqual([{ row: 6, field: 'value', message: '“lots” is not a number.' }]);
    expect(await Reading.count()).toBe(0);
    expect(await Upload.count()).toBe(0);
  });

  it('imports nothing when one row is bad, and names that row', async () => {
    const w = await world();
    const r = await post(w, { csv: BAD, commit: true });
    expect(r.status).toBe(400);
    expect(r.body.error.message).toMatch(/^Nothing was imported: 1 row has a problem\. Row 6:/);
    expect(r.body.error.field).toBe('rows[6].value');
    expect(r.body.errors[0].row).toBe(6);
    expect(await Reading.count()).toBe(0);
    expect(await Upload.count()).toBe(0);
  });

  it('imports every row of a good file in one go, keeping the file in the object store', async () => {
    const w = await world();
    const r = await post(w, { csv: GOOD, commit: true, fileName: 'C:\\meter\\export.csv' });
    expect(r.status, r.text).toBe(201);
    expect(r.body.imported).toBe(4);
    const readings = await Reading.findAll({ order: [['id', 'ASC']] });
    expect(readings).toHaveLength(4);
    expect(readings.map((x) => [x.lampId, x.unit, x.distanceCm])).toEqual([
      [w.tube.id, 'uvb', 30],
      [w.tube.id, 'uvi', 30],
      [w.spot.id, 'uvb', 30.5],
      [w.tube.id, 'uvb', 30],
    ]);
    expect(readings.every((x) => x.uploadId === r.body.uploadId && x.takenById === w.keeper.id)).toBe(true);
    const upload = (await Upload.findByPk(r.body.uploadId))!;
    expect(upload).toMatchObject({
      kind: 'readings-csv',
      contentType: 'text/csv',
      originalName: 'export.csv',
    });
    const stored = await getObject(upload.storageKey);
    expect(new TextDecoder().decode(stored!)).toBe(GOOD);
  });

  it('rolls the whole import back, file included, when saving fails half-way', async () => {
    const w = await world();
    const spy = vi.spyOn(Reading, 'bulkCreate').mockRejectedValueOnce(new Error('disk full (test)'));
    const r = await post(w, { csv: GOOD, commit: true });
    spy.mockRestore();
    expect(r.status).toBe(500);
    expect(r.text).not.toMatch(/disk full/);
    expect(await Reading.count()).toBe(0);
    expect(await Upload.count()).toBe(0);
  });

  it('keeps other keepers out (404) and checks the request itself (400)', async () => {
    const w = await world();
    const other = await post(w, { csv: GOOD, commit: true }, w.otherKeeper);
    expect(other.status).toBe(404);
    const empty = await post(w, { csv: '' });
    expect(empty.status).toBe(400);
    expect(empty.body.error.field).toBe('csv');
    expect(await Reading.count()).toBe(0);
  });

  it('answers 413 for a file over its cap, counted in bytes as the file is, and saves nothing', async () => {
    const w = await world();
    const byOne = `${GOOD}\n${'x'.repeat(MAX_CSV_BYTES - GOOD.length)}`;
    // 'é' is two bytes in UTF-8: under the cap counted in characters, over it in bytes.
    const wide = `${GOOD}\n${'é'.repeat(MAX_CSV_BYTES / 2)}`;
    expect(new TextEncoder().encode(byOne).byteLength).toBe(MAX_CSV_BYTES + 1);
    expect(wide.length).toBeLessThan(MAX_CSV_BYTES);
    for (const [csv, commit] of [
      [byOne, false],
      [byOne, true],
      [wide, true],
    ] as const) {
      const r = await post(w, { csv, commit });
      expect(r.status, r.text.slice(0, 200)).toBe(413);
      expect(r.body.error).toMatchObject({
        code: 'payload_too_large',
        field: 'csv',
        message: 'The file is larger than 1024 KB; split it into smaller files.',
      });
    }
    // A body beyond the route's own cap is refused before it is read whole: 413 as well.
    const huge = await post(w, { csv: 'x'.repeat(MAX_CSV_IMPORT_BODY_BYTES) });
    expect(huge.status).toBe(413);
    expect(huge.body.error.code).toBe('payload_too_large');
    expect(await Reading.count()).toBe(0);
    expect(await Upload.count()).toBe(0);
  });

  it('takes a file just under its cap even when its JSON is larger than other routes allow', async () => {
    const w = await world();
    // Quotes and line ends take two bytes each in JSON: this file is under 1 MB, its request over.
    const row = `Basking tube,2025-02-01,30,cm,40.2,uvb,broadband meter,"${'""'.repeat(70)}"`;
    const csv = ['lamp,taken_at,distance,distance_unit,value,unit,meter,note', ...Array(4900).fill(row)].join(
      '\n',
    );
    expect(new TextEncoder().encode(csv).byteLength).toBeLessThanOrEqual(MAX_CSV_BYTES);
    expect(JSON.stringify({ csv }).length).toBeGreaterThan(MAX_JSON_BODY_BYTES);
    const r = await post(w, { csv });
    expect(r.status, r.text.slice(0, 200)).toBe(200);
    expect(r.body).toMatchObject({ ok: true, total: 4900 });
    expect(r.body.rows[0].note).toBe('"'.repeat(70));
  });
});
