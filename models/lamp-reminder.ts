import { dateOnly, id, oneOf, ref, string, table, timestamps } from './columns';

export const REMINDER_KINDS = ['test', 'replace'] as const;
export type ReminderKind = (typeof REMINDER_KINDS)[number];

/**
 * "This lamp's due date was announced": one row per (lamp, kind, due date), unique, written in the same
 * transaction as the outbox message that announces it. One e-mail groups a keeper's due lamps, so the
 * per-lamp "never twice for the same due date" lives here rather than in the message's own key.
 */
export class LampReminder extends table('lamp_reminders', {
  id: id(),
  lampId: ref(),
  kind: oneOf(REMINDER_KINDS),
  dueOn: dateOnly(),
  /** `lamp:<id>:due:<date>:<kind>` — the same key shown in the message, for tracing. */
  dedupeKey: string(191).unique(),
  mailMessageId: ref(),
  ...timestamps(),
}) {}
