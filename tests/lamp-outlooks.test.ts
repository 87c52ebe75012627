import { QueryTypes } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { addDays, todayIso } from '@/lib/lamp-log/dates';
import { refreshOutlooks, refreshStaleOutlooks, staleLampIds } from '@/lib/lamp-log/stored-outlooks';
import { summarise } from '@/lib/lamp-log/queries';
import { summariseLive } from '@/lib/lamp-log/queries';
import { seedStartingCatalogue } from '@/lib/species/seed';
import { Lamp, LampOutlook, LampType, Reading, SpeciesSheet } from '@/models';
import {
  createEnclosure,
  createMember,
  createOrganisation,
  seedDemo,
  testDb,
  withTestDatabase,
} from './helpers/db';

// Stored lamp outlooks: written when their inputs change, current or visibly not, and the same as
// computing them from scratch.
withTestDatabase();

const rowsOf = async () =>
  (await LampOutlook.findAll({ order: [['lampId', 'ASC']], raw: true })).map((r) => ({
    ...r,
    computedAt: undefined,
  }));

async function oneLamp(speciesName = 'Bearded dragon') {
  const org = await createOrganisation();
  await seedStartingCatalogue(org.id);
  const { user: keeper } = await createMember('keeper', org);
  const enclosure = await createEnclosure(org, keeper, { speciesName });
  const type = (await LampType.findOne({ where: { organisationId: org.id, tech: 't5', uvbAt30: 42.5 } }))!;
  const lamp = await Lamp.create({
    enclosureId: enclosure.id,
    lampTypeId: type.id,
    label: 'Basking tube',
    firstUsedOn: addDays(todayIso(), -200),
    hoursPerDay: 12,
    baskingDistanceCm: 25,
    createdById: keeper.id,
  });
  return { org, keeper, enclosure, type, lamp };
}

describe('stored lamp outlooks', () => {
  it('give the demo lamps the same summaries as computing them on every view did', async () => {
    await seedDemo();
    const lamps = await Lamp.findAll({ order: [['id', 'ASC']] });
    expect(lamps.length).toBeGreaterThan(3);
    const live = await summariseLive(lamps, todayIso());
    expect(await staleLampIds(todayIso())).toEqual([]);
    const stored = await summarise(lamps, todayIso());
    expect(stored).toEqual(live);
    expect(new Set(stored.map((s) => s.status)).size).toBeGreaterThanOrEqual(3);
  });

  it('are recomputed when a reading is added, without anyone asking', async () => {
    const { lamp } = await oneLamp();
    const before = (await LampOutlook.findByPk(lamp.id))!;
    expect(before.status).toBe('test-soon');
    expect(before.lastReadingAt).toBeNull();
    await Reading.create({
      lampId: lamp.id,
      takenAt: new Date(),
      distanceCm: 30,
      value: 400,
      unit: 'uvb',
      takenById: null,
    });
    const after = (await LampOutlook.findByPk(lamp.id))!;
    await lamp.reload();
    expect(after.sourceVersion).toBe(lamp.outlookVersion);
    expect(after.sourceVersion).toBeGreaterThan(before.sourceVersion);
    expect(after.lastReadingAt).not.toBeNull();
    expect(after.status).toBe('fine');
  });

  it('follow a renamed species sheet to the enclosures that name it', async () => {
    const { org, lamp } = await oneLamp('Example skink');
    expect(JSON.parse((await LampOutlook.findByPk(lamp.id))!.outlookJson).species).toBeNull();
    const sheet = (await SpeciesSheet.findOne({ where: { organisationId: org.id, uvZone: 3 } }))!;
    await sheet.update({ commonName: 'Example skink' });
    expect(JSON.parse((await LampOutlook.findByPk(lamp.id))!.outlookJson).species).toMatchObject({
      name: 'Example skink',
    });
    // Renaming it away again leaves the enclosure without a sheet.
    await sheet.update({ commonName: 'Another name' });
    expect(JSON.parse((await LampOutlook.findByPk(lamp.id))!.outlookJson).species).toBeNull();
  });

  it('read as out of date after a change nobody recomputed, and a day later', async () => {
    const { lamp } = await oneLamp();
    expect(await staleLampIds(todayIso())).toEqual([]);
    // A write that bypassed the models (a hand-made fix in SQL) still bumps the version by hand here.
    await testDb().query('UPDATE lamps SET outlook_version = outlook_version + 1 WHERE id = ?', {
      replacements: [lamp.id],
    });
    expect(await staleLampIds(todayIso())).toEqual([lamp.id]);
    expect(await refreshStaleOutlooks()).toBe(1);
    expect(await staleLampIds(todayIso())).toEqual([]);
    expect(await staleLampIds(addDays(todayIso(), 1))).toEqual([lamp.id]);
  });

  it('are the same after two recomputes at once as after one, and an older one never wins', async () => {
    await seedDemo();
    const ids = (await Lamp.findAll({ attributes: ['id'] })).map((l) => l.id);
    await testDb().query('DELETE FROM lamp_outlooks');
    await refreshOutlooks(ids);
    const once = await rowsOf();
    await testDb().query('DELETE FROM lamp_outlooks');
    await Promise.all([refreshOutlooks(ids), refreshOutlooks(ids), refreshOutlooks([...ids].reverse())]);
    expect(await rowsOf()).toEqual(once);
    // Yesterday's computation arriving late keeps today's row.
    await refreshOutlooks(ids, addDays(todayIso(), -1));
    expect(await rowsOf()).toEqual(once);
    const [today] = await testDb().query<{ n: number }>(
      'SELECT COUNT(*) AS n FROM lamp_outlooks WHERE as_of = :today',
      { replacements: { today: todayIso() }, type: QueryTypes.SELECT },
    );
    expect(Number(today?.n)).toBe(ids.length);
  });
});
