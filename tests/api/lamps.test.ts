import { beforeAll, describe, expect, it } from 'vitest';
import * as enclosureLampsRoute from '@/app/api/enclosures/[id]/lamps/route';
import * as lampsRoute from '@/app/api/lamps/route';
import * as lampRoute from '@/app/api/lamps/[id]/route';
import * as lampReadingsRoute from '@/app/api/lamps/[id]/readings/route';
import * as calibrationRoute from '@/app/api/lamps/[id]/calibration/route';
import * as readingRoute from '@/app/api/readings/[id]/route';
import { enginePool, runEngineTask } from '@/lib/engine-pool';
import { calibrate } from '@/lib/lamp-log/calibrate';
import { lampChart } from '@/lib/lamp-log/chart';
import { addDays, todayIso } from '@/lib/lamp-log/dates';
import { lampFacts, readingFacts } from '@/lib/lamp-log/facts';
import { toDto as lampTypeDto } from '@/lib/lamp-types/queries';
import { Design, Lamp, LampType, Reading, Variant } from '@/models';
import { t5LampObject } from '../fixtures/lamp-log';
import { withTestDatabase } from '../helpers/db';
import { createEnclosureWorld } from '../helpers/world';
import { call, expectNoInternals, send } from './http';

withTestDatabase();

// The lamp page and the calibration fit on an engine worker thread. Outside Next its first start loads
// the TypeScript sources through tsx, which on a busy machine takes longer than a test may: start it here.
beforeAll(async () => {
  await runEngineTask('calibrations', {
    lamp: null as never,
    readings: [],
    objects: [],
    today: todayIso(),
  });
}, 180_000);

async function world() {
  const w = await createEnclosureWorld({
    shopName: 'Shop A',
    catalogue: true,
    enclosure: { speciesName: 'Bearded dragon', heightCm: 60 },
  });
  const {
    shop: org,
    staff,
    keeper,
    otherKeeper,
    otherOrg,
    outsider,
    enclosure,
    neighbour: otherEnclosure,
  } = w;
  const t5 = (await LampType.findOne({ where: { organisationId: org.id, tech: 't5', uvbAt30: 42.5 } }))!;
  const foreignType = (await LampType.findOne({ where: { organisationId: otherOrg.id, tech: 't5' } }))!;
  return { org, staff, keeper, otherKeeper, outsider, enclosure, otherEnclosure, t5, foreignType };
}
type World = Awaited<ReturnType<typeof world>>;

const lampBody = (w: World, over: Record<string, unknown> = {}) => ({
  lampTypeId: w.t5.id,
  label: 'Basking tube',
  firstUsedOn: '2025-01-10',
  hoursPerDay: 12,
  baskingDistance: 10,
  lengthUnit: 'in',
  designObjectId: 'uv1',
  ...over,
});

async function addLamp(w: World, over: Record<string, unknown> = {}) {
  const r = await send(enclosureLampsRoute.POST, 'POST /api/enclosures/[id]/lamps', {
    id: w.enclosure.id,
    as: w.keeper,
    body: lampBody(w, over),
  });
  expect(r.status, r.text).toBe(201);
  return r.body.lamp;
}

async function addReading(w: World, lampId: number, body: Record<string, unknown>) {
  return call(lampReadingsRoute.POST, {
    method: 'POST',
    path: `/api/lamps/${lampId}/readings`,
    params: { id: lampId },
    as: w.keeper,
    body,
  });
}

describe('lamps of an enclosure', () => {
  it('adds a lamp (basking distance in inches, stored in cm) and asks for a first reading', async () => {
    const w = await world();
    // A lamp switched on three weeks ago: well inside its typical life, but never measured.
    const lamp = await addLamp(w, { firstUsedOn: addDays(todayIso(), -21) });
    expect(lamp).toMatchObject({
      label: 'Basking tube',
      baskingDistanceCm: 25.4,
      status: 'test-soon',
      species: { name: 'Bearded dragon', uvZone: 4 },
      lampType: { id: w.t5.id, tech: 't5', form: 'tube', lengthCm: 55 },
    });
    expect(lamp.missing).toContain('a meter reading');
    const list = await send(enclosureLampsRoute.GET, 'GET /api/enclosures/[id]/lamps', {
      id: w.enclosure.id,
      as: w.staff,
    });
    expect(list.status).toBe(200);
    expect(list.body.items.map((l: { id: number }) => l.id)).toEqual([lamp.id]);
  });

  it('answers 400 naming the field for bad input, and for a lamp type of another organisation', async () => {
    const w = await world();
    const bad = await send(enclosureLampsRoute.POST, 'POST /api/enclosures/[id]/lamps', {
      id: w.enclosure.id,
      as: w.keeper,
      body: lampBody(w, { hoursPerDay: 30, firstUsedOn: '2025-02-30' }),
    });
    expect(bad.status).toBe(400);
    const fields = bad.body.error.issues.map((i: { field: string }) => i.field);
    expect(fields).toEqual(expect.arrayContaining(['hoursPerDay', 'firstUsedOn']));
    const foreign = await send(enclosureLampsRoute.POST, 'POST /api/enclosures/[id]/lamps', {
      id: w.enclosure.id,
      as: w.keeper,
      body: lampBody(w, { lampTypeId: w.foreignType.id }),
    });
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.field).toBe('lampTypeId');
  });

  it('hides one keeper’s lamps from another keeper and from other organisations (404), 401 without a session', async () => {
    const w = await world();
    const lamp = await addLamp(w);
    for (const as of [w.otherKeeper, w.outsider]) {
      const r = await call(lampRoute.GET, { path: `/api/lamps/${lamp.id}`, params: { id: lamp.id }, as });
      expect(r.status).toBe(404);
      expectNoInternals(r);
      const add = await send(enclosureLampsRoute.POST, 'POST /api/enclosures/[id]/lamps', {
        id: w.enclosure.id,
        as,
        body: lampBody(w),
      });
      expect(add.status).toBe(404);
    }
    const anon = await call(lampRoute.GET, { path: `/api/lamps/${lamp.id}`, params: { id: lamp.id } });
    expect(anon.status).toBe(401);
  });

  it('lists an organisation’s lamps: everything for staff, only their own for a keeper', async () => {
    const w = await world();
    const mine = await addLamp(w);
    const theirs = await send(enclosureLampsRoute.POST, 'POST /api/enclosures/[id]/lamps', {
      id: w.otherEnclosure.id,
      as: w.staff,
      body: lampBody(w, { label: 'Other tube' }),
    });
    expect(theirs.status).toBe(201);
    const path = `/api/lamps?organisationId=${w.org.id}`;
    const staff = await call(lampsRoute.GET, { path, as: w.staff });
    expect(staff.body.items).toHaveLength(2);
    const keeper = await call(lampsRoute.GET, { path, as: w.keeper });
    expect(keeper.body.items.map((l: { id: number }) => l.id)).toEqual([mine.id]);
    const outsider = await call(lampsRoute.GET, { path, as: w.outsider });
    expect(outsider.status).toBe(404);
  });
});

describe('readings', () => {
  it('stores readings in cm, fits them, and shows the chart data', async () => {
    const w = await world();
    const lamp = await addLamp(w);
    const days = [0, 60, 120, 180];
    for (const d of days) {
      const takenAt = new Date(Date.UTC(2025, 0, 10 + d, 12)).toISOString();
      const r = await addReading(w, lamp.id, {
        takenAt,
        distance: 10,
        distanceUnit: 'in',
        value: 300 * Math.exp(-d / 400),
        unit: 'uvb',
        meter: 'broadband meter',
      });
      expect(r.status, r.text).toBe(201);
      expect(r.body.reading.distanceCm).toBe(25.4);
    }
    const detail = await send(lampRoute.GET, 'GET /api/lamps/[id]', { id: lamp.id, as: w.keeper });
    expect(detail.status).toBe(200);
    expect(detail.body.readings).toHaveLength(4);
    // The first reading falls in the lamp's first 100 hours (burn-in): shown, fitted apart.
    expect(detail.body.lamp.fit).toMatchObject({ kind: 'exponential', certainty: 'fitted', n: 3 });
    expect(detail.body.lamp.fit.tauDays).toBeCloseTo(400, 0);
    expect(detail.body.chart.points).toHaveLength(4);
    expect(detail.body.chart.points.map((p: { use: string }) => p.use)).toEqual([
      'burn-in',
      'fit',
      'fit',
      'fit',
    ]);
    expect(detail.body.lamp.burnIn.baselineTaken).toBe(true);
    expect(detail.body.chart.curve.length).toBeGreaterThan(10);
    // Bearded dragon sheet: UV zone 4's basking UV Index 4.5 (Ferguson et al. 2010, Zoo Biology
    // 29:317–334) through the lamp type's 0.04 UV Index per µW/cm² (from memory) is 112.5 µW/cm²; the
    // sheet's own 115–235 µW/cm² is a shop rule of thumb shown beside it, never the threshold.
    expect(detail.body.lamp.basking.threshold).toBeCloseTo(4.5 / 0.04, 9);
    expect(detail.body.lamp.basking.judgedBy).toMatch(/UV Index 4\.5/);
    expect(detail.body.lamp.basking.ruleOfThumb).toMatch(/shop rule of thumb, 115–235/);
    expect(detail.body.lamp.fallsBelowOn).toMatch(/^\d{4}-\d{2}-\d{2}$/);
  });

  it('refuses readings in the future, before first use, or with a negative value', async () => {
    const w = await world();
    const lamp = await addLamp(w);
    const base = { distance: 30, value: 40, unit: 'uvb' };
    const future = await addReading(w, lamp.id, { ...base, takenAt: '2999-01-01T00:00:00Z' });
    expect(future.status).toBe(400);
    expect(future.body.error.field).toBe('takenAt');
    const early = await addReading(w, lamp.id, { ...base, takenAt: '2024-12-01T00:00:00Z' });
    expect(early.status).toBe(400);
    expect(early.body.error.message).toMatch(/first used on 2025-01-10/);
    const negative = await addReading(w, lamp.id, { ...base, value: -1, takenAt: '2025-02-01T00:00:00Z' });
    expect(negative.status).toBe(400);
    expect(negative.body.error.field).toBe('value');
    expect(await Reading.count()).toBe(0);
  });

  it('records how a reading was taken, takes the lid’s share from the lamp, and names the field it refuses', async () => {
    const w = await world();
    const lamp = await addLamp(w, { baskingTransmission: 0.6 });
    const base = { takenAt: '2025-02-01T10:00:00Z', distance: 30, value: 24, unit: 'uvb' };
    const lid = await addReading(w, lamp.id, { ...base, through: 'lid', warmedUp: 'yes' });
    expect(lid.status, lid.text).toBe(201);
    expect(lid.body.reading).toMatchObject({ through: 'lid', throughTransmission: 0.6, warmedUp: 'yes' });
    const old = await addReading(w, lamp.id, base);
    expect(old.body.reading).toMatchObject({
      through: 'not-recorded',
      throughTransmission: null,
      warmedUp: 'not-recorded',
    });
    const screen = await addReading(w, lamp.id, { ...base, through: 'screen' });
    expect(screen.status).toBe(400);
    expect(screen.body.error.field).toBe('throughTransmission');
    const odd = await addReading(w, lamp.id, { ...base, through: 'window' });
    expect(odd.status).toBe(400);
    expect(odd.body.error.field).toBe('through');
    const warm = await addReading(w, lamp.id, { ...base, warmedUp: 'maybe' });
    expect(warm.body.error.field).toBe('warmedUp');
    // A correction of the set-up alone: the share goes with what it belonged to.
    const id = lid.body.reading.id;
    const fix = await send(readingRoute.PATCH, 'PATCH /api/readings/[id]', {
      id,
      as: w.keeper,
      body: { through: 'nothing' },
    });
    expect(fix.status, fix.text).toBe(200);
    const stored = await Reading.findByPk(id);
    expect([stored?.through, stored?.throughTransmission, stored?.warmedUp]).toEqual([
      'nothing',
      null,
      'yes',
    ]);
  });

  it('corrects and deletes a reading; another keeper cannot', async () => {
    const w = await world();
    const lamp = await addLamp(w);
    const r = await addReading(w, lamp.id, {
      takenAt: '2025-02-01T10:00:00Z',
      distance: 30,
      value: 40,
      unit: 'uvb',
    });
    const id = r.body.reading.id;
    const fix = await send(readingRoute.PATCH, 'PATCH /api/readings/[id]', {
      id,
      as: w.keeper,
      body: { value: 42 },
    });
    expect(fix.status).toBe(200);
    expect(fix.body.reading.value).toBe(42);
    const other = await send(readingRoute.DELETE, 'DELETE /api/readings/[id]', { id, as: w.otherKeeper });
    expect(other.status).toBe(404);
    const del = await send(readingRoute.DELETE, 'DELETE /api/readings/[id]', { id, as: w.keeper });
    expect(del.status).toBe(200);
    expect(await Reading.count()).toBe(0);
  });

  it('retires a lamp, keeping its readings', async () => {
    const w = await world();
    const lamp = await addLamp(w);
    await addReading(w, lamp.id, { takenAt: '2025-02-01T10:00:00Z', distance: 30, value: 40, unit: 'uvb' });
    const retire = (retiredOn: string) =>
      send(lampRoute.PATCH, 'PATCH /api/lamps/[id]', { id: lamp.id, as: w.keeper, body: { retiredOn } });
    const r = await retire('2025-06-01');
    expect(r.status).toBe(200);
    expect(r.body.lamp.status).toBe('retired');
    expect(r.body.readings).toHaveLength(1);
    const before = await retire('2024-06-01');
    expect(before.status).toBe(400);
    expect(before.body.error.field).toBe('retiredOn');
  });
});

describe('calibration', () => {
  async function withDesign(w: World) {
    const design = await Design.create({
      enclosureId: w.enclosure.id,
      name: 'Plan',
      createdById: w.staff.id,
    });
    const file = {
      format: 'baskwell.design',
      version: 2,
      enclosure: { width: 120, height: 60, depth: 60 },
      objects: [t5LampObject()],
    };
    return Variant.create({
      designId: design.id,
      name: 'Variant A',
      designJson: JSON.stringify(file),
      createdById: w.staff.id,
      updatedById: w.staff.id,
    });
  }

  it('proposes the measured uvbAt30 and applies it to the variant, bumping its version', async () => {
    const w = await world();
    const variant = await withDesign(w);
    const lamp = await addLamp(w);
    for (const [d, uvb, uvi] of [
      [0, 60, 2.4],
      [90, 51, 2.04],
      [180, 43.4, 1.74],
    ] as const) {
      const takenAt = new Date(Date.UTC(2025, 0, 10 + d, 12)).toISOString();
      expect((await addReading(w, lamp.id, { takenAt, distance: 30, value: uvb, unit: 'uvb' })).status).toBe(
        201,
      );
      expect((await addReading(w, lamp.id, { takenAt, distance: 30, value: uvi, unit: 'uvi' })).status).toBe(
        201,
      );
    }
    const path = `/api/lamps/${lamp.id}/calibration`;
    const proposal = await call(calibrationRoute.GET, { path, params: { id: lamp.id }, as: w.keeper });
    expect(proposal.status).toBe(200);
    const target = proposal.body.targets[0];
    expect(target.variant.id).toBe(variant.id);
    expect(target.calibration.ok).toBe(true);
    expect(target.calibration.fields.uvbAt30).toBeCloseTo(60, -1);
    expect(target.calibration.fields.uviPerUvb).toBeCloseTo(0.04, 3);
    expect(target.calibration.calibrated.from).toBe(6);

    // Applying it to the variant as saved at `baseVersion`.
    const apply = (baseVersion: number) =>
      call(calibrationRoute.POST, {
        method: 'POST',
        path,
        params: { id: lamp.id },
        as: w.keeper,
        body: { variantId: variant.id, baseVersion },
      });
    const stale = await apply(7);
    expect(stale.status).toBe(409);
    const applied = await apply(1);
    expect(applied.status, applied.text).toBe(200);
    expect(applied.body.variant.version).toBe(2);
    const stored = JSON.parse((await Variant.findByPk(variant.id))!.designJson);
    expect(stored.objects[0].uvbAt30).toBe(target.calibration.fields.uvbAt30);
    expect(stored.objects[0].decay.points[0]).toEqual([0, 1]);
    // The lamp carries the note the studio shows: the day of the newest reading and what it was fitted from.
    expect(target.calibration.calibrated.at).toBe('2025-07-09');
    expect(stored.objects[0].calibration).toEqual({ at: '2025-07-09', from: '6 meter readings' });
    expect(applied.body.object.calibration).toEqual({ at: '2025-07-09', from: '6 meter readings' });
  });

  it('says what is missing when the lamp is not linked to a design lamp', async () => {
    const w = await world();
    const lamp = await addLamp(w, { designObjectId: null });
    const r = await send(calibrationRoute.GET, 'GET /api/lamps/[id]/calibration', {
      id: lamp.id,
      as: w.keeper,
    });
    expect(r.body.targets).toEqual([]);
    expect(r.body.hint).toMatch(/Link this lamp/);
  });

  it('fits on an engine worker thread, with the same figures as fitting on this one', async () => {
    const w = await world();
    await withDesign(w);
    const lamp = await addLamp(w);
    for (const [d, uvb] of [
      [0, 60],
      [60, 55],
      [120, 50.5],
      [200, 45],
    ] as const) {
      const takenAt = new Date(Date.UTC(2025, 0, 10 + d, 12)).toISOString();
      expect((await addReading(w, lamp.id, { takenAt, distance: 30, value: uvb, unit: 'uvb' })).status).toBe(
        201,
      );
    }
    const tasks = () => enginePool().stats.tasks;
    const before = tasks();
    const detail = await send(lampRoute.GET, 'GET /api/lamps/[id]', { id: lamp.id, as: w.keeper });
    expect(detail.status, detail.text).toBe(200);
    expect(tasks()).toBe(before + 1);
    const proposal = await send(calibrationRoute.GET, 'GET /api/lamps/[id]/calibration', {
      id: lamp.id,
      as: w.keeper,
    });
    expect(proposal.status, proposal.text).toBe(200);
    expect(tasks()).toBe(before + 2);

    // The same pure functions on this thread give the same answers.
    const row = (await Lamp.findByPk(lamp.id))!;
    const type = lampTypeDto((await LampType.findByPk(row.lampTypeId))!);
    const readings = (await Reading.findAll({ where: { lampId: lamp.id }, order: [['takenAt', 'ASC']] })).map(
      readingFacts,
    );
    const facts = lampFacts(row, type);
    const here = lampChart({ facts, readings, need: null, today: todayIso() });
    expect(detail.body.chart.curve).toEqual(JSON.parse(JSON.stringify(here.curve)));
    expect(detail.body.chart.points).toEqual(JSON.parse(JSON.stringify(here.outlook.points)));
    const target = proposal.body.targets[0];
    expect(target.calibration).toEqual(
      JSON.parse(JSON.stringify(calibrate(facts, readings, target.object, todayIso()))),
    );

    // Viewed again unchanged the same day, the lamp reuses its fit; a new reading makes a new one.
    const view = () =>
      call(lampRoute.GET, { path: `/api/lamps/${lamp.id}`, params: { id: lamp.id }, as: w.keeper });
    const again = await view();
    expect(tasks()).toBe(before + 2);
    expect(again.body.chart).toEqual(detail.body.chart);
    const takenAt = new Date(Date.UTC(2025, 0, 250, 12)).toISOString();
    expect((await addReading(w, lamp.id, { takenAt, distance: 30, value: 40, unit: 'uvb' })).status).toBe(
      201,
    );
    const after = await view();
    expect(tasks()).toBeGreaterThan(before + 2);
    expect(after.body.chart.points).toHaveLength(detail.body.chart.points.length + 1);
    expect(after.body.chart.curve).not.toEqual(detail.body.chart.curve);
  });
});
