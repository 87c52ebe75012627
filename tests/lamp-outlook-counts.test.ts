import { QueryTypes } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { lampCounts } from '@/lib/lamp-log/list-queries';
import { addDays, todayIso } from '@/lib/lamp-log/dates';
import { refreshOutlooks, refreshStaleOutlooks } from '@/lib/lamp-log/stored-outlooks';
import { Enclosure, Lamp, Organisation, Reading, User } from '@/models';
import { createEnclosure, testDb, withTestDatabase } from './helpers/db';
import { createLampKeepersWorld } from './helpers/world';

// The lamp log's summary reads per-organisation counts rows and a per-lamp "waiting to be recomputed"
// flag that the database's triggers keep (migration 0022). Whatever writes or deletes outlooks, lamps
// or enclosures, both must stay equal to a fresh recount of what is stored.
withTestDatabase();

type Row = { organisation_id: number; status_rank: number; as_of: string; n: number | string };

async function stored(): Promise<Record<string, number>> {
  const rows = await testDb().query<Row>(
    `SELECT organisation_id, status_rank, as_of, n FROM lamp_outlook_counts WHERE n <> 0`,
    { type: QueryTypes.SELECT },
  );
  return Object.fromEntries(
    rows.map((r) => [`${r.organisation_id}/${r.status_rank}/${r.as_of}`, Number(r.n)]),
  );
}

async function recount(): Promise<Record<string, number>> {
  const rows = await testDb().query<Row>(
    `SELECT organisation_id, status_rank, as_of, COUNT(*) AS n FROM lamp_outlooks
      GROUP BY organisation_id, status_rank, as_of`,
    { type: QueryTypes.SELECT },
  );
  return Object.fromEntries(
    rows.map((r) => [`${r.organisation_id}/${r.status_rank}/${r.as_of}`, Number(r.n)]),
  );
}

/** The lamps waiting by their flag, and by comparing every lamp with its stored outlook (the reference). */
async function pendingBoth() {
  const [flagged, compared] = await Promise.all([
    testDb().query<{ id: number }>('SELECT id FROM lamps WHERE outlook_pending = 1 ORDER BY id', {
      type: QueryTypes.SELECT,
    }),
    testDb().query<{ id: number }>(
      `SELECT l.id FROM lamps l LEFT JOIN lamp_outlooks o ON o.lamp_id = l.id
        WHERE o.lamp_id IS NULL OR o.source_version <> l.outlook_version ORDER BY l.id`,
      { type: QueryTypes.SELECT },
    ),
  ]);
  return { flagged: flagged.map((r) => r.id), compared: compared.map((r) => r.id) };
}

/** What the summary said before the counts rows: a count over every lamp of the organisation. */
async function countsByScan(organisationId: number, today: string, keeperId?: number) {
  const [row] = await testDb().query<Record<string, number | string | null>>(
    `SELECT SUM(o.status_rank = 0) AS \`replace\`, SUM(o.status_rank = 1) AS testSoon,
            SUM(o.status_rank < 4) AS inUse,
            SUM(o.lamp_id IS NULL OR o.source_version <> l.outlook_version OR o.as_of < :today) AS pending
       FROM enclosures e JOIN lamps l ON l.enclosure_id = e.id LEFT JOIN lamp_outlooks o ON o.lamp_id = l.id
      WHERE e.organisation_id = :organisationId ${keeperId ? 'AND e.keeper_id = :keeperId' : ''}`,
    { replacements: { organisationId, today, keeperId: keeperId ?? 0 }, type: QueryTypes.SELECT },
  );
  const n = (v: unknown) => Number(v ?? 0);
  return {
    replace: n(row?.replace),
    testSoon: n(row?.testSoon),
    inUse: n(row?.inUse),
    pending: n(row?.pending),
  };
}

async function world() {
  const { org, ann, bob, t5, heat } = await createLampKeepersWorld();
  const enclosures: Enclosure[] = [];
  const lamps: Lamp[] = [];
  for (const [k, keeper] of [ann, bob].entries()) {
    for (let e = 0; e < 2; e++) {
      const enclosure = await createEnclosure(org, keeper, { speciesName: 'Bearded dragon' });
      enclosures.push(enclosure);
      for (let i = 0; i < 4; i++) {
        lamps.push(
          await Lamp.create({
            enclosureId: enclosure.id,
            lampTypeId: i === 0 ? heat.id : t5.id,
            label: `Lamp ${k}${e}${i}`,
            // From new to two years old, one retired: a mix of every status.
            firstUsedOn: addDays(todayIso(), -((i * 211 + e * 97 + k * 53) % 730)),
            retiredOn: i === 3 && e === 1 ? todayIso() : null,
            hoursPerDay: 12,
            baskingDistanceCm: 25,
            createdById: keeper.id,
          }),
        );
      }
    }
  }
  await refreshStaleOutlooks();
  return { org, ann, bob, enclosures, lamps };
}

async function expectInStep(org: Organisation, keepers: User[] = [], today = todayIso()) {
  expect(await stored()).toEqual(await recount());
  const { flagged, compared } = await pendingBoth();
  expect(flagged).toEqual(compared);
  expect(await lampCounts({ organisationId: org.id }, today)).toEqual(await countsByScan(org.id, today));
  for (const k of keepers) {
    expect(await lampCounts({ organisationId: org.id, keeperId: k.id }, today)).toEqual(
      await countsByScan(org.id, today, k.id),
    );
  }
}

describe('the lamp log’s counts rows and waiting flags', () => {
  it('equal a fresh recount after outlooks are computed, changed, and recomputed for a later day', async () => {
    const w = await world();
    const other = await world();
    const counts = await lampCounts({ organisationId: w.org.id });
    expect(counts.inUse).toBeGreaterThan(0);
    expect(counts.pending).toBe(0);
    await expectInStep(w.org, [w.ann, w.bob]);
    await expectInStep(other.org);

    // A reading changes one lamp's outlook (recomputed inline); a version bump as a migration does it
    // marks every lamp waiting until the pass has run.
    await Reading.create({
      lampId: w.lamps[1]!.id,
      takenAt: new Date(),
      distanceCm: 30,
      value: 1,
      unit: 'uvi',
      takenById: w.ann.id,
    });
    await expectInStep(w.org, [w.ann, w.bob]);
    await testDb().query('UPDATE lamps SET outlook_version = outlook_version + 1');
    expect((await lampCounts({ organisationId: w.org.id })).pending).toBe(w.lamps.length);
    await expectInStep(w.org, [w.ann, w.bob]);
    await refreshStaleOutlooks();
    expect((await lampCounts({ organisationId: w.org.id })).pending).toBe(0);
    await expectInStep(w.org, [w.ann, w.bob]);

    // Tomorrow's pass: every row moves to the new day; until it runs, today's rows are "before today".
    const tomorrow = addDays(todayIso(), 1);
    expect((await lampCounts({ organisationId: w.org.id }, tomorrow)).pending).toBe(w.lamps.length);
    await expectInStep(w.org, [w.ann], tomorrow);
    await refreshOutlooks(
      w.lamps.slice(0, 5).map((l) => l.id),
      tomorrow,
    );
    await expectInStep(w.org, [w.ann, w.bob], tomorrow);
    await refreshStaleOutlooks(tomorrow);
    expect((await lampCounts({ organisationId: w.org.id }, tomorrow)).pending).toBe(0);
    await expectInStep(w.org, [w.ann, w.bob], tomorrow);
  });

  it('stay equal to a recount when recomputes of the same lamps overlap', async () => {
    const w = await world();
    const ids = w.lamps.map((l) => l.id);
    const tomorrow = addDays(todayIso(), 1);
    await testDb().query('UPDATE lamps SET outlook_version = outlook_version + 1 WHERE id IN (:ids)', {
      replacements: { ids: ids.slice(0, 8) },
    });
    await Promise.all([
      refreshOutlooks(ids),
      refreshOutlooks([...ids].reverse()),
      refreshOutlooks(ids, tomorrow),
      refreshStaleOutlooks(),
      refreshOutlooks(ids.slice(3, 11), tomorrow),
    ]);
    await expectInStep(w.org, [w.ann, w.bob], tomorrow);
    expect((await pendingBoth()).flagged).toEqual([]);
  });

  it('count out the outlooks of a deleted lamp, enclosure and organisation (which the cascade alone would not)', async () => {
    const w = await world();
    const other = await world();
    const before = (await lampCounts({ organisationId: w.org.id })).inUse;
    const lamp = w.lamps.find((l) => l.enclosureId === w.enclosures[0]!.id && !l.retiredOn)!;
    await Lamp.destroy({ where: { id: lamp.id } });
    await expectInStep(w.org, [w.ann, w.bob]);
    expect((await lampCounts({ organisationId: w.org.id })).inUse).toBe(before - 1);

    // The enclosure takes its lamps and their outlooks with it by cascade.
    await w.enclosures[1]!.destroy();
    await expectInStep(w.org, [w.ann, w.bob]);
    expect(await Lamp.count({ where: { enclosureId: w.enclosures[1]!.id } })).toBe(0);

    await testDb().query('DELETE FROM organisations WHERE id = :id', { replacements: { id: w.org.id } });
    const rows = await testDb().query('SELECT * FROM lamp_outlook_counts WHERE organisation_id = :id', {
      replacements: { id: w.org.id },
      type: QueryTypes.SELECT,
    });
    expect(rows).toEqual([]);
    await expectInStep(other.org, [other.ann, other.bob]);
  });
});
