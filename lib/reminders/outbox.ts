import 'server-only';
import { createHash } from 'node:crypto';
import { Op, UniqueConstraintError } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { sendMail, type Mail } from '@/lib/mail';
import { backoffMs } from '@/lib/jobs/backoff';
import { errorText } from '@/lib/log';
import { LampReminder, MailMessage, type User } from '@/models';
import { composeReminder } from './compose';
import type { DueItem } from './due';

/**
 * The outbox. Deciding to send and recording that decision happen in one transaction: the message row
 * and one "announced" row per (lamp, kind, due date) — both with unique keys — so however often or
 * concurrently the job runs, a due date is announced once. Delivery is a separate step that only
 * reads the outbox, so a failed delivery is retried on the next run without deciding anything again.
 */

export const MAX_ATTEMPTS = 5;

export async function enqueueReminder(
  keeper: Pick<User, 'id' | 'name' | 'email'>,
  items: readonly DueItem[],
  appUrl: string,
  organisation?: { id: number; name: string },
): Promise<MailMessage | null> {
  const sequelize = getSequelize();
  const announced = new Set(
    (
      await LampReminder.findAll({
        where: { dedupeKey: items.map((i) => i.dedupeKey) },
        attributes: ['dedupeKey'],
      })
    ).map((r) => r.dedupeKey),
  );
  const fresh = items.filter((i) => !announced.has(i.dedupeKey));
  if (fresh.length === 0) return null;
  const { subject, text } = composeReminder(keeper, fresh, appUrl, organisation?.name);
  const keys = fresh.map((i) => i.dedupeKey);
  const dedupeKey =
    keys.length === 1
      ? keys[0]!
      : `keeper:${keeper.id}:org:${organisation?.id ?? 0}:lamps:${createHash('sha256').update(keys.join('|')).digest('hex').slice(0, 40)}`;
  try {
    return await sequelize.transaction(async (transaction) => {
      const message = await MailMessage.create(
        {
          kind: 'lamp-reminder',
          toEmail: keeper.email,
          toUserId: keeper.id,
          organisationId: organisation?.id ?? null,
          subject,
          body: text,
          dedupeKey,
        },
        { transaction },
      );
      await LampReminder.bulkCreate(
        fresh.map((i) => ({
          lampId: i.lampId,
          kind: i.kind,
          dueOn: i.dueOn,
          dedupeKey: i.dedupeKey,
          mailMessageId: message.id,
        })),
        { transaction },
      );
      return message;
    });
  } catch (e) {
    // Another run announced one of these meanwhile: its message stands, this one was rolled back whole.
    if (e instanceof UniqueConstraintError) return null;
    throw e;
  }
}

export type Delivery = { sent: number; failed: number };

/** A delivery in progress longer than this is taken to have died with its process, and is retried. */
export const LEASE_MS = 10 * 60_000;

/**
 * Sends queued (and earlier failed) messages, each one on its own: a message that fails is marked
 * failed with its error and a time before which it is not tried again (back-off, up to MAX_ATTEMPTS
 * attempts), and the next message goes out. Claiming an attempt is a compare-and-set on the attempt
 * counter that leaves the row "queued with attempts > 0" while it is being sent — a state other runners
 * skip until the lease runs out — so two runners never send the same message.
 */
export async function deliverQueued(
  opts: {
    send?: (mail: Mail) => Promise<void>;
    /** Messages read per query; the loop goes on until none is left to send. */
    batch?: number;
    now?: Date;
    onFailure?: (m: MailMessage, error: unknown) => void;
    /** Only these messages (one a request has just queued), by the same claiming rules. */
    ids?: number[];
  } = {},
): Promise<Delivery> {
  const send = opts.send ?? sendMail;
  const now = opts.now ?? new Date();
  const result: Delivery = { sent: 0, failed: 0 };
  // Ids only grow: a message that fails in this pass is behind the cursor and waits for a later run.
  for (let cursor = 0; ;) {
    const rows = await MailMessage.findAll({
      where: {
        id: opts.ids ? { [Op.gt]: cursor, [Op.in]: opts.ids } : { [Op.gt]: cursor },
        [Op.or]: [
          { status: 'queued', attempts: 0 },
          {
            status: 'failed',
            attempts: { [Op.lt]: MAX_ATTEMPTS },
            [Op.or]: [{ nextAttemptAt: null }, { nextAttemptAt: { [Op.lte]: now } }],
          },
          {
            status: 'queued',
            attempts: { [Op.between]: [1, MAX_ATTEMPTS - 1] },
            updatedAt: { [Op.lt]: new Date(now.getTime() - LEASE_MS) },
          },
        ],
      },
      order: [['id', 'ASC']],
      limit: opts.batch ?? 200,
    });
    if (rows.length === 0) break;
    cursor = rows[rows.length - 1]!.id;
    await deliverRows(rows, send, now, result, opts.onFailure);
  }
  return result;
}

async function deliverRows(
  rows: MailMessage[],
  send: (mail: Mail) => Promise<void>,
  now: Date,
  result: Delivery,
  onFailure?: (m: MailMessage, error: unknown) => void,
) {
  for (const m of rows) {
    const [claimed] = await MailMessage.update(
      { attempts: m.attempts + 1, status: 'queued' },
      { where: { id: m.id, attempts: m.attempts, status: m.status } },
    );
    if (claimed !== 1) continue;
    try {
      await send({
        to: m.toEmail,
        subject: m.subject,
        text: m.body,
        tag: { kind: m.kind, organisationId: m.organisationId ?? null },
      });
      await MailMessage.update(
        { status: 'sent', sentAt: new Date(), lastError: null, nextAttemptAt: null },
        { where: { id: m.id } },
      );
      result.sent++;
    } catch (e) {
      await MailMessage.update(
        {
          status: 'failed',
          lastError: errorText(e).slice(0, 2000),
          nextAttemptAt: new Date(now.getTime() + backoffMs(m.attempts + 1)),
        },
        { where: { id: m.id } },
      );
      result.failed++;
      onFailure?.(m, e);
    }
  }
}
