import { describe, expect, it } from 'vitest';
import { addDays, todayIso } from '@/lib/lamp-log/dates';
import { summarise } from '@/lib/lamp-log/queries';
import type { Mail } from '@/lib/mail';
import { enqueueReminder } from '@/lib/reminders/outbox';
import { runReminders } from '@/lib/reminders/run';
import { seedStartingCatalogue } from '@/lib/species/seed';
import {
  JobRun,
  JobUnit,
  Lamp,
  LampReminder,
  LampType,
  MailMessage,
  type Organisation,
  type User,
} from '@/models';
import { createEnclosure, createMember, createOrganisation, withTestDatabase } from './helpers/db';

// One bad unit of the reminder job — a keeper's message that cannot be queued, a lamp whose due state
// cannot be worked out, a message the mail server refuses — fails alone: the others go out, the failure
// is recorded and retried after its back-off, and nothing is ever sent twice.
withTestDatabase();

const minutesOn = (m: number) => new Date(Date.now() + m * 60_000);

/** Records what would have been sent; `refuse` lists addresses whose delivery fails. */
function mailbox(refuse: Set<string> = new Set()) {
  const sent: Mail[] = [];
  const send = async (mail: Mail) => {
    if (refuse.has(mail.to)) throw new Error(`mailbox ${mail.to} unavailable (planted)`);
    sent.push(mail);
  };
  return { sent, send, to: (u: User) => sent.filter((m) => m.to === u.email) };
}

/** `n` new, never measured lamps (each due for a first test) in one enclosure of `keeper`. */
async function lampsFor(org: Organisation, keeper: User, n: number, label = 'Tube'): Promise<Lamp[]> {
  const enclosure = await createEnclosure(org, keeper, { speciesName: 'Bearded dragon' });
  const t5 = (await LampType.findOne({ where: { organisationId: org.id, tech: 't5' } }))!;
  return Lamp.bulkCreate(
    Array.from({ length: n }, (_, k) => ({
      enclosureId: enclosure.id,
      lampTypeId: t5.id,
      label: `${label} ${k + 1}`,
      firstUsedOn: addDays(todayIso(), -3),
      hoursPerDay: 12,
      createdById: null,
    })),
  );
}

async function shopWithKeepers(count: number) {
  const org = await createOrganisation('Isolation shop');
  await seedStartingCatalogue(org.id);
  const keepers: User[] = [];
  for (let k = 0; k < count; k++) keepers.push((await createMember('keeper', org)).user);
  return { org, keepers };
}

describe('reminder job, one unit at a time', () => {
  it('queues the other keepers’ messages when one keeper’s fails, and retries that one after its back-off', async () => {
    const { org, keepers } = await shopWithKeepers(3);
    for (const k of keepers) await lampsFor(org, k, 2);
    const [first, bad, last] = keepers as [User, User, User];
    // Planted: queuing the middle keeper's message throws (as a database error would).
    const enqueue: typeof enqueueReminder = async (keeper, ...rest) => {
      if (keeper.id === bad.id) throw new Error('Data too long for column (planted)');
      return enqueueReminder(keeper, ...rest);
    };
    const box = mailbox();
    const r = await runReminders({ send: box.send, enqueue });
    expect(r).toMatchObject({ outcome: 'partial', due: 6, queued: 2, sent: 2, failed: 0 });
    expect(box.to(first)).toHaveLength(1);
    expect(box.to(last)).toHaveLength(1);
    expect(box.to(bad)).toHaveLength(0);
    const unit = (await JobUnit.findOne())!;
    expect(unit).toMatchObject({
      job: 'lamp-reminders',
      unitKey: `keeper:${bad.id}:org:${org.id}:reminder`,
      organisationId: org.id,
      attempts: 1,
      lastError: 'Data too long for column (planted)',
    });
    expect(unit.label).toBe(`Lamp reminder for ${bad.name}`);
    // Nothing of the failed keeper's was announced: the retry will announce it.
    expect(await LampReminder.count()).toBe(4);

    // Right away: waiting out its back-off, even with the fault gone.
    expect(await runReminders({ send: box.send })).toMatchObject({ outcome: 'succeeded', queued: 0 });
    expect(box.to(bad)).toHaveLength(0);
    // After it: queued and sent, and the others are not sent again.
    const retry = await runReminders({ send: box.send, now: minutesOn(6) });
    expect(retry).toMatchObject({ outcome: 'succeeded', queued: 1, sent: 1 });
    expect(box.sent.map((m) => m.to).sort()).toEqual([first.email, bad.email, last.email].sort());
    expect(await JobUnit.count()).toBe(0);
  });

  it('sends the other lamps’ reminders when one lamp’s due state cannot be worked out', async () => {
    const { org, keepers } = await shopWithKeepers(1);
    const [keeper] = keepers as [User];
    const lamps = await lampsFor(org, keeper, 5);
    const broken = lamps[2]!;
    // Planted: the outlook of the middle lamp throws (as a corrupt row would), in a batch or alone.
    const outlooks: typeof summarise = async (batch, today) => {
      if (batch.some((l) => l.id === broken.id)) throw new Error('cannot fit this lamp (planted)');
      return summarise(batch, today);
    };
    const box = mailbox();
    const r = await runReminders({ send: box.send, summarise: outlooks });
    expect(r).toMatchObject({ outcome: 'partial', due: 4, queued: 1, sent: 1 });
    const text = box.to(keeper)[0]!.text;
    for (const l of lamps) {
      if (l.id === broken.id) expect(text).not.toContain(`${l.label} (`);
      else expect(text).toContain(`${l.label} (`);
    }
    expect(await JobUnit.findOne()).toMatchObject({
      unitKey: `lamp:${broken.id}:due-state`,
      organisationId: org.id,
      lastError: 'cannot fit this lamp (planted)',
      label: `Due dates of the lamp “${broken.label}”`,
    });

    // Fixed, after the back-off: its reminder goes out on its own, the others are not repeated.
    const retry = await runReminders({ send: box.send, now: minutesOn(6) });
    expect(retry).toMatchObject({ outcome: 'succeeded', due: 5, queued: 1, sent: 1 });
    expect(box.to(keeper)).toHaveLength(2);
    expect(box.to(keeper)[1]!.text).toContain(`${broken.label} (`);
    expect(await JobUnit.count()).toBe(0);
  });

  it('delivers the other messages when the mail server refuses one, and retries it after its back-off', async () => {
    const { org, keepers } = await shopWithKeepers(3);
    for (const k of keepers) await lampsFor(org, k, 1);
    const [first, bad, last] = keepers as [User, User, User];
    const box = mailbox(new Set([bad.email]));
    const r = await runReminders({ send: box.send });
    expect(r).toMatchObject({ outcome: 'partial', queued: 3, sent: 2, failed: 1 });
    expect(box.sent.map((m) => m.to).sort()).toEqual([first.email, last.email].sort());
    const row = (await MailMessage.findOne({ where: { toEmail: bad.email } }))!;
    expect(row).toMatchObject({ status: 'failed', attempts: 1, organisationId: org.id });
    expect(row.lastError).toBe(`mailbox ${bad.email} unavailable (planted)`);

    expect(await runReminders({ send: box.send, now: minutesOn(2) })).toMatchObject({ sent: 0, failed: 0 });
    const fixed = mailbox();
    expect(await runReminders({ send: fixed.send, now: minutesOn(6) })).toMatchObject({ sent: 1, failed: 0 });
    expect(fixed.sent.map((m) => m.to)).toEqual([bad.email]);
  });

  it('fits one keeper’s 600 due lamps in one short message (the old one outgrew its column)', async () => {
    const { org, keepers } = await shopWithKeepers(1);
    const [keeper] = keepers as [User];
    await lampsFor(org, keeper, 600, 'A lamp with a long descriptive label to fill the line');
    const box = mailbox();
    const r = await runReminders({ send: box.send });
    expect(r).toMatchObject({ outcome: 'succeeded', due: 600, queued: 1, sent: 1 });
    const [mail] = box.to(keeper);
    expect(mail!.subject).toBe('Baskwell lamp log: 600 lamps to test');
    expect(mail!.text).toContain('- and 585 more lamps (585 to test)');
    expect(mail!.text.length).toBeLessThan(12_000);
    expect(await LampReminder.count()).toBe(600);
    const run = (await JobRun.findOne({ where: { id: r.runId! } }))!;
    expect(run.outcome).toBe('succeeded');
  });

  it('sends each message once when two runs start together, one of them finding the job locked', async () => {
    const { org, keepers } = await shopWithKeepers(2);
    for (const k of keepers) await lampsFor(org, k, 3);
    const box = mailbox();
    const runs = await Promise.all([runReminders({ send: box.send }), runReminders({ send: box.send })]);
    expect(runs.map((r) => r.skipped).sort()).toEqual([false, true]);
    // And again, both free to run one after the other: nothing new.
    await runReminders({ send: box.send });
    expect(box.sent.map((m) => m.to).sort()).toEqual(keepers.map((k) => k.email).sort());
    expect(await MailMessage.count()).toBe(2);
  });
});
