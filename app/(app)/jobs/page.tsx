import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { LocalTime } from '@/components/jobs/LocalTime';
import { EmptyState } from '@/components/ui/EmptyState';
import { Notice } from '@/components/ui/Notice';
import { PageHeader } from '@/components/ui/PageHeader';
import { jobsOverview, type RunView } from '@/lib/jobs/overview';
import { jobTitle } from '@/lib/jobs/registry';
import { can } from '@/lib/permissions';
import { currentMembership, requireUser } from '@/lib/session';

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
  return entries.map(([name, n]) => `${n.toLocaleString('en-GB')} ${name}`).join(', ');
}

const td = 'px-3 py-2 align-top';

function Head({ columns }: { columns: string[] }) {
  return (
    <thead className="bg-basalt-50 text-caption uppercase tracking-wide text-basalt-600">
      <tr>
        {columns.map((c) => (
          <th key={c} scope="col" className="px-3 py-2 font-semibold">
            {c}
          </th>
        ))}
      </tr>
    </thead>
  );
}

/**
 * The owner's view of the background jobs: their recent runs, this organisation's share of each, and
 * what is failing for it (units of work waiting to be retried, e-mail that could not be delivered).
 */
export default async function JobsPage() {
  const user = await requireUser('/jobs');
  const membership = await currentMembership(user);
  if (!membership) return null;
  const organisationId = membership.organisationId;
  if (!can(user, 'read', { kind: 'jobs', organisationId })) notFound();
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
          <div className="overflow-x-auto rounded-lg border border-basalt-200 bg-white">
            <table className="min-w-full divide-y divide-basalt-200 text-left text-body">
              <caption className="sr-only">Work that failed and is waiting to be retried</caption>
              <Head columns={['What', 'Error', 'Attempts', 'Last failed', 'Next attempt']} />
              <tbody className="divide-y divide-basalt-100">
                {failures.map((f) => (
                  <tr key={`${f.job}:${f.key}`}>
                    <td className={td}>
                      {f.label}
                      <span className="block text-caption text-basalt-500">{jobTitle(f.job)}</span>
                    </td>
                    <td className={`${td} max-w-md break-words text-basalt-700`}>{f.lastError}</td>
                    <td className={td}>{f.attempts}</td>
                    <td className={`${td} whitespace-nowrap`}>
                      <LocalTime iso={f.lastFailedAt} />
                    </td>
                    <td className={`${td} whitespace-nowrap`}>
                      <LocalTime iso={f.nextAttemptAt} />
                    </td>
                  </tr>
                ))}
                {undelivered.map((m) => (
                  <tr key={`mail:${m.id}`}>
                    <td className={td}>
                      E-mail to {m.to}
                      <span className="block text-caption text-basalt-500">{m.subject}</span>
                    </td>
                    <td className={`${td} max-w-md break-words text-basalt-700`}>{m.lastError ?? '—'}</td>
                    <td className={td}>{m.attempts}</td>
                    <td className={`${td} whitespace-nowrap`}>
                      <LocalTime iso={m.lastTriedAt} />
                    </td>
                    <td className={`${td} whitespace-nowrap`}>
                      {m.nextAttemptAt ? <LocalTime iso={m.nextAttemptAt} /> : 'Given up: check the address'}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
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
          <div className="overflow-x-auto rounded-lg border border-basalt-200 bg-white">
            <table className="min-w-full divide-y divide-basalt-200 text-left text-body">
              <caption className="sr-only">Recent runs of the background jobs, newest first</caption>
              <Head columns={['Run', 'Started', 'Took', 'Outcome', 'For your organisation']} />
              <tbody className="divide-y divide-basalt-100">
                {runs.map((r) => {
                  const o = OUTCOME[r.outcome] ?? { label: r.outcome, className: 'bg-basalt-100' };
                  return (
                    <tr key={r.id}>
                      <td className={td}>
                        {jobTitle(r.job)}
                        <span className="block text-caption text-basalt-500">#{r.id}</span>
                      </td>
                      <td className={`${td} whitespace-nowrap`}>
                        <LocalTime iso={r.startedAt} />
                      </td>
                      <td className={`${td} whitespace-nowrap`}>{duration(r.ms)}</td>
                      <td className={td}>
                        <span className={`rounded px-2 py-0.5 text-caption font-medium ${o.className}`}>
                          {o.label}
                        </span>
                      </td>
                      <td className={`${td} text-basalt-700`}>{countsText(r)}</td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
        )}
      </section>
    </>
  );
}
