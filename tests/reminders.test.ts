import net from 'node:net';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { addDays, todayIso } from '@/lib/lamp-log/dates';
import { runReminders } from '@/lib/reminders/run';
import { seedStartingCatalogue } from '@/lib/species/seed';
import { Lamp, LampReminder, LampType, MailMessage, Reading } from '@/models';
import { startFakeSmtp, type FakeSmtp } from '@/scripts/fake-smtp/server';
import { createEnclosure, createMember, createOrganisation, withTestDatabase } from './helpers/db';
import { clearMail, listMail, waitForMail } from './helpers/mail';

// The reminder job against the real test database and the fake SMTP server `npm test` runs (one is
// started here when this file runs on its own).
process.env.SMTP_PORT ??= process.env.TEST_SMTP_PORT ?? '2527';
process.env.FAKE_SMTP_HTTP ??= process.env.TEST_FAKE_SMTP_HTTP ?? 'http://127.0.0.1:2581';

let ownSmtp: FakeSmtp | null = null;
beforeAll(async () => {
  const port = Number(process.env.SMTP_PORT);
  if (await listening(port)) return;
  ownSmtp = await startFakeSmtp({
    smtpPort: port,
    httpPort: Number(new URL(process.env.FAKE_SMTP_HTTP!).port),
    dir: null,
    quiet: true,
  });
});
afterAll(async () => {
  await ownSmtp?.close();
});

withTestDatabase();
beforeEach(clearMail);

function listening(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const s = net.connect({ port, host: '127.0.0.1' });
    s.once('connect', () => (s.destroy(), resolve(true)));
    s.once('error', () => resolve(false));
  });
}

async function world() {
  const org = await createOrganisation('Reminder shop');
  await seedStartingCatalogue(org.id);
  const { user: keeper } = await createMember('keeper', org);
  const { user: calmKeeper } = await createMember('keeper', org);
  const enclosure = await createEnclosure(org, keeper, {
    name: 'Desert vivarium',
    speciesName: 'Bearded dragon',
  });
  const calmEnclosure = await createEnclosure(org, calmKeeper, { speciesName: 'Bearded dragon' });
  const t5 = (await LampType.findOne({ where: { organisationId: org.id, tech: 't5', uvbAt30: 42.5 } }))!;
  const today = todayIso();
  /** A T5 tube of the scenario, switched on `ageDays` ago and run 12 hours a day. */
  const tube = (
    enclosureId: number,
    label: string,
    ageDays: number,
    basking: { baskingDistanceCm?: number } = {},
  ) =>
    Lamp.create({
      enclosureId,
      lampTypeId: t5.id,
      label,
      firstUsedOn: addDays(today, -ageDays),
      hoursPerDay: 12,
      ...basking,
      createdById: null,
    });
  /** A UVB reading of `value` µW/cm² at `distanceCm`, taken at noon `daysAgo` days ago. */
  const reading = (lampId: number, daysAgo: number, distanceCm: number, value: number) =>
    Reading.create({
      lampId,
      takenAt: new Date(`${addDays(today, -daysAgo)}T12:00:00Z`),
      distanceCm,
      value,
      unit: 'uvb',
      takenById: null,
    });
  // Worn out: measured far below the bearded dragon's 115 µW/cm² at the basking spot.
  const worn = await tube(enclosure.id, 'Old basking tube', 400, { baskingDistanceCm: 30 });
  for (const [d, v] of [
    [400, 160],
    [250, 100],
    [100, 60],
  ] as const) {
    await reading(worn.id, d, 30, v);
  }
  // New and never measured: due for a first test.
  const fresh = await tube(enclosure.id, 'New spot tube', 3);
  // Fine: measured last week, well above the need.
  const fine = await tube(calmEnclosure.id, 'Healthy tube', 30, { baskingDistanceCm: 20 });
  await reading(fine.id, 7, 20, 220);
  return { keeper, calmKeeper, worn, fresh, fine };
}

describe('reminder job', () => {
  it('sends one e-mail per keeper, grouping their due lamps, and it arrives in the fake SMTP server', async () => {
    const w = await world();
    const r = await runReminders();
    expect(r).toMatchObject({ due: 2, queued: 1, sent: 1, failed: 0 });
    const mail = await waitForMail(w.keeper.email);
    expect(mail.subject).toBe('Baskwell lamp log: 1 lamp to replace, 1 lamp to test');
    expect(mail.text).toContain('Old basking tube (Desert vivarium): Replace by');
    expect(mail.text).toContain('New spot tube (Desert vivarium): Test with a meter by');
    expect(await listMail(w.keeper.email)).toHaveLength(1);
    expect(await listMail(w.calmKeeper.email)).toHaveLength(0);
    const outbox = await MailMessage.findAll();
    expect(outbox).toHaveLength(1);
    expect(outbox[0]).toMatchObject({ status: 'sent', attempts: 1, lastError: null });
    expect(await LampReminder.count()).toBe(2);
  });

  it('sends nothing new when run again, or twice at the same time', async () => {
    const w = await world();
    const [a, b] = await Promise.all([runReminders(), runReminders()]);
    expect(a.queued + b.queued).toBe(1);
    // The job's lock lets one of the two run; the other does nothing.
    expect([a.skipped, b.skipped].sort()).toEqual([false, true]);
    const again = await runReminders();
    expect(again).toMatchObject({ queued: 0, sent: 0, failed: 0 });
    await waitForMail(w.keeper.email);
    await new Promise((r) => setTimeout(r, 300));
    expect(await listMail(w.keeper.email)).toHaveLength(1);
    expect(await MailMessage.count()).toBe(1);
  });

  it('records a failed delivery and retries it on the next run, still sending it once', async () => {
    const w = await world();
    const failed = await runReminders({
      send: async () => {
        throw new Error('SMTP connection refused (test)');
      },
    });
    expect(failed).toMatchObject({ queued: 1, sent: 0, failed: 1 });
    const row = (await MailMessage.findOne())!;
    expect(row).toMatchObject({ status: 'failed', attempts: 1, lastError: 'SMTP connection refused (test)' });
    expect(await listMail(w.keeper.email)).toHaveLength(0);

    // Not again at once: the failed message waits out its back-off (five minutes after one attempt).
    expect(row.nextAttemptAt!.getTime()).toBeGreaterThan(Date.now() + 4 * 60_000);
    expect(await runReminders()).toMatchObject({ queued: 0, sent: 0, failed: 0 });
    const retry = await runReminders({ now: new Date(Date.now() + 6 * 60_000) });
    expect(retry).toMatchObject({ queued: 0, sent: 1, failed: 0 });
    await row.reload();
    expect(row).toMatchObject({ status: 'sent', attempts: 2, lastError: null });
    expect(await listMail(w.keeper.email)).toHaveLength(1);
  });

  it('announces a new due date once the old one has passed (a new reading moves the test date)', async () => {
    const w = await world();
    await runReminders();
    // Measuring the new lamp once its burn-in is over (100 hours, 12 hours a day: past after 9 days) moves
    // its next test three months on: nothing is due for it until then. A reading inside the burn-in would
    // not count as the baseline (common practice, no published source).
    await w.fresh.update({ firstUsedOn: addDays(todayIso(), -10) });
    await Reading.create({
      lampId: w.fresh.id,
      takenAt: new Date(),
      distanceCm: 30,
      value: 160,
      unit: 'uvb',
      takenById: null,
    });
    expect((await runReminders()).queued).toBe(0);
    const later = await runReminders({ today: addDays(todayIso(), 90) });
    // Both keepers: the healthy lamp next door is due for its three-monthly test by then as well.
    expect(later.queued).toBe(2);
    await waitForMail(w.calmKeeper.email);
    expect(await listMail(w.keeper.email)).toHaveLength(2);
    const keys = (await LampReminder.findAll({ where: { lampId: w.fresh.id } })).map((r) => r.dedupeKey);
    expect(keys).toHaveLength(2);
    expect(keys[1]).toMatch(/^lamp:\d+:due:\d{4}-\d{2}-\d{2}:test$/);
  });
});
