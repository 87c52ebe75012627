import type { Metadata } from 'next';
import type { ReactNode } from 'react';
import { notFound } from 'next/navigation';
import { ExampleDataMark } from '@/components/lamp-log/ExampleDataMark';
import { BarChart } from '@/components/population/BarChart';
import { Breadcrumbs } from '@/components/ui/Breadcrumbs';
import Link from '@/components/ui/Link';
import { PageHeader } from '@/components/ui/PageHeader';
import { card } from '@/components/ui/styles';
import { isExampleData } from '@/lib/organisations/queries';
import { can } from '@/lib/permissions';
import { counterFigures, WEEKS, type ShareRow } from '@/lib/population/dashboard';
import { requireMembership } from '@/lib/session';
import { formatMoment } from '@/lib/time/format';
import { viewerZone } from '@/lib/time/viewer-zone';

export const metadata: Metadata = { title: 'Counter figures' };

const shareBars = (rows: ShareRow[]) =>
  rows.map((r) => ({
    key: r.label,
    label: r.label,
    value: r.lamps ? r.replace / r.lamps : 0,
    note: `${r.replace} of ${r.lamps} lamp${r.lamps === 1 ? '' : 's'}`,
  }));

/** What the counter's tests add up to: tests a week, and the lamps it said to replace. Owners and staff. */
export default async function CounterDashboardPage() {
  const session = await requireMembership('/counter/dashboard');
  if (
    !session ||
    !can(session.user, 'read', { kind: 'shop-figures', organisationId: session.organisationId })
  )
    notFound();
  const { organisationId } = session;
  const [figures, example, zone] = await Promise.all([
    counterFigures(organisationId),
    isExampleData(organisationId),
    viewerZone(),
  ]);
  const weekLabel = (day: string) => formatMoment(`${day}T12:00:00Z`, zone, 'day');
  return (
    <>
      <Breadcrumbs trail={[{ href: '/counter', label: 'Counter test' }]} current="Counter figures" />
      <PageHeader
        title="Counter figures"
        lead="What the lamps tested at the counter add up to. Each lamp counts once, by the verdict of its latest test."
      />
      {example && <ExampleDataMark />}
      <div className="space-y-6">
        <FigureSection
          id="weekly"
          title="Tests a week"
          lead={`${figures.tests} counter test${figures.tests === 1 ? '' : 's'} in the last ${WEEKS} weeks.`}
          leadTestId="tests-total"
        >
          <BarChart
            id="tests-per-week"
            title={`Counter tests a week, last ${WEEKS} weeks`}
            description={`Bars for each week, from ${weekLabel(figures.weeks[0]!.weekOf)}; the last bar is this week so far.`}
            bars={figures.weeks.map((w) => ({ key: w.weekOf, label: weekLabel(w.weekOf), value: w.tests }))}
            labelHeader="Week of"
            valueHeader="Tests"
          />
        </FigureSection>
        {figures.judged === 0 ? (
          <p className={`${card} p-5 text-body text-basalt-800`} data-testid="no-verdicts">
            No UV lamp has been judged at the counter yet: the shares of lamps to replace appear after the
            first test.
          </p>
        ) : (
          <>
            <FigureSection
              id="tech"
              title="Lamps to replace, by technology"
              lead={`Share of the ${figures.judged} UV lamps judged at the counter whose latest verdict was “replace”.`}
            >
              <BarChart
                id="replace-by-technology"
                title="Share of counter lamps judged “replace”, by technology"
                description="One bar a lamp technology."
                bars={shareBars(figures.byTechnology)}
                share
                labelHeader="Technology"
                valueHeader="Replace"
                noteHeader="Lamps"
              />
            </FigureSection>
            <FigureSection
              id="age"
              title="Lamps to replace, by age"
              lead="By the lamp’s age at its latest test (calendar months since first switch-on, as the customer gave it)."
            >
              <BarChart
                id="replace-by-age"
                title="Share of counter lamps judged “replace”, by age"
                description="One bar an age band."
                bars={shareBars(figures.byAge).map((b) => ({ ...b, key: `age-${b.key}` }))}
                share
                labelHeader="Age"
                valueHeader="Replace"
                noteHeader="Lamps"
              />
            </FigureSection>
          </>
        )}
        <p className="text-body text-basalt-700">
          How each lamp type really ages, learned from these tests and the lamp log: on each type’s page in
          the{' '}
          <Link href="/lamp-catalogue" className="text-sky-800 underline">
            lamp catalogue
          </Link>
          . A verdict is an estimate from one meter reading: customers check their lamps at home with a meter.
        </p>
      </div>
    </>
  );
}

/** One card of figures: its heading (which names the section for screen readers), what it counts, and its chart. */
function FigureSection({
  id,
  title,
  lead,
  leadTestId,
  children,
}: {
  id: string;
  title: string;
  lead: string;
  leadTestId?: string;
  children: ReactNode;
}) {
  return (
    <section className={`${card} space-y-3 p-5`} aria-labelledby={`${id}-heading`}>
      <h2 id={`${id}-heading`} className="text-lead font-semibold text-basalt-900">
        {title}
      </h2>
      <p className="text-body text-basalt-700" data-testid={leadTestId}>
        {lead}
      </p>
      {children}
    </section>
  );
}
