import 'server-only';
import { Op } from 'sequelize';
import { MAX_ATTEMPTS } from '@/lib/reminders/outbox';
import { JobRun, JobRunCount, JobUnit, MailMessage, parseCounts, type JobCounts } from '@/models';

/**
 * What an organisation's owner sees of the background jobs: the recent runs (when, how long, how they
 * ended) with this organisation's share of each run's counts, the units of work of this organisation
 * that are failing, and its e-mail that could not be delivered. A run serves every organisation, so
 * its overall counts and the error that stopped it (which may concern anyone) stay in the server's log
 * and table; the owner is told the run stopped and under which number to ask about it.
 */
export type RunView = {
  id: number;
  job: string;
  startedAt: string;
  finishedAt: string | null;
  ms: number | null;
  outcome: string;
  counts: JobCounts;
};
export type FailureView = {
  key: string;
  job: string;
  label: string;
  attempts: number;
  lastError: string;
  lastFailedAt: string;
  nextAttemptAt: string;
};
export type UndeliveredView = {
  id: number;
  to: string;
  subject: string;
  attempts: number;
  lastError: string | null;
  lastTriedAt: string;
  /** null: given up after MAX_ATTEMPTS attempts. */
  nextAttemptAt: string | null;
};

export async function jobsOverview(
  organisationId: number,
  { runs: runLimit = 30, failures: failureLimit = 50 } = {},
): Promise<{ runs: RunView[]; failures: FailureView[]; undelivered: UndeliveredView[] }> {
  const [runs, failures, undelivered] = await Promise.all([
    JobRun.findAll({
      order: [
        ['startedAt', 'DESC'],
        ['id', 'DESC'],
      ],
      limit: runLimit,
    }),
    JobUnit.findAll({ where: { organisationId }, order: [['updatedAt', 'DESC']], limit: failureLimit }),
    MailMessage.findAll({
      where: { organisationId, status: 'failed' },
      order: [['updatedAt', 'DESC']],
      limit: failureLimit,
      attributes: ['id', 'toEmail', 'subject', 'attempts', 'lastError', 'updatedAt', 'nextAttemptAt'],
    }),
  ]);
  const shares = new Map(
    (
      await JobRunCount.findAll({
        where: { organisationId, jobRunId: { [Op.in]: runs.map((r) => r.id) } },
      })
    ).map((c) => [c.jobRunId, parseCounts(c.countsJson)]),
  );
  return {
    runs: runs.map((r) => ({
      id: r.id,
      job: r.job,
      startedAt: r.startedAt.toISOString(),
      finishedAt: r.finishedAt?.toISOString() ?? null,
      ms: r.finishedAt ? r.finishedAt.getTime() - r.startedAt.getTime() : null,
      outcome: r.outcome,
      counts: shares.get(r.id) ?? {},
    })),
    failures: failures.map((u) => ({
      key: u.unitKey,
      job: u.job,
      label: u.label,
      attempts: u.attempts,
      lastError: u.lastError,
      lastFailedAt: u.updatedAt.toISOString(),
      nextAttemptAt: u.nextAttemptAt.toISOString(),
    })),
    undelivered: undelivered.map((m) => ({
      id: m.id,
      to: m.toEmail,
      subject: m.subject,
      attempts: m.attempts,
      lastError: m.lastError ?? null,
      lastTriedAt: m.updatedAt.toISOString(),
      nextAttemptAt: m.attempts >= MAX_ATTEMPTS ? null : (m.nextAttemptAt?.toISOString() ?? null),
    })),
  };
}
