import { Breadcrumbs } from '@/components/ui/Breadcrumbs';
import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { CalibrationPanel } from '@/components/lamp-log/CalibrationPanel';
import { ExampleDataMark } from '@/components/lamp-log/ExampleDataMark';
import { DecayChart } from '@/components/lamp-log/DecayChart';
import { LampFacts } from '@/components/lamp-log/LampFacts';
import { LampSettings } from '@/components/lamp-log/LampSettings';
import { ReadingForm } from '@/components/lamp-log/ReadingForm';
import { ReadingsTable } from '@/components/lamp-log/ReadingsTable';
import { StatusBadge } from '@/components/lamp-log/StatusBadge';
import { PageHeader } from '@/components/ui/PageHeader';
import { UnitToggle } from '@/components/ui/UnitToggle';
import { button, card } from '@/components/ui/styles';
import { formatDay } from '@/components/lamp-log/format';
import { BURN_IN_HOURS } from '@/lib/lamp-log/burn-in';
import { todayIso } from '@/lib/lamp-log/dates';
import { WARM_UP_MINUTES } from '@/shared/reading-setup';
import { lampForPage } from '@/lib/lamp-log/access';
import { designLampsOf } from '@/lib/lamp-log/design-lamps';
import { isExampleData } from '@/lib/organisations/queries';
import { lampDetail } from '@/lib/lamp-log/queries';
import { can } from '@/lib/permissions';
import { parseId } from '@/lib/api/schemas';
import { requireUser, type SegmentPageProps } from '@/lib/session';
import { viewerZone } from '@/lib/time/viewer-zone';

export const metadata: Metadata = { title: 'Lamp' };

/** Readings the table shows unless the address asks for all (`?readings=all`): the chart shows every one. */
const READINGS_SHOWN = 10;

export default async function LampPage({ params, searchParams }: SegmentPageProps<{ id: string }>) {
  const { id } = await params;
  const allReadings = (await searchParams).readings === 'all';
  const user = await requireUser(`/lamp-log/${id}`);
  const lampId = parseId(id);
  if (lampId === null) notFound();
  const found = await lampForPage(user, lampId);
  // Someone else's lamp looks exactly like a missing one.
  if (!found) notFound();
  const { lamp, canEdit, resource } = found;
  const [detail, designLamps, example, zone] = await Promise.all([
    lampDetail(lamp, todayIso()),
    // Only the settings form lists the design's lamps, and only an editor sees it.
    canEdit ? designLampsOf(lamp.enclosureId) : [],
    isExampleData(resource.organisationId),
    viewerZone(),
  ]);
  const s = detail.lamp;
  const lastMeter = [...detail.readings].reverse().find((r) => r.meter)?.meter ?? null;
  const lastSetUp = [...detail.readings].reverse().find((r) => r.through !== 'not-recorded');
  const lastWarm = [...detail.readings].reverse().find((r) => r.warmedUp !== 'not-recorded');
  // Newest first; a lamp logged for years has many, and each row is sent as HTML and as data.
  const newestFirst = [...detail.readings].sort((a, b) => b.takenAt.localeCompare(a.takenAt));
  const shownReadings = allReadings ? newestFirst : newestFirst.slice(0, READINGS_SHOWN);

  return (
    <>
      <Breadcrumbs
        trail={[
          { href: '/lamp-log', label: 'Lamp log' },
          { href: `/enclosures/${s.enclosure.id}/lamps`, label: s.enclosure.name },
        ]}
        current={s.label}
      />
      <PageHeader
        title={s.label}
        lead={
          <>
            {s.lampType.name} · <StatusBadge status={s.status} label={s.statusLabel} />
            {example && <ExampleDataMark compact />}
          </>
        }
        actions={<UnitToggle />}
      />
      {canEdit && s.status !== 'retired' && (
        // At the counter, phone in one hand: the form is one tap away, not below the chart and the table.
        <a href="#add-reading" className={`${button.primary} mb-4 w-full lg:hidden`}>
          Add a reading
        </a>
      )}
      <div className="grid gap-6 lg:grid-cols-3">
        <section aria-labelledby="chart" className="space-y-3 lg:col-span-2">
          <h2 id="chart" className="text-lead font-semibold">
            Readings and fitted decline
          </h2>
          {detail.chart.unit ? (
            <DecayChart
              chart={detail.chart}
              fallsBelowOn={s.fallsBelowOn}
              title={`Output of ${s.label} over time`}
              zone={zone}
            />
          ) : (
            <p className="rounded-lg border border-dashed border-basalt-300 bg-basalt-50 p-6 text-body text-basalt-600">
              No readings yet. Measure the lamp straight below it with a UVB or UV Index meter, after it has
              been on for at least {WARM_UP_MINUTES} minutes, and say what was between lamp and meter. A new
              lamp is burning in until {formatDay(s.burnIn.baselineOn)} (its first {BURN_IN_HOURS} hours at{' '}
              {s.hoursPerDay} h a day): the baseline reading is due then. A reading before that shows the lamp
              at its strongest, so it is worth checking the basking spot is not too strong, but it is fitted
              apart.
            </p>
          )}
        </section>
        <LampFacts lamp={s} />
      </div>

      <div className="mt-8 grid gap-6 lg:grid-cols-2">
        <section aria-labelledby="readings" className="space-y-3">
          <h2 id="readings" className="text-lead font-semibold">
            Readings
          </h2>
          {example && <ExampleDataMark />}
          <ReadingsTable
            readings={shownReadings}
            canEdit={canEdit}
            more={{
              total: newestFirst.length,
              shown: READINGS_SHOWN,
              allHref: `/lamp-log/${s.id}?readings=all#readings`,
              fewerHref: `/lamp-log/${s.id}#readings`,
            }}
          />
          {canEdit && s.status !== 'retired' && (
            <div id="add-reading" className={`${card} scroll-mt-4 p-4`}>
              <h3 className="mb-3 font-semibold">Add a reading</h3>
              <ReadingForm
                lampId={s.id}
                lastMeter={lastMeter}
                lidShare={s.baskingTransmission}
                last={{
                  through: lastSetUp && lastSetUp.through !== 'not-recorded' ? lastSetUp.through : null,
                  throughTransmission: lastSetUp?.throughTransmission ?? null,
                  warmedUp: lastWarm && lastWarm.warmedUp !== 'not-recorded' ? lastWarm.warmedUp : null,
                }}
              />
            </div>
          )}
        </section>
        <div className="space-y-6">
          <section aria-labelledby="calibration" className={`${card} p-4`}>
            <h2 id="calibration" className="mb-2 text-lead font-semibold">
              Calibrate the design
            </h2>
            <p className="mb-3 text-caption text-basalt-600">
              Use this lamp&apos;s readings instead of the catalogue figures, so the studio shows this lamp
              rather than an average one.
            </p>
            <CalibrationPanel
              lampId={s.id}
              canApply={can(user, 'update', { ...resource, kind: 'variant' })}
            />
          </section>
          {canEdit && (
            <section aria-labelledby="settings" className={`${card} p-4`}>
              <h2 id="settings" className="mb-3 text-lead font-semibold">
                Lamp settings
              </h2>
              {/* The same summary object as the facts': React sends it to the browser once and refers to it
                  here, so a smaller copy of its fields for this form would add bytes, not save them. */}
              <LampSettings lamp={s} designLamps={designLamps} canDelete={can(user, 'delete', resource)} />
            </section>
          )}
        </div>
      </div>
    </>
  );
}
