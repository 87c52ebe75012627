import 'server-only';
import { Op, UniqueConstraintError } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { runJob, type Job, type JobContext } from '@/lib/jobs/runner';
import { addDays, todayIso } from '@/lib/lamp-log/dates';
import type { Mail } from '@/lib/mail';
import { deliverForJob } from '@/lib/reminders/run';
import { organisationContact } from '@/lib/organisations/queries';
import { CounterLamp, CounterReading, Customer, LampType, MailMessage } from '@/models';
import { COUNTER_CAUTIONS } from './assess';
import { unsubscribeUrl } from './slip';

/**
 * Re-test reminders to the shop's customers: an e-mail when a counter lamp's "test again by" date (the
 * verdict of its latest reading) comes near, so the customer brings it back. Only to a customer with an
 * address who agreed to e-mails (checked again, under a row lock, as the message is queued, so a
 * withdrawal that lands meanwhile wins); once per lamp and due date — the message's unique key is
 * `counter-reminder:lamp:<id>:due:<date>`, so a rerun, a second job instance or a crash after queueing
 * never sends it twice, and a retest that sets a new date earns a new one; every message ends with the
 * link that stops them. Built as the lamp reminders are: the runner's lock and record, one unit of work
 * per lamp (retried alone with back-off), then the outbox's delivery.
 */

export const COUNTER_REMINDER_JOB = 'counter-reminders';
/** A reminder goes this many days before the date, so there is time to come in (common practice, no published source). */
export const REMIND_DAYS_BEFORE = 7;
/**
 * A date further back than this is not announced any more: the customer has most likely replaced or
 * retested the lamp elsewhere, and a first reminder months late would only confuse.
 */
export const STALE_AFTER_DAYS = 60;
const BATCH = 200;

export type CounterReminderOptions = { today?: string; send?: (mail: Mail) => Promise<void> };

export function composeCounterReminder(input: {
  shop: string;
  /** How to reach the shop, when its owner set it. */
  contact?: string | null;
  customerName: string;
  lampName: string;
  testedOn: string;
  testAgainOn: string;
  today: string;
  unsubscribeUrl: string;
}): { subject: string; text: string } {
  const passed = input.testAgainOn < input.today;
  const lines = [
    `Hello ${input.customerName},`,
    '',
    `When ${input.shop} tested your lamp (${input.lampName}) on ${input.testedOn}, the advice was to test it again by ${input.testAgainOn}.${passed ? ' That date has passed.' : ''}`,
    '',
    'A UV lamp loses output as it ages, long before its light looks any different. Bring it in for a new reading, or measure it at home with a UV meter at the same distance.',
    '',
    'Please note:',
    ...COUNTER_CAUTIONS.map((c) => `- ${c}`),
    '',
    input.shop,
    ...(input.contact ? [input.contact] : []),
    '',
    `To stop e-mails about your lamp tests from ${input.shop}, open this link (no sign-in needed): ${input.unsubscribeUrl}`,
  ];
  return {
    subject: `${input.shop}: time to test your lamp again (by ${input.testAgainOn})`,
    text: lines.join('\n'),
  };
}

/** The latest reading of each lamp, by lamp id. */
async function latestReadings(lampIds: number[]): Promise<Map<number, CounterReading>> {
  const rows = await CounterReading.findAll({
    where: { counterLampId: lampIds },
    attributes: ['id', 'counterLampId', 'takenAt', 'testAgainOn'],
    order: [
      ['counterLampId', 'ASC'],
      ['takenAt', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  const latest = new Map<number, CounterReading>();
  for (const r of rows) if (!latest.has(r.counterLampId)) latest.set(r.counterLampId, r);
  return latest;
}

/**
 * Queues the reminder of one lamp's due date, or null when it went before or the customer may no longer
 * be written to. The consent is read under a lock on the customer's row, in the transaction that queues
 * the message: a withdrawal (which updates that row, then cancels what is queued) comes wholly before
 * or wholly after.
 */
export async function enqueueCounterReminder(
  customerId: number,
  lamp: Pick<CounterLamp, 'id' | 'organisationId' | 'label'> & { typeName: string },
  reading: Pick<CounterReading, 'takenAt' | 'testAgainOn'>,
  shop: { name: string; contact: string | null },
  today: string,
): Promise<MailMessage | null> {
  const sequelize = getSequelize();
  const dueOn = reading.testAgainOn!;
  try {
    return await sequelize.transaction(async (transaction) => {
      const customer = await Customer.findByPk(customerId, { transaction, lock: transaction.LOCK.UPDATE });
      if (!customer?.email || !customer.reminderConsentAt) return null;
      const { subject, text } = composeCounterReminder({
        shop: shop.name,
        contact: shop.contact,
        customerName: customer.name,
        lampName: lamp.label ? `${lamp.label}, ${lamp.typeName}` : lamp.typeName,
        testedOn: reading.takenAt.toISOString().slice(0, 10),
        testAgainOn: dueOn,
        today,
        unsubscribeUrl: unsubscribeUrl(customer.id),
      });
      return await MailMessage.create(
        {
          kind: 'counter-reminder',
          toEmail: customer.email,
          toUserId: null,
          organisationId: lamp.organisationId,
          subject,
          body: text,
          dedupeKey: `counter-reminder:lamp:${lamp.id}:due:${dueOn}`,
        },
        { transaction },
      );
    });
  } catch (e) {
    // Announced before (this run's rerun, or another instance): that message stands.
    if (e instanceof UniqueConstraintError) return null;
    throw e;
  }
}

export async function counterReminderWork(ctx: JobContext, opts: CounterReminderOptions = {}) {
  const today = opts.today ?? todayIso();
  const from = addDays(today, -STALE_AFTER_DAYS);
  const until = addDays(today, REMIND_DAYS_BEFORE);
  const shops = new Map<number, { name: string; contact: string | null }>();
  const types = new Map<number, string>();

  // Customers who may be written to, a batch at a time by primary key; then their lamps and the latest
  // reading of each (an older reading's date was replaced by the retest's).
  for (let cursor = 0; ;) {
    const customers = await Customer.findAll({
      where: {
        id: { [Op.gt]: cursor },
        reminderConsentAt: { [Op.ne]: null },
        email: { [Op.ne]: null },
      },
      attributes: ['id', 'name', 'organisationId'],
      order: [['id', 'ASC']],
      limit: BATCH,
    });
    if (customers.length === 0) break;
    cursor = customers[customers.length - 1]!.id;
    const lamps = await CounterLamp.findAll({
      where: { customerId: customers.map((c) => c.id) },
      attributes: ['id', 'organisationId', 'customerId', 'lampTypeId', 'label'],
      order: [['id', 'ASC']],
    });
    const latest = lamps.length ? await latestReadings(lamps.map((l) => l.id)) : new Map();
    const due = lamps.filter((l) => {
      const on = latest.get(l.id)?.testAgainOn;
      return on && on >= from && on <= until;
    });
    ctx.count('customer lamps checked', lamps.length);
    for (const id of new Set(due.map((l) => l.organisationId).filter((o) => !shops.has(o)))) {
      const shop = await organisationContact(id);
      shops.set(id, { name: shop?.name ?? 'The shop', contact: shop?.line ?? null });
    }
    for (const id of new Set(due.map((l) => l.lampTypeId).filter((t) => !types.has(t)))) {
      types.set(id, (await LampType.findByPk(id, { attributes: ['name'] }))?.name ?? 'UV lamp');
    }
    for (const lamp of due) {
      const reading = latest.get(lamp.id)!;
      const customer = customers.find((c) => c.id === lamp.customerId)!;
      ctx.count('customer lamps due', 1, lamp.organisationId);
      const r = await ctx.unit(
        {
          key: `counter-lamp:${lamp.id}:reminder`,
          label: `Re-test reminder to ${customer.name}`,
          organisationId: lamp.organisationId,
        },
        () =>
          enqueueCounterReminder(
            customer.id,
            {
              id: lamp.id,
              organisationId: lamp.organisationId,
              label: lamp.label ?? null,
              typeName: types.get(lamp.lampTypeId)!,
            },
            reading,
            shops.get(lamp.organisationId)!,
            today,
          ),
      );
      if (r.ok && r.value) ctx.count('e-mails queued', 1, lamp.organisationId);
    }
    if (customers.length < BATCH) break;
  }

  await deliverForJob(ctx, opts.send);
}

/** Every hour by default; COUNTER_REMINDERS_INTERVAL_MINUTES changes it (0 turns the schedule off). */
export const counterReminderJob: Job = {
  name: COUNTER_REMINDER_JOB,
  title: 'Re-test reminders to customers',
  everyMs: Number(process.env.COUNTER_REMINDERS_INTERVAL_MINUTES ?? 60) * 60_000,
  run: (ctx) => counterReminderWork(ctx),
};

/** One run through the job runner (lock, record of the run), as the tests do; null when another run held the lock. */
export async function runCounterReminders(opts: CounterReminderOptions & { now?: Date } = {}) {
  const r = await runJob(
    { ...counterReminderJob, run: (ctx) => counterReminderWork(ctx, opts) },
    { now: opts.now },
  );
  return 'skipped' in r ? null : r;
}
