import type { Metadata } from 'next';
import { FailingTable, RunsTable } from '@/components/jobs/JobTables';
import { EmptyState } from '@/components/ui/EmptyState';
import { Notice } from '@/components/ui/Notice';
import { PageHeader } from '@/components/ui/PageHeader';
import { countPhrase } from '@/lib/jobs/count-text';
import { jobsOverview, type RunView } from '@/lib/jobs/overview';
import { jobTitle } from '@/lib/jobs/registry';
import { requireMembershipThatMay } from '@/lib/session';

export const metadata: Metadata = { title: 'Background jobs' };
export const dynamic = 'force-dynamic';

const OUTCOME: Record<string, { label: string; className: string }> = {
  running: { label: 'Running', className: 'bg-sky-100 text-sky-900' },
  succeeded: { label: 'Done', className: 'bg-moss-100 text-moss-900' },
  partial: { label: 'Done, some failed', className: 'bg-sand-100 text-sand-900' },
  failed: { label: 'Stopped', className: 'bg-ember-100 text-ember-900' },
  abandoned: { label: 'Cut short', className: 'bg-basalt-200 text-basalt-900' },
};

function duration(ms: number | null): string {
  if (ms === null) return '—';
  if (ms < 1000) return `${ms} ms`;
  if (ms < 120_000) return `${(ms / 1000).toFixed(1)} s`;
  return `${Math.round(ms / 60_000)} min`;
}

function countsText(run: RunView): string {
  const entries = Object.entries(run.counts);
  if (entries.length === 0) return run.outcome === 'running' ? '—' : 'nothing for your organisation';
  return entries.map(([name, n]) => countPhrase(name, n)).join(', ');
}

/**
 * The owner's view of the background jobs: their recent runs, this organisation's share of each, and
 * what is failing for it (units of work waiting to be retried, e-mail that could not be delivered).
 */
export default async function JobsPage() {
  const session = await requireMembershipThatMay('/jobs', 'read', 'jobs');
  if (!session) return null;
  const { membership, organisationId } = session;
  const { runs, failures, undelivered } = await jobsOverview(organisationId);
  const lastRun = runs[0];

  return (
    <>
      <PageHeader
        title="Background jobs"
        lead={`The work Baskwell does on its own for ${membership.organisationName}: lamp outlooks brought up to date as the days pass, and lamp reminder e-mails, checked every hour. Each run is listed with what it did for your organisation; anything that failed is retried on its own, later and less often each time.`}
      />
      {lastRun && lastRun.outcome === 'failed' && (
        <Notice tone="warning" title="The last run stopped with an error">
          Run #{lastRun.id} of {jobTitle(lastRun.job)} stopped before it finished; the next run tries again.
          If this keeps happening, give the run number to whoever runs your Baskwell server: its log has the
          details.
        </Notice>
      )}

      <section aria-labelledby="failing" className="mt-6 space-y-3">
        <h2 id="failing" className="text-lead font-semibold text-basalt-900">
          Failing now
        </h2>
        {failures.length === 0 && undelivered.length === 0 ? (
          <p className="text-body text-basalt-600">Nothing is failing for your organisation.</p>
        ) : (
          <FailingTable
            rows={[
              ...failures.map((f) => ({
                key: `${f.job}:${f.key}`,
                what: f.label,
                detail: jobTitle(f.job),
                error: f.lastError,
                attempts: f.attempts,
                lastAt: f.lastFailedAt,
                nextAt: f.nextAttemptAt,
              })),
              ...undelivered.map((m) => ({
                key: `mail:${m.id}`,
                what: `E-mail to ${m.to}`,
                detail: m.subject,
                error: m.lastError ?? '—',
                attempts: m.attempts,
                lastAt: m.lastTriedAt,
                nextAt: m.nextAttemptAt,
                givenUp: 'Given up: check the address',
              })),
            ]}
          />
        )}
      </section>

      <section aria-labelledby="runs" className="mt-8 space-y-3">
        <h2 id="runs" className="text-lead font-semibold text-basalt-900">
          Recent runs
        </h2>
        {runs.length === 0 ? (
          <EmptyState title="No runs yet">
            <p>
              The job process started by <code>npm start</code> runs the lamp reminders within a minute of
              starting and then every hour; <code>npm run reminders</code> runs them at once.
            </p>
          </EmptyState>
        ) : (
          <RunsTable
            rows={runs.map((r) => ({
              id: r.id,
              title: jobTitle(r.job),
              startedAt: r.startedAt,
              took: duration(r.ms),
              outcome: OUTCOME[r.outcome] ?? { label: r.outcome, className: 'bg-basalt-100' },
              counts: countsText(r),
            }))}
          />
        )}
      </section>
    </>
  );
}
