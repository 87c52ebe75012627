import { runReminders } from './run';

/**
 * Runs the reminder job inside the app server on an interval (REMINDERS_INTERVAL_MINUTES, default 60;
 * 0 turns it off). A run never overlaps the previous one; errors are logged and the next run retries.
 * Several app servers may run it at once: the outbox's unique keys keep every due date to one e-mail.
 */
type Holder = { timer?: ReturnType<typeof setInterval>; running?: boolean };
const holder = globalThis as unknown as { __baskwellReminders?: Holder };

export function startReminderSchedule(): void {
  holder.__baskwellReminders ??= {};
  const h = holder.__baskwellReminders;
  if (h.timer) return;
  const minutes = Number(process.env.REMINDERS_INTERVAL_MINUTES ?? 60);
  if (!Number.isFinite(minutes) || minutes <= 0) return;
  const tick = async () => {
    if (h.running) return;
    h.running = true;
    try {
      const r = await runReminders();
      if (r.queued || r.sent || r.failed) {
        console.log(
          `reminders: ${r.due} due, ${r.queued} e-mails queued, ${r.sent} sent, ${r.failed} failed`,
        );
      }
    } catch (e) {
      console.error('reminders: run failed, will retry', e instanceof Error ? e.message : e);
    } finally {
      h.running = false;
    }
  };
  // The first run waits a little so it does not compete with start-up (migrations, seeding).
  setTimeout(() => void tick(), 30_000).unref();
  h.timer = setInterval(() => void tick(), minutes * 60_000);
  h.timer.unref();
}
