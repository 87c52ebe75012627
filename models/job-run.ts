import { date, id, oneOf, ref, string, table, text, timestamps, unsigned } from './columns';

export const JOB_OUTCOMES = ['running', 'succeeded', 'partial', 'failed', 'abandoned'] as const;
/**
 * `partial`: the run finished but some units of work failed (they are retried later); `failed`: the run
 * itself stopped with an error; `abandoned`: its process died while running (found by the next run).
 */
export type JobOutcome = (typeof JOB_OUTCOMES)[number];

export type JobCounts = Record<string, number>;

/** Counts as stored (JSON text); an unreadable value reads as no counts rather than failing a page. */
export function parseCounts(json: string): JobCounts {
  try {
    const v = JSON.parse(json) as unknown;
    if (!v || typeof v !== 'object' || Array.isArray(v)) return {};
    return Object.fromEntries(Object.entries(v).filter(([, n]) => typeof n === 'number')) as JobCounts;
  } catch {
    return {};
  }
}

/** One run of a background job (lib/jobs). */
export class JobRun extends table('job_runs', {
  id: id(),
  job: string(60),
  startedAt: date(3),
  finishedAt: date(3).nullable(),
  outcome: oneOf(JOB_OUTCOMES),
  countsJson: text(),
  error: text().nullable(),
  /** Which machine and process ran it, for reading the logs. */
  host: string(120),
  ...timestamps(),
}) {}

/** A run's counts for one organisation: what an owner may see of a run that served everyone. */
export class JobRunCount extends table('job_run_counts', {
  id: id(),
  jobRunId: ref(),
  organisationId: ref(),
  countsJson: text(),
  ...timestamps(),
}) {}

/**
 * A unit of work that failed (one keeper's message, one lamp's due state): kept until it succeeds, and
 * not tried again before `nextAttemptAt` (back-off), so one bad unit neither stops a run nor is hammered.
 */
export class JobUnit extends table('job_units', {
  id: id(),
  job: string(60),
  unitKey: string(160),
  organisationId: ref().nullable(),
  /** What the unit is, in words an owner understands ("Reminder e-mail to Ann Example"). */
  label: string(250),
  attempts: unsigned(),
  nextAttemptAt: date(3),
  lastError: text(),
  lastRunId: ref().nullable(),
  ...timestamps(),
}) {}
