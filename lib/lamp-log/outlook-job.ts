import type { Job } from '@/lib/jobs/runner';
import { refreshStaleOutlooks } from './stored-outlooks';

export const OUTLOOK_JOB = 'lamp-outlooks';

/**
 * Keeps stored lamp outlooks current: carries every lamp over to the new day soon after midnight UTC
 * (a "test soon" becomes due as dates pass, ages grow) and catches up rows a migration, a crash or a
 * failed recompute left out of date. Writes already recompute the lamps they touch; this finds the rest
 * with one query. Every OUTLOOK_REFRESH_MINUTES (default 15; 0 turns it off). Safe beside a write's own
 * recompute or another run: a row is only ever replaced by a newer computation.
 */
export const outlookJob: Job = {
  name: OUTLOOK_JOB,
  title: 'Lamp outlooks',
  everyMs: Number(process.env.OUTLOOK_REFRESH_MINUTES ?? 15) * 60_000,
  run: async (ctx) => {
    ctx.count('lamps brought up to date', await refreshStaleOutlooks());
  },
};
