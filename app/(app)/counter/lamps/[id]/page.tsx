import type { Metadata } from 'next';
import { formatDay } from '@/components/lamp-log/format';
import { notFound } from 'next/navigation';
import { SendSlipButton } from '@/components/counter/SendSlipButton';
import { VerdictCard } from '@/components/counter/VerdictCard';
import { VERDICT_LABEL } from '@/components/customers/verdict-label';
import { Breadcrumbs } from '@/components/ui/Breadcrumbs';
import Link from '@/components/ui/Link';
import { LocalTime } from '@/components/ui/LocalTime';
import { PageHeader } from '@/components/ui/PageHeader';
import { button, card } from '@/components/ui/styles';
import { parseId } from '@/lib/api/schemas';
import { counterLampView } from '@/lib/counter/queries';
import { counterLampForPage } from '@/lib/customers/access';
import { isExampleData } from '@/lib/organisations/queries';
import { ExampleDataMark } from '@/components/lamp-log/ExampleDataMark';
import { requireUser } from '@/lib/session';
import { THROUGH_SHORT, type ReadingThrough } from '@/shared/reading-setup';

export const metadata: Metadata = { title: 'Counter lamp' };

type Props = { params: Promise<{ id: string }> };

const round = (v: number) => (v >= 10 ? Math.round(v) : Math.round(v * 10) / 10);

/** A lamp tested at the counter: every reading with the verdict given then, and today's answer from all. */
export default async function CounterLampPage({ params }: Props) {
  const { id: raw } = await params;
  const user = await requireUser(`/counter/lamps/${raw}`);
  const id = parseId(raw);
  const row = id ? await counterLampForPage(user, id) : null;
  if (!row) notFound();
  const [lamp, example] = await Promise.all([counterLampView(row), isExampleData(row.organisationId)]);
  const name = lamp.label ?? lamp.lampTypeName;
  return (
    <>
      <Breadcrumbs
        trail={
          lamp.customer
            ? [
                { href: '/customers', label: 'Customers' },
                { href: `/customers/${lamp.customer.id}`, label: lamp.customer.name },
              ]
            : [{ href: '/counter', label: 'Counter' }]
        }
        current={name}
      />
      <PageHeader
        title={name}
        lead={`${lamp.label ? `${lamp.lampTypeName} · in use since` : 'In use since'} ${lamp.firstUsedEstimated ? 'about ' : ''}${formatDay(lamp.firstUsedOn)}, ${lamp.hoursPerDay} hours a day${lamp.customer ? '' : ' · kept without a customer'}`}
        actions={
          <>
            <Link href={`/counter?lamp=${lamp.id}`} className={button.primary}>
              Test again
            </Link>
            {lamp.answer && (
              <a href={`/api/counter/lamps/${lamp.id}/slip`} download className={button.secondary}>
                Test slip (PDF)
              </a>
            )}
            {lamp.customer?.mayEmail && lamp.answer && <SendSlipButton lampId={lamp.id} />}
          </>
        }
      />
      {example && <ExampleDataMark />}
      {lamp.answer && (
        <div className="mb-6 max-w-xl">
          <p className="mb-2 text-body text-basalt-700">
            Today, from {lamp.readings.length} reading{lamp.readings.length === 1 ? '' : 's'}
            {lamp.answer.fit.kind === 'exponential' || lamp.answer.fit.kind === 'two-phase'
              ? ' (this lamp’s own decay fit)'
              : ' (the type’s usual curve, scaled to the readings)'}
            :
          </p>
          <VerdictCard answer={lamp.answer} unit="cm" busy={false} />
        </div>
      )}
      <h2 className="mb-2 text-lead font-semibold text-basalt-900">Readings</h2>
      <div className={`${card} overflow-x-auto`}>
        <table className="w-full text-left text-body">
          <thead className="bg-basalt-50 text-caption text-basalt-600">
            <tr>
              <th className="px-3 py-2">Taken</th>
              <th className="px-3 py-2">Reading</th>
              <th className="px-3 py-2">Set-up</th>
              <th className="px-3 py-2">Verdict given</th>
            </tr>
          </thead>
          <tbody className="divide-y divide-basalt-100">
            {lamp.readings.map((r) => (
              <tr key={r.id}>
                <td className="px-3 py-2">
                  <LocalTime value={r.takenAt} shown="day" />
                </td>
                <td className="px-3 py-2">
                  {r.unit === 'uvb' ? `${round(r.value)} µW/cm²` : `UVI ${round(r.value)}`} at{' '}
                  {round(r.distanceCm)} cm
                </td>
                <td className="px-3 py-2">{THROUGH_SHORT[r.through as ReadingThrough] ?? r.through}</td>
                <td className="px-3 py-2">
                  {VERDICT_LABEL[r.verdict] ?? r.verdict}
                  {r.testAgainOn ? ` (by ${r.testAgainOn})` : ''}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </>
  );
}
