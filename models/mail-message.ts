import { date, id, oneOf, ref, string, table, text, timestamps, unsigned } from './columns';

export const MAIL_STATUSES = ['queued', 'sent', 'failed'] as const;
export type MailStatus = (typeof MAIL_STATUSES)[number];

/**
 * The outbox: every e-mail the product sends is first written here (in the same transaction as the
 * decision to send it), then delivered. `dedupeKey` is unique, so the same message can never be queued
 * twice; a failed delivery keeps its attempts and last error and is retried on the next run.
 */
export class MailMessage extends table('mail_messages', {
  id: id(),
  kind: string(40),
  toEmail: string(254),
  toUserId: ref().nullable(),
  /** The organisation the message concerns (its owner sees undelivered ones); null for sign-up mail. */
  organisationId: ref().nullable(),
  subject: string(250),
  // MEDIUMTEXT: room for any message the composers write (theirs are bounded far below it).
  body: text('medium'),
  dedupeKey: string(191).unique(),
  status: oneOf(MAIL_STATUSES).defaultsTo('queued'),
  attempts: unsigned().defaultsTo(0),
  lastError: text().nullable(),
  sentAt: date().nullable(),
  /** A failed delivery is not retried before this (back-off); null: as soon as possible. */
  nextAttemptAt: date(3).nullable(),
  ...timestamps(),
}) {}
