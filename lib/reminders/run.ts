import 'server-only';
import { Op } from 'sequelize';
import { config } from '@/lib/config';
import { runJob, type Job, type JobContext } from '@/lib/jobs/runner';
import { todayIso } from '@/lib/lamp-log/dates';
import { summarise } from '@/lib/lamp-log/queries';
import type { Mail } from '@/lib/mail';
import { Enclosure, Lamp, Organisation, User } from '@/models';
import { dueItems, type DueItem } from './due';
import { deliverQueued, enqueueReminder } from './outbox';

export type ReminderOptions = {
  today?: string;
  send?: (mail: Mail) => Promise<void>;
  /** The lamps' outlooks; a test passes one that fails for chosen lamps. */
  summarise?: typeof summarise;
  /** Queues one keeper's message; a test passes one that fails for a chosen keeper. */
  enqueue?: typeof enqueueReminder;
};

export type RunResult = { due: number; queued: number; sent: number; failed: number };

export const REMINDER_JOB = 'lamp-reminders';
const BATCH = 200;

type DueWithOrganisation = DueItem & { organisationId: number };

/**
 * One run of the reminder job: find every lamp in use that is due for a test or a replacement, queue
 * one e-mail per keeper and organisation for the dates not announced before, then deliver the outbox.
 * Each lamp's due state and each keeper's message is its own unit of work: one that fails is recorded
 * (and retried later with back-off) while the others go on.
 */
export async function reminderWork(ctx: JobContext, opts: ReminderOptions = {}): Promise<void> {
  const today = opts.today ?? todayIso();
  const outlooks = opts.summarise ?? summarise;
  const enqueue = opts.enqueue ?? enqueueReminder;
  const items: DueWithOrganisation[] = [];

  for (let cursor = 0; ;) {
    // The lamps alone, by primary key: joined to their enclosures and sorted by id, MariaDB would build
    // and sort the whole join for every batch (seconds at 8,000 lamps).
    const lamps = await Lamp.findAll({
      where: { retiredOn: null, id: { [Op.gt]: cursor } },
      order: [['id', 'ASC']],
      limit: BATCH,
    });
    if (lamps.length === 0) break;
    cursor = lamps[lamps.length - 1]!.id;
    const enclosures = await Enclosure.findAll({
      where: { id: [...new Set(lamps.map((l) => l.enclosureId))] },
      attributes: ['id', 'organisationId'],
    });
    const organisationOfEnclosure = new Map(enclosures.map((e) => [e.id, e.organisationId]));
    const organisationOf = new Map(lamps.map((l) => [l.id, organisationOfEnclosure.get(l.enclosureId)!]));
    const due = (summaries: Awaited<ReturnType<typeof summarise>>) =>
      dueItems(
        summaries.map((s) => ({
          lampId: s.id,
          label: s.label,
          enclosureName: s.enclosure.name,
          keeperId: s.enclosure.keeperId,
          status: s.status,
          testDueOn: s.testDueOn,
          replaceDueOn: s.replaceDueOn,
          replaceBasis: s.replaceBasis,
          reasons: s.reasons,
        })),
        today,
      ).map((i) => ({ ...i, organisationId: organisationOf.get(i.lampId)! }));

    // The whole batch at once (a few queries for 200 lamps); only when that fails, lamp by lamp, so one
    // lamp whose outlook cannot be worked out costs its own reminder and nobody else's.
    const lampKey = (id: number) => `lamp:${id}:due-state`;
    const ready = lamps.filter((l) => !ctx.isDeferred(lampKey(l.id)));
    ctx.count('lamps checked', ready.length);
    let batch: DueWithOrganisation[] | null = null;
    try {
      batch = due(await outlooks(ready, today));
    } catch (e) {
      ctx.log.warn({ err: e, fromLampId: ready[0]?.id }, 'a batch of lamps failed; checking them one by one');
    }
    if (batch) {
      items.push(...batch);
      for (const l of ready) await ctx.succeeded(lampKey(l.id));
    } else {
      for (const lamp of ready) {
        const r = await ctx.unit(
          {
            key: lampKey(lamp.id),
            label: `Due dates of the lamp “${lamp.label}”`,
            organisationId: organisationOf.get(lamp.id),
          },
          async () => due(await outlooks([lamp], today)),
        );
        if (r.ok) items.push(...r.value);
      }
    }
    for (const l of lamps) if (!ready.includes(l)) ctx.count('units deferred', 1, organisationOf.get(l.id));
    if (lamps.length < BATCH) break;
  }
  for (const i of items) ctx.count('lamps due', 1, i.organisationId);

  // One message per keeper and organisation: the link leads to that organisation's lamp log.
  const groups = new Map<string, { keeperId: number; organisationId: number; items: DueItem[] }>();
  for (const i of items) {
    const key = `${i.organisationId}:${i.keeperId}`;
    const g =
      groups.get(key) ??
      groups.set(key, { keeperId: i.keeperId, organisationId: i.organisationId, items: [] }).get(key)!;
    g.items.push(i);
  }
  const keepers = new Map(
    (
      await User.findAll({
        where: { id: [...new Set(items.map((i) => i.keeperId))] },
        attributes: ['id', 'name', 'email'],
      })
    ).map((u) => [u.id, u]),
  );
  const organisations = new Map(
    (
      await Organisation.findAll({
        where: { id: [...new Set(items.map((i) => i.organisationId))] },
        attributes: ['id', 'name'],
      })
    ).map((o) => [o.id, o]),
  );
  for (const g of [...groups.values()].sort(
    (a, b) => a.organisationId - b.organisationId || a.keeperId - b.keeperId,
  )) {
    const keeper = keepers.get(g.keeperId);
    const organisation = organisations.get(g.organisationId);
    if (!keeper || !organisation) continue; // removed since the lamps were read
    const r = await ctx.unit(
      {
        key: `keeper:${g.keeperId}:org:${g.organisationId}:reminder`,
        label: `Lamp reminder for ${keeper.name}`,
        organisationId: g.organisationId,
      },
      () => enqueue(keeper, g.items, config().APP_URL, { id: organisation.id, name: organisation.name }),
    );
    if (r.ok && r.value) ctx.count('e-mails queued', 1, g.organisationId);
  }

  await deliverForJob(ctx, opts.send);
}

/**
 * A job's last step: deliver the outbox, counting what went and what failed (a failure is one of the
 * run's failed units, so the owner's Jobs page shows it; the message is retried with back-off).
 */
export async function deliverForJob(ctx: JobContext, send?: (mail: Mail) => Promise<void>): Promise<void> {
  const delivery = await deliverQueued({
    send,
    now: ctx.now,
    onFailure: (m, e) => {
      ctx.count('units failed', 1, m.organisationId);
      ctx.log.warn({ mailId: m.id, attempts: m.attempts + 1, err: e }, 'e-mail not delivered');
    },
  });
  ctx.count('e-mails sent', delivery.sent);
  ctx.count('e-mails failed', delivery.failed);
}

/** Every hour by default; REMINDERS_INTERVAL_MINUTES changes it (0 turns the schedule off). */
export const reminderJob: Job = {
  name: REMINDER_JOB,
  title: 'Lamp reminders',
  everyMs: Number(process.env.REMINDERS_INTERVAL_MINUTES ?? 60) * 60_000,
  run: (ctx) => reminderWork(ctx),
};

/**
 * One run through the job runner (lock, record of the run), as `npm run reminders` and the tests do.
 * `skipped` when another run holds the lock.
 */
export async function runReminders(
  opts: ReminderOptions & { now?: Date } = {},
): Promise<
  RunResult & { skipped: boolean; outcome: string; runId: number | null; counts: Record<string, number> }
> {
  const r = await runJob({ ...reminderJob, run: (ctx) => reminderWork(ctx, opts) }, { now: opts.now });
  if ('skipped' in r)
    return {
      due: 0,
      queued: 0,
      sent: 0,
      failed: 0,
      skipped: true,
      outcome: 'skipped',
      runId: null,
      counts: {},
    };
  const c = r.counts;
  return {
    due: c['lamps due'] ?? 0,
    queued: c['e-mails queued'] ?? 0,
    sent: c['e-mails sent'] ?? 0,
    failed: c['e-mails failed'] ?? 0,
    skipped: false,
    outcome: r.outcome,
    runId: r.runId,
    counts: c,
  };
}
