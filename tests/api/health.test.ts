import { afterEach, describe, expect, it } from 'vitest';
import * as health from '@/app/api/health/route';
import { forgetJobsHealth } from '@/lib/jobs/health';
import { JOBS } from '@/lib/jobs/registry';
import { runReminders } from '@/lib/reminders/run';
import { JobRun } from '@/models';
import { withTestDatabase } from '../helpers/db';
import { call } from './http';

withTestDatabase();
afterEach(forgetJobsHealth);

const get = () => call(health.GET, { path: '/api/health' });
const reminders = (body: { jobs: { name: string }[] }) => body.jobs.find((j) => j.name === 'lamp-reminders');

describe('GET /api/health', () => {
  it('reports the database and every job, none of which has run yet', async () => {
    const r = await get();
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ ok: true, database: 'up' });
    expect(r.body.jobs.map((j: { name: string }) => j.name)).toEqual(JOBS.map((j) => j.name));
    expect(reminders(r.body)).toEqual({
      name: 'lamp-reminders',
      everyMinutes: 60,
      lastStartedAt: null,
      lastOutcome: null,
      lastSucceededAt: null,
      late: false,
    });
    expect(r.res.headers.get('x-request-id')).toMatch(/^[0-9a-f-]{36}$/);
  });

  it('reports the last successful run of each job, and a job whose runs fail as late', async () => {
    const run = await runReminders({ send: async () => undefined });
    const finished = (await JobRun.findByPk(run.runId!))!.finishedAt!.toISOString();
    forgetJobsHealth();
    expect(reminders((await get()).body)).toMatchObject({
      lastOutcome: 'succeeded',
      lastSucceededAt: finished,
      late: false,
    });

    await JobRun.create({
      job: 'lamp-reminders',
      startedAt: new Date(Date.now() + 1000),
      finishedAt: new Date(Date.now() + 2000),
      outcome: 'failed',
      countsJson: '{}',
      error: 'planted',
      host: 'test',
    });
    await JobRun.update({ finishedAt: new Date(Date.now() - 3 * 3_600_000) }, { where: { id: run.runId! } });
    forgetJobsHealth();
    expect(reminders((await get()).body)).toMatchObject({ lastOutcome: 'failed', late: true });
  });

  it('keeps a request id the caller sent', async () => {
    const r = await call(health.GET, { path: '/api/health', headers: { 'x-request-id': 'probe-1234-abcd' } });
    expect(r.res.headers.get('x-request-id')).toBe('probe-1234-abcd');
  });
});
