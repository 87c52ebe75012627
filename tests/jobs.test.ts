import { describe, expect, it } from 'vitest';
import { config } from '@/lib/config';
import { getSequelize } from '@/lib/db';
import { backoffMs } from '@/lib/jobs/backoff';
import { lockName, withNamedLock } from '@/lib/jobs/lock';
import { KEEP_RUNS_DAYS, lastRuns, runJob, type Job } from '@/lib/jobs/runner';
import { dueJobs } from '@/lib/jobs/schedule';
import { JobRun, JobRunCount, JobUnit, parseCounts } from '@/models';
import { createOrganisation, withTestDatabase } from './helpers/db';

// The job runner against the real test database: units of work fail alone and wait out a back-off,
// runs are recorded, and the database lock lets one run of a job happen at a time.
withTestDatabase();

const at = (minutes: number) => new Date(Date.UTC(2026, 2, 1, 12, minutes));

/** A job over the units a, b and c; `broken` lists the ones that throw; `done` records what ran. */
function lettersJob(broken: Set<string>, done: string[], organisationId?: number): Job {
  return {
    name: 'test-letters',
    everyMs: 60_000,
    run: async (ctx) => {
      for (const letter of ['a', 'b', 'c']) {
        const r = await ctx.unit(
          { key: `letter:${letter}`, label: `Letter ${letter}`, organisationId },
          async () => {
            if (broken.has(letter)) throw new Error(`letter ${letter} is broken (planted)`);
            done.push(letter);
            return letter;
          },
        );
        if (r.ok) ctx.count('letters', 1, organisationId);
      }
    },
  };
}

describe('job runner', () => {
  it('records a run with its outcome and counts, overall and per organisation', async () => {
    const org = await createOrganisation();
    const done: string[] = [];
    const r = await runJob(lettersJob(new Set(), done, org.id), { now: at(0) });
    expect(r).toMatchObject({ outcome: 'succeeded', counts: { letters: 3 }, error: null });
    expect(done).toEqual(['a', 'b', 'c']);
    const run = (await JobRun.findOne())!;
    expect(run).toMatchObject({ job: 'test-letters', outcome: 'succeeded', error: null });
    expect(run.finishedAt!.getTime()).toBeGreaterThanOrEqual(run.startedAt.getTime());
    expect(parseCounts(run.countsJson)).toEqual({ letters: 3 });
    const mine = (await JobRunCount.findOne({ where: { jobRunId: run.id } }))!;
    expect(mine.organisationId).toBe(org.id);
    expect(parseCounts(mine.countsJson)).toEqual({ letters: 3 });
  });

  it('lets a planted failing unit fail alone, records it, and retries it only after its back-off', async () => {
    const org = await createOrganisation();
    const done: string[] = [];
    const first = await runJob(lettersJob(new Set(['b']), done, org.id), { now: at(0) });
    // a and c, on either side of the broken b, went through.
    expect(done).toEqual(['a', 'c']);
    expect(first).toMatchObject({ outcome: 'partial', counts: { letters: 2, 'units failed': 1 } });
    const unit = (await JobUnit.findOne({ where: { job: 'test-letters' } }))!;
    expect(unit).toMatchObject({
      unitKey: 'letter:b',
      label: 'Letter b',
      organisationId: org.id,
      attempts: 1,
      lastError: 'letter b is broken (planted)',
    });
    expect(unit.nextAttemptAt.getTime()).toBe(at(0).getTime() + backoffMs(1));

    // Within the back-off: b is not tried again (even were it fixed), the others run.
    done.length = 0;
    const soon = await runJob(lettersJob(new Set(), done, org.id), { now: at(3) });
    expect(done).toEqual(['a', 'c']);
    expect(soon).toMatchObject({ outcome: 'succeeded', counts: { 'units deferred': 1 } });

    // After it, still broken: the second attempt waits four times longer.
    done.length = 0;
    await runJob(lettersJob(new Set(['b']), done, org.id), { now: at(6) });
    await unit.reload();
    expect(unit.attempts).toBe(2);
    expect(unit.nextAttemptAt.getTime()).toBe(at(6).getTime() + backoffMs(2));
    expect(backoffMs(2)).toBe(4 * backoffMs(1));

    // Fixed and due again: b goes through and its failure record goes.
    done.length = 0;
    const later = await runJob(lettersJob(new Set(), done, org.id), { now: at(30) });
    expect(done).toEqual(['a', 'b', 'c']);
    expect(later).toMatchObject({ outcome: 'succeeded' });
    expect(await JobUnit.count()).toBe(0);
  });

  it('records a run that throws as failed, with the error, and stops nothing else', async () => {
    const r = await runJob({
      name: 'test-broken',
      everyMs: 60_000,
      run: async (ctx) => {
        ctx.count('before', 1);
        throw new Error('the whole job broke (planted)');
      },
    });
    expect(r).toMatchObject({
      outcome: 'failed',
      error: 'the whole job broke (planted)',
      counts: { before: 1 },
    });
    expect(await JobRun.findOne({ where: { job: 'test-broken' } })).toMatchObject({
      outcome: 'failed',
      error: 'the whole job broke (planted)',
    });
  });

  it('runs a job once at a time: a second run while one holds the lock is skipped, and not recorded', async () => {
    let release!: () => void;
    const gate = new Promise<void>((r) => (release = r));
    let started!: () => void;
    const running = new Promise<void>((r) => (started = r));
    const slow: Job = {
      name: 'test-slow',
      everyMs: 60_000,
      run: async (ctx) => {
        started();
        await gate;
        ctx.count('done', 1);
      },
    };
    const first = runJob(slow);
    await running;
    const second = await runJob(slow);
    expect(second).toEqual({ skipped: 'locked', job: 'test-slow' });
    release();
    expect(await first).toMatchObject({ outcome: 'succeeded', counts: { done: 1 } });
    expect(await JobRun.count({ where: { job: 'test-slow' } })).toBe(1);
  });

  it('skips while another connection (another app instance) holds the lock, and runs once it is released', async () => {
    const name = lockName(config().DB_NAME, 'test-letters');
    let ran = 0;
    const job: Job = { name: 'test-letters', everyMs: 60_000, run: async () => void ran++ };
    const held = await withNamedLock(getSequelize(), name, async () => runJob(job));
    expect(held).toEqual({ locked: false, value: { skipped: 'locked', job: 'test-letters' } });
    expect(ran).toBe(0);
    expect(await runJob(job)).toMatchObject({ outcome: 'succeeded' });
    expect(ran).toBe(1);
  });

  it('marks a run left "running" by a dead process as abandoned', async () => {
    const dead = await JobRun.create({
      job: 'test-letters',
      startedAt: new Date(Date.now() - 60_000),
      outcome: 'running',
      countsJson: '{}',
      host: 'gone:1',
    });
    await runJob(lettersJob(new Set(), []));
    await dead.reload();
    expect(dead.outcome).toBe('abandoned');
    expect(dead.finishedAt).not.toBeNull();
  });

  it('keeps lock names per database and within MariaDB’s 64 characters', () => {
    expect(lockName('baskwell', 'lamp-reminders')).toBe('baskwell.baskwell.job.lamp-reminders');
    expect(lockName('baskwell_test', 'x')).not.toBe(lockName('baskwell', 'x'));
    expect(lockName('a_very_long_database_name_indeed', 'an-equally-long-job-name-for-a-test')).toHaveLength(
      53,
    );
  });

  it('deletes runs older than it keeps, and only of the job that ran', async () => {
    const old = new Date(Date.now() - (KEEP_RUNS_DAYS + 1) * 86_400_000);
    const recent = new Date(Date.now() - (KEEP_RUNS_DAYS - 1) * 86_400_000);
    const row = (job: string, startedAt: Date) =>
      JobRun.create({ job, startedAt, outcome: 'succeeded', countsJson: '{}', host: 'x' });
    const [gone, kept, other] = [
      await row('test-letters', old),
      await row('test-letters', recent),
      await row('other', old),
    ];
    await runJob(lettersJob(new Set(), []));
    expect(await JobRun.findByPk(gone.id)).toBeNull();
    expect(await JobRun.findByPk(kept.id)).not.toBeNull();
    expect(await JobRun.findByPk(other.id)).not.toBeNull();
  });
});

describe('schedule', () => {
  const job = (name: string, everyMs: number): Job => ({ name, everyMs, run: async () => undefined });

  it('starts a job never run, or last started longer ago than its interval; never one turned off', () => {
    const jobs = [job('never', 60_000), job('recent', 3_600_000), job('old', 3_600_000), job('off', 0)];
    const last = new Map([
      ['recent', { lastStartedAt: at(30) }],
      ['old', { lastStartedAt: at(0) }],
    ]);
    expect(dueJobs(jobs, last, at(60)).map((j) => j.name)).toEqual(['never', 'old']);
  });

  it('reads when each job last started and last succeeded, ignoring abandoned runs', async () => {
    await runJob(lettersJob(new Set(['b']), []), { now: at(0) });
    await JobRun.create({
      job: 'test-letters',
      startedAt: new Date(Date.now() + 60_000),
      outcome: 'abandoned',
      countsJson: '{}',
      host: 'x',
    });
    const runs = await lastRuns(['test-letters', 'never-ran']);
    const partial = (await JobRun.findOne({ where: { outcome: 'partial' } }))!;
    expect(runs.get('test-letters')).toEqual({
      lastStartedAt: partial.startedAt,
      lastOutcome: 'partial',
      lastSucceededAt: null,
    });
    expect(runs.get('never-ran')).toEqual({ lastStartedAt: null, lastOutcome: null, lastSucceededAt: null });
  });
});
