import { counterReminderJob } from '@/lib/counter/reminders';
import { outlookJob } from '@/lib/lamp-log/outlook-job';
import { reminderJob } from '@/lib/reminders/run';
import type { Job } from './runner';

/**
 * Every background job the runner schedules (scripts/jobs.ts) and `/api/health` reports on. Adding a
 * job is one line here: `{ name, everyMs, run: (ctx) => … }`, doing its work in `ctx.unit`s.
 */
export const JOBS: readonly Job[] = [outlookJob, reminderJob, counterReminderJob];

export const jobNamed = (name: string) => JOBS.find((j) => j.name === name);

export const jobTitle = (name: string) => jobNamed(name)?.title ?? name;
