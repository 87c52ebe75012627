import { JOBS } from './registry';
import { lastRuns } from './runner';

export type JobHealth = {
  name: string;
  everyMinutes: number;
  lastStartedAt: string | null;
  lastOutcome: string | null;
  lastSucceededAt: string | null;
  /** The last success is more than two intervals old, or the job has run but never succeeded. */
  late: boolean;
};

// The figures change at most every few minutes; reading them at most every 10 s keeps a probe that
// hits /api/health many times a second at one cheap query.
const TTL_MS = 10_000;
let cached: { at: number; jobs: JobHealth[] } | null = null;

/** Each registered job's last start, that run's outcome and its last success, for /api/health. */
export async function jobsHealth(now = Date.now()): Promise<JobHealth[]> {
  if (cached && now - cached.at >= 0 && now - cached.at < TTL_MS) return cached.jobs;
  const last = await lastRuns(JOBS.map((j) => j.name));
  const jobs = JOBS.map((j) => {
    const l = last.get(j.name)!;
    const success = l.lastSucceededAt?.getTime();
    return {
      name: j.name,
      everyMinutes: Math.round(j.everyMs / 60_000),
      lastStartedAt: l.lastStartedAt?.toISOString() ?? null,
      lastOutcome: l.lastOutcome,
      lastSucceededAt: l.lastSucceededAt?.toISOString() ?? null,
      late: j.everyMs > 0 && (success ? now - success > 2 * j.everyMs : l.lastStartedAt !== null),
    };
  });
  cached = { at: now, jobs };
  return jobs;
}

/** Forgets the memo (tests). */
export function forgetJobsHealth(): void {
  cached = null;
}
