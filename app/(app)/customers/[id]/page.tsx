import type { Metadata } from 'next';
import { formatDay } from '@/components/lamp-log/format';
import { notFound } from 'next/navigation';
import Link from '@/components/ui/Link';
import { Breadcrumbs } from '@/components/ui/Breadcrumbs';
import { DeleteCustomerButton } from '@/components/customers/DeleteCustomerButton';
import { KeeperLinkPanel } from '@/components/customers/KeeperLinkPanel';
import { VERDICT_LABEL } from '@/components/customers/verdict-label';
import { EmptyState } from '@/components/ui/EmptyState';
import { LocalTime } from '@/components/ui/LocalTime';
import { PageHeader } from '@/components/ui/PageHeader';
import { button, card, link } from '@/components/ui/styles';
import { parseId } from '@/lib/api/schemas';
import { customerForPage } from '@/lib/customers/access';
import { keeperChoices, linkedKeeper, type KeeperLampRef } from '@/lib/customers/keeper-link';
import { customerDto, lampsOfCustomer } from '@/lib/customers/queries';
import { isExampleData } from '@/lib/organisations/queries';
import { ExampleDataMark } from '@/components/lamp-log/ExampleDataMark';
import { requireUser } from '@/lib/session';

export const metadata: Metadata = { title: 'Customer' };

type Props = { params: Promise<{ id: string }> };

export default async function CustomerPage({ params }: Props) {
  const { id: raw } = await params;
  const user = await requireUser(`/customers/${raw}`);
  const id = parseId(raw);
  const row = id ? await customerForPage(user, id) : null;
  if (!row) notFound();
  const customer = customerDto(row);
  const [lamps, example, keeper, keepers] = await Promise.all([
    lampsOfCustomer(customer.id),
    isExampleData(customer.organisationId),
    linkedKeeper(row),
    keeperChoices(customer.organisationId),
  ]);
  return (
    <>
      <Breadcrumbs trail={[{ href: '/customers', label: 'All customers' }]} />
      <PageHeader
        title={customer.name}
        actions={
          <>
            <Link href={`/counter?customer=${customer.id}`} className={button.primary}>
              Test a lamp
            </Link>
            <Link href={`/customers/${customer.id}/edit`} className={button.secondary}>
              Change
            </Link>
            <a href={`/api/customers/${customer.id}/export`} download className={button.secondary}>
              Export their data (JSON)
            </a>
            <DeleteCustomerButton id={customer.id} name={customer.name} />
          </>
        }
      />
      {example && <ExampleDataMark />}
      <dl className={`${card} mb-6 grid gap-x-6 gap-y-2 p-4 text-body sm:grid-cols-[auto_1fr]`}>
        <dt className="font-medium text-basalt-700">E-mail</dt>
        <dd>{customer.email ?? '—'}</dd>
        <dt className="font-medium text-basalt-700">Phone</dt>
        <dd>{customer.phone ?? '—'}</dd>
        <dt className="font-medium text-basalt-700">Reminder e-mails</dt>
        <dd>
          {customer.reminderConsentAt ? (
            <>
              Agreed on <LocalTime value={customer.reminderConsentAt} shown="day" />
            </>
          ) : customer.reminderConsentWithdrawnAt ? (
            <>
              No: withdrawn on <LocalTime value={customer.reminderConsentWithdrawnAt} shown="day" />
            </>
          ) : (
            'No consent given'
          )}
        </dd>
        {customer.notes && (
          <>
            <dt className="font-medium text-basalt-700">Notes</dt>
            <dd className="whitespace-pre-line">{customer.notes}</dd>
          </>
        )}
      </dl>
      <KeeperLinkPanel
        customerId={customer.id}
        linked={
          keeper && { id: keeper.id, name: keeper.name, email: keeper.email, isKeeper: keeper.isKeeper }
        }
        keepers={keepers.map((k) => ({
          id: k.id,
          name: k.name,
          email: k.email,
          linkedElsewhere: k.linkedCustomerId !== null && k.linkedCustomerId !== customer.id,
        }))}
      />
      {keeper && keeper.isKeeper && <KeeperLamps keeperName={keeper.name} lamps={keeper.lamps} />}
      <h2 className="mb-2 text-lead font-semibold text-basalt-900">Lamps tested</h2>
      {lamps.length === 0 ? (
        <EmptyState title="No lamps tested yet">
          <p>Test a lamp at the counter and save it for this customer: it appears here with every reading.</p>
        </EmptyState>
      ) : (
        <ul className={`${card} divide-y divide-basalt-100`} aria-label="Lamps tested">
          {lamps.map((l) => (
            <li key={l.id} className="flex flex-wrap items-baseline justify-between gap-2 px-4 py-3">
              <span>
                <Link href={`/counter/lamps/${l.id}`} className={link}>
                  {l.label ?? l.lampTypeName}
                </Link>
                <span className="ml-2 text-caption text-basalt-500">
                  {l.label ? `${l.lampTypeName} · ` : ''}in use since {l.firstUsedEstimated ? 'about ' : ''}
                  {formatDay(l.firstUsedOn)} · {l.tests} test{l.tests === 1 ? '' : 's'}
                </span>
              </span>
              <span className="flex items-center gap-3 text-caption text-basalt-700">
                {l.lastTest && (
                  <span>
                    <LocalTime value={l.lastTest.takenAt} shown="day" />:{' '}
                    {VERDICT_LABEL[l.lastTest.verdict] ?? l.lastTest.verdict}
                    {l.lastTest.testAgainOn ? ` (by ${l.lastTest.testAgainOn})` : ''}
                  </span>
                )}
                <Link href={`/counter?lamp=${l.id}`} className={link}>
                  Test again
                </Link>
              </span>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}

/** The linked keeper's enclosure lamps as the lamp log has them: references, never copies. */
function KeeperLamps({ keeperName, lamps }: { keeperName: string; lamps: KeeperLampRef[] }) {
  return (
    <section className="mb-6" aria-labelledby="keeper-lamps">
      <h2 id="keeper-lamps" className="mb-2 text-lead font-semibold text-basalt-900">
        Lamps in {keeperName}’s enclosures
      </h2>
      {lamps.length === 0 ? (
        <p className="text-body text-basalt-600">No lamps logged in their enclosures yet.</p>
      ) : (
        <ul className={`${card} divide-y divide-basalt-100`} aria-label="Lamps in the keeper’s enclosures">
          {lamps.map((l) => (
            <li key={l.id} className="flex flex-wrap items-baseline justify-between gap-2 px-4 py-3">
              <span>
                <Link href={`/enclosures/${l.enclosureId}/lamps`} className={link}>
                  {l.label}
                </Link>
                <span className="ml-2 text-caption text-basalt-500">
                  {l.lampTypeName} · {l.enclosureName} · in use since {formatDay(l.firstUsedOn)} ·{' '}
                  {l.readings} reading
                  {l.readings === 1 ? '' : 's'} in the lamp log
                  {l.retiredOn ? ` · retired ${formatDay(l.retiredOn)}` : ''}
                </span>
              </span>
              {!l.retiredOn && (
                <Link href={`/counter?enclosureLamp=${l.id}`} className={`${link} text-caption`}>
                  Test at the counter
                </Link>
              )}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
