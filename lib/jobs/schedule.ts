import type { Logger } from 'pino';
import { errorText, logger } from '@/lib/log';
import { lastRuns, runJob, type Job } from './runner';

/**
 * The job process's clock: every tick, each job whose last run started longer ago than its interval
 * is started (unless this process is still running it). The decision reads `job_runs`, so several
 * job processes (one per app instance) share one schedule: the first to start a run takes the lock and
 * records it, and the others see the fresh run and wait for the next interval.
 */
export function dueJobs(
  jobs: readonly Job[],
  last: Map<string, { lastStartedAt: Date | null }>,
  now: Date,
): Job[] {
  return jobs.filter((j) => {
    if (!(j.everyMs > 0)) return false;
    const started = last.get(j.name)?.lastStartedAt;
    return !started || now.getTime() - started.getTime() >= j.everyMs;
  });
}

export type Scheduler = { stop: () => Promise<void>; tick: () => Promise<void> };

export function startScheduler(
  jobs: readonly Job[],
  opts: { tickMs?: number; log?: Logger } = {},
): Scheduler {
  const log = opts.log ?? logger();
  const running = new Map<string, Promise<unknown>>();
  let stopped = false;
  const tick = async () => {
    if (stopped) return;
    try {
      const last = await lastRuns(jobs.map((j) => j.name));
      for (const job of dueJobs(jobs, last, new Date())) {
        if (running.has(job.name)) continue;
        const p = runJob(job, { log })
          .catch((e) => log.error({ job: job.name, err: e, error: errorText(e) }, 'job could not start'))
          .finally(() => running.delete(job.name));
        running.set(job.name, p);
      }
    } catch (e) {
      // Typically the database is down; the next tick tries again.
      log.error({ err: e }, 'scheduler tick failed');
    }
  };
  const timer = setInterval(() => void tick(), opts.tickMs ?? 60_000);
  void tick();
  return {
    tick,
    stop: async () => {
      stopped = true;
      clearInterval(timer);
      await Promise.allSettled(running.values());
    },
  };
}
