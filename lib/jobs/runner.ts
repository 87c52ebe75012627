import 'server-only';
import { hostname } from 'node:os';
import type { Logger } from 'pino';
import { Op } from 'sequelize';
import { config } from '@/lib/config';
import { getSequelize } from '@/lib/db';
import { errorText, logger } from '@/lib/log';
import { JobRun, JobRunCount, JobUnit, type JobCounts, type JobOutcome } from '@/models';
import { backoffMs } from './backoff';
import { lockName, withNamedLock } from './lock';

/**
 * The one runner of background work. A job is a name, an interval and a function; a run of it
 *   - holds the job's database lock (two instances never run it at once; the second one skips),
 *   - is recorded in `job_runs` (start, end, outcome, counts, the error that stopped it),
 *   - does its work in units (`ctx.unit`): a unit that throws is recorded in `job_units` with its error
 *     and retried with back-off on later runs, and the run goes on with the next unit.
 * No package fits here: the maintained queues need Redis, PostgreSQL or MongoDB, and the schedulers
 * (cron-style) neither lock across instances nor keep a record of runs.
 */

export type UnitSpec = {
  /** Stable across runs, e.g. `keeper:12:message`, so a failure is found again on the next run. */
  key: string;
  /** Shown to the owner: what failed, in their words. */
  label: string;
  organisationId?: number | null;
};

export type UnitResult<T> = { ok: true; value: T } | { ok: false; deferred: boolean; error?: string };

export type JobContext = {
  runId: number;
  job: string;
  now: Date;
  log: Logger;
  /** Adds to a count of this run (and to the organisation's share of it when one is given). */
  count: (name: string, n?: number, organisationId?: number | null) => void;
  /**
   * Runs one unit of work, isolated: an error is recorded (with back-off) and returned, never thrown. A
   * unit still waiting out its back-off is not run (`deferred`).
   */
  unit: <T>(spec: UnitSpec, fn: () => Promise<T>) => Promise<UnitResult<T>>;
  /** Whether a unit is waiting out its back-off (for work done in bulk, outside `unit`). */
  isDeferred: (key: string) => boolean;
  /** Marks a unit done in bulk as succeeded: its failure record, if any, goes. */
  succeeded: (key: string) => Promise<void>;
};

export type Job = {
  name: string;
  /** What the owner's page calls it ("Lamp reminders"); the name when left out. */
  title?: string;
  /** How often it should run; the scheduler starts it when its last run started longer ago than this. */
  everyMs: number;
  run: (ctx: JobContext) => Promise<void>;
};

export type RunReport = {
  runId: number;
  job: string;
  outcome: Exclude<JobOutcome, 'running' | 'abandoned'>;
  counts: JobCounts;
  error: string | null;
  ms: number;
};

const HOST = `${hostname()}:${process.pid}`.slice(0, 120);
const ERROR_CHARS = 2000;

/** Runs `job` once, unless another run of it holds the lock (then `{ skipped: 'locked' }`). */
export async function runJob(
  job: Job,
  opts: { now?: Date; log?: Logger } = {},
): Promise<RunReport | { skipped: 'locked'; job: string }> {
  const sequelize = getSequelize();
  const result = await withNamedLock(sequelize, lockName(config().DB_NAME, job.name), () =>
    runLocked(job, opts.now ?? new Date(), opts.log ?? logger()),
  );
  if (result.locked) {
    (opts.log ?? logger()).info({ job: job.name }, 'job already running elsewhere; skipped');
    return { skipped: 'locked', job: job.name };
  }
  return result.value;
}

async function runLocked(job: Job, now: Date, baseLog: Logger): Promise<RunReport> {
  const started = Date.now();
  // Holding the lock, no other run of this job is alive: one still marked running died with its process.
  await JobRun.update(
    { outcome: 'abandoned', finishedAt: new Date() },
    { where: { job: job.name, outcome: 'running' } },
  );
  const run = await JobRun.create({
    job: job.name,
    startedAt: new Date(),
    outcome: 'running',
    countsJson: '{}',
    host: HOST,
  });
  const log = baseLog.child({ job: job.name, jobId: `${job.name}#${run.id}`, runId: run.id });
  log.info('job run started');

  const counts: JobCounts = {};
  const byOrganisation = new Map<number, JobCounts>();
  const add = (into: JobCounts, name: string, n: number) => (into[name] = (into[name] ?? 0) + n);
  const count = (name: string, n = 1, organisationId?: number | null) => {
    add(counts, name, n);
    if (organisationId) {
      const mine =
        byOrganisation.get(organisationId) ?? byOrganisation.set(organisationId, {}).get(organisationId)!;
      add(mine, name, n);
    }
  };
  // Every unit that failed before, loaded once: most runs have none, and checking each unit against
  // the database would cost a query per lamp.
  const failing = new Map(
    (await JobUnit.findAll({ where: { job: job.name } })).map((u) => [u.unitKey, u] as const),
  );
  const isDeferred = (key: string) => (failing.get(key)?.nextAttemptAt.getTime() ?? 0) > now.getTime();
  const succeeded = async (key: string) => {
    const known = failing.get(key);
    if (!known) return;
    failing.delete(key);
    await JobUnit.destroy({ where: { id: known.id } });
  };

  const unit = async <T>(spec: UnitSpec, fn: () => Promise<T>): Promise<UnitResult<T>> => {
    if (isDeferred(spec.key)) {
      count('units deferred', 1, spec.organisationId);
      return { ok: false, deferred: true };
    }
    try {
      const value = await fn();
      await succeeded(spec.key);
      return { ok: true, value };
    } catch (e) {
      const error = errorText(e).slice(0, ERROR_CHARS);
      count('units failed', 1, spec.organisationId);
      const before = failing.get(spec.key);
      const attempts = (before?.attempts ?? 0) + 1;
      log.warn({ unit: spec.key, attempts, err: e }, 'unit of work failed; will retry');
      try {
        const fields = {
          job: job.name,
          unitKey: spec.key,
          organisationId: spec.organisationId ?? null,
          label: spec.label.slice(0, 250),
          attempts,
          nextAttemptAt: new Date(now.getTime() + backoffMs(attempts)),
          lastError: error,
          lastRunId: run.id,
        };
        if (before) await before.update(fields);
        else failing.set(spec.key, await JobUnit.create(fields));
      } catch (recordError) {
        // The failure could not be recorded (the database is failing too): the run's outcome says so.
        log.error({ unit: spec.key, err: recordError }, 'could not record a failed unit');
      }
      return { ok: false, deferred: false, error };
    }
  };

  let outcome: RunReport['outcome'] = 'succeeded';
  let error: string | null = null;
  try {
    await job.run({ runId: run.id, job: job.name, now, log, count, unit, isDeferred, succeeded });
    if (counts['units failed']) outcome = 'partial';
  } catch (e) {
    outcome = 'failed';
    error = errorText(e).slice(0, ERROR_CHARS);
    log.error({ err: e }, 'job run failed');
  }
  const ms = Date.now() - started;
  try {
    await JobRun.update(
      { outcome, finishedAt: new Date(), countsJson: JSON.stringify(counts), error },
      { where: { id: run.id } },
    );
    if (byOrganisation.size > 0) {
      await JobRunCount.bulkCreate(
        [...byOrganisation].map(([organisationId, c]) => ({
          jobRunId: run.id,
          organisationId,
          countsJson: JSON.stringify(c),
        })),
      );
    }
  } catch (e) {
    // Left "running"; the next run marks it abandoned. The log still has the outcome.
    log.error({ err: e }, 'could not record the end of a job run');
  }
  await JobRun.destroy({
    where: { job: job.name, startedAt: { [Op.lt]: new Date(Date.now() - KEEP_RUNS_DAYS * 86_400_000) } },
  }).catch((e: unknown) => log.warn({ err: e }, 'could not delete old runs'));
  log.info({ outcome, counts, ms }, 'job run finished');
  return { runId: run.id, job: job.name, outcome, counts, error, ms };
}

export type LastRuns = Map<
  string,
  { lastStartedAt: Date | null; lastOutcome: JobOutcome | null; lastSucceededAt: Date | null }
>;

/** When each job last started (and how that run ended), and last succeeded: for the scheduler and health. */
export async function lastRuns(jobs: readonly string[]): Promise<LastRuns> {
  const out: LastRuns = new Map();
  for (const job of jobs) {
    const [started, succeeded] = await Promise.all([
      JobRun.findOne({
        where: { job, outcome: { [Op.ne]: 'abandoned' } },
        order: [['startedAt', 'DESC']],
        attributes: ['startedAt', 'outcome'],
      }),
      JobRun.findOne({
        where: { job, outcome: 'succeeded' },
        order: [['finishedAt', 'DESC']],
        attributes: ['finishedAt'],
      }),
    ]);
    out.set(job, {
      lastStartedAt: started?.startedAt ?? null,
      lastOutcome: started?.outcome ?? null,
      lastSucceededAt: succeeded?.finishedAt ?? null,
    });
  }
  return out;
}

/** Runs older than this are deleted after each run of their job: the page shows recent ones. */
export const KEEP_RUNS_DAYS = 90;
