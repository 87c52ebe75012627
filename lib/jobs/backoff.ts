/**
 * How long a failed unit of work (a message, a lamp) waits before its next attempt: five minutes, then
 * four times longer each attempt, at most a day — a passing outage is retried soon, a lasting fault
 * does not fill the log every hour.
 */
export function backoffMs(attempts: number): number {
  return Math.min(5 * 60_000 * 4 ** Math.max(0, attempts - 1), 24 * 3_600_000);
}
