import { describe, expect, it } from 'vitest';
import * as jobs from '@/app/api/organisations/[id]/jobs/route';
import { runJob } from '@/lib/jobs/runner';
import { JobRun, MailMessage, type User } from '@/models';
import { withTestDatabase } from '../helpers/db';
import { freshWorld } from '../helpers/world';
import { call } from './http';

// The owner's view of the background jobs: who may read it, and that it shows the runs with only this
// organisation's share, and only this organisation's failures.
withTestDatabase();

const world = freshWorld();

const list = (as: User | null, organisationId = world.shop.id) =>
  call(jobs.GET, { path: `/api/organisations/${organisationId}/jobs`, params: { id: organisationId }, as });

/** A run that sends two messages for the shop, one for the other shop, and fails one unit of each. */
async function plantedRun() {
  return runJob({
    name: 'lamp-reminders',
    everyMs: 3_600_000,
    run: async (ctx) => {
      ctx.count('e-mails sent', 2, world.shop.id);
      ctx.count('e-mails sent', 1, world.otherOrg.id);
      for (const org of [world.shop, world.otherOrg]) {
        await ctx.unit(
          {
            key: `keeper:${org.id}`,
            label: `Lamp reminder for ${org.name}'s keeper`,
            organisationId: org.id,
          },
          async () => {
            throw new Error(`planted failure in ${org.name}\nsql: INSERT INTO mail_messages VALUES ('x')`);
          },
        );
      }
    },
  });
}

describe('GET /api/organisations/:id/jobs', () => {
  it('is the owner’s: nobody signed in 401, staff, keepers and another organisation’s owner 404', async () => {
    await plantedRun();
    expect((await list(null)).status).toBe(401);
    for (const who of [world.staff, world.keeper, world.outsider]) {
      const r = await list(who);
      expect(r.status).toBe(404);
      expect(r.text).not.toContain('planted');
    }
    expect((await list(world.owner)).status).toBe(200);
  });

  it('shows the runs with this organisation’s counts and only this organisation’s failures', async () => {
    const report = await plantedRun();
    await MailMessage.bulkCreate([
      {
        kind: 'lamp-reminder',
        toEmail: 'ann@example.com',
        toUserId: null,
        organisationId: world.shop.id,
        subject: 'S',
        body: 'B',
        dedupeKey: 'k1',
        status: 'failed',
        attempts: 5,
        lastError: 'mailbox full',
      },
      {
        kind: 'lamp-reminder',
        toEmail: 'bob@example.com',
        toUserId: null,
        organisationId: world.otherOrg.id,
        subject: 'S',
        body: 'B',
        dedupeKey: 'k2',
        status: 'failed',
        attempts: 1,
        lastError: 'refused',
      },
      {
        kind: 'lamp-reminder',
        toEmail: 'cy@example.com',
        toUserId: null,
        organisationId: world.shop.id,
        subject: 'S',
        body: 'B',
        dedupeKey: 'k3',
        status: 'sent',
        attempts: 1,
      },
    ]);
    const r = await list(world.owner);
    expect(r.status).toBe(200);
    const run = (await JobRun.findOne())!;
    expect(r.body.runs).toEqual([
      {
        id: run.id,
        job: 'lamp-reminders',
        startedAt: run.startedAt.toISOString(),
        finishedAt: run.finishedAt!.toISOString(),
        ms: run.finishedAt!.getTime() - run.startedAt.getTime(),
        outcome: 'partial',
        // The shop's share: 2 sent and 1 failed unit, not the run's 3 and 2.
        counts: { 'e-mails sent': 2, 'units failed': 1 },
      },
    ]);
    expect('counts' in report && report.counts).toEqual({ 'e-mails sent': 3, 'units failed': 2 });
    expect(r.body.failures).toEqual([
      expect.objectContaining({
        key: `keeper:${world.shop.id}`,
        label: `Lamp reminder for ${world.shop.name}'s keeper`,
        attempts: 1,
        lastError: `planted failure in ${world.shop.name}`,
      }),
    ]);
    expect(r.body.undelivered).toEqual([
      expect.objectContaining({
        to: 'ann@example.com',
        attempts: 5,
        lastError: 'mailbox full',
        nextAttemptAt: null,
      }),
    ]);
    expect(r.text).not.toContain(world.otherOrg.name);
    expect(r.text).not.toContain('INSERT INTO');
    expect(r.text).not.toContain('bob@example.com');

    // The other organisation's owner sees their own share and failure.
    const theirs = await list(world.outsider, world.otherOrg.id);
    expect(theirs.body.runs[0].counts).toEqual({ 'e-mails sent': 1, 'units failed': 1 });
    expect(theirs.body.failures.map((f: { key: string }) => f.key)).toEqual([`keeper:${world.otherOrg.id}`]);
  });

  it('tells a run that stopped without showing its error', async () => {
    await runJob({
      name: 'lamp-reminders',
      everyMs: 3_600_000,
      run: async () => {
        throw new Error('secret internals of another organisation');
      },
    });
    const r = await list(world.owner);
    expect(r.body.runs[0]).toMatchObject({ outcome: 'failed', counts: {} });
    expect(r.text).not.toContain('secret internals');
  });
});
