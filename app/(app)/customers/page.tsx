import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import Link from '@/components/ui/Link';
import { CounterCsvImport } from '@/components/counter/CounterCsvImport';
import { EmptyState } from '@/components/ui/EmptyState';
import { PageHeader } from '@/components/ui/PageHeader';
import { button, card, input, link } from '@/components/ui/styles';
import { mayUseCounter } from '@/lib/customers/access';
import { customersByName } from '@/lib/customers/queries';
import { isExampleData } from '@/lib/organisations/queries';
import { ExampleDataMark } from '@/components/lamp-log/ExampleDataMark';
import { currentMembership, requireUser } from '@/lib/session';

export const metadata: Metadata = { title: 'Customers' };

type Props = { searchParams: Promise<{ q?: string | string[] }> };

/** The shop's customers, searched by name, e-mail or phone. Owners and staff only. */
export default async function CustomersPage({ searchParams }: Props) {
  const user = await requireUser('/customers');
  const membership = await currentMembership(user);
  if (!membership || !mayUseCounter(user, membership.organisationId)) notFound();
  const raw = (await searchParams).q;
  const q = (Array.isArray(raw) ? raw[0] : raw)?.trim().slice(0, 100) || undefined;
  const [{ items, more }, example] = await Promise.all([
    customersByName(membership.organisationId, q),
    isExampleData(membership.organisationId),
  ]);
  return (
    <>
      <PageHeader
        title="Customers"
        lead="People whose lamps the shop tests at the counter. Only owners and staff see this list."
        actions={
          <>
            <Link href="/counter" className={button.primary}>
              Test a lamp
            </Link>
            <Link href="/customers/new" className={button.secondary}>
              Add customer
            </Link>
          </>
        }
      />
      {example && <ExampleDataMark />}
      <form method="get" role="search" className="mb-4 flex max-w-md items-end gap-2">
        <div className="flex-1">
          <label htmlFor="customer-search" className="mb-1 block text-body font-medium text-basalt-800">
            Search
          </label>
          <input
            id="customer-search"
            name="q"
            type="search"
            defaultValue={q ?? ''}
            placeholder="Name, e-mail or phone"
            className={input}
          />
        </div>
        <button type="submit" className={button.secondary}>
          Search
        </button>
      </form>
      {items.length === 0 ? (
        <EmptyState title={q ? `No customer matches “${q}”` : 'No customers yet'}>
          <p>
            Add a customer when they bring a lamp to test, or from the counter screen. A walk-in can be tested
            without a record.
          </p>
        </EmptyState>
      ) : (
        <ul className={`${card} divide-y divide-basalt-100`} aria-label="Customers">
          {items.map((c) => (
            <li key={c.id} className="flex flex-wrap items-baseline justify-between gap-2 px-4 py-3">
              <Link href={`/customers/${c.id}`} className={link}>
                {c.name}
              </Link>
              <span className="text-caption text-basalt-500">
                {[c.email, c.phone].filter(Boolean).join(' · ') || 'no contact details'}
                {c.reminderConsentAt ? ' · reminders by e-mail' : ''}
              </span>
            </li>
          ))}
        </ul>
      )}
      {more && (
        <p className="mt-3 text-caption text-basalt-500">More customers match: search to narrow the list.</p>
      )}
      <section aria-labelledby="counter-import" className={`${card} mt-6 p-4`}>
        <h2 id="counter-import" className="mb-3 text-lead font-semibold">
          Import past counter tests (CSV)
        </h2>
        <CounterCsvImport organisationId={membership.organisationId} />
      </section>
    </>
  );
}
