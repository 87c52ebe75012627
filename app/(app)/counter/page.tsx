import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { CounterScreen } from '@/components/counter/CounterScreen';
import Link from '@/components/ui/Link';
import { PageHeader } from '@/components/ui/PageHeader';
import { button } from '@/components/ui/styles';
import { parseId } from '@/lib/api/schemas';
import { counterChoices, counterLampView } from '@/lib/counter/queries';
import { counterLampForPage, customerForPage, mayUseCounter } from '@/lib/customers/access';
import { currentMembership, requireUser } from '@/lib/session';

export const metadata: Metadata = { title: 'Counter test' };

type Props = { searchParams: Promise<{ customer?: string; lamp?: string }> };

/** The counter test: a customer's lamp measured and judged on one screen. Owners and staff only. */
export default async function CounterPage({ searchParams }: Props) {
  const user = await requireUser('/counter');
  const membership = await currentMembership(user);
  if (!membership || !mayUseCounter(user, membership.organisationId)) notFound();
  const sp = await searchParams;
  const lampId = sp.lamp ? parseId(sp.lamp) : null;
  const customerId = sp.customer ? parseId(sp.customer) : null;
  const keptRow = lampId ? await counterLampForPage(user, lampId) : null;
  const customerRow = customerId ? await customerForPage(user, customerId) : null;
  // A lamp or customer of another organisation (or none) is not offered: the screen opens empty.
  const organisationId = keptRow?.organisationId ?? membership.organisationId;
  const kept = keptRow ? await counterLampView(keptRow) : null;
  const choices = await counterChoices(organisationId);
  return (
    <>
      <PageHeader
        title="Counter test"
        lead="Measure a customer's lamp and tell them what it means: keep it, test it again, or replace it."
        actions={
          <Link href="/counter/dashboard" className={button.secondary}>
            Counter figures
          </Link>
        }
      />
      <CounterScreen
        options={{
          organisationId,
          ...choices,
          kept: kept
            ? {
                id: kept.id,
                name: kept.label ?? kept.lampTypeName,
                customerName: kept.customer?.name ?? null,
                hoursPerDay: kept.hoursPerDay,
              }
            : null,
          customer:
            customerRow && customerRow.organisationId === organisationId
              ? { id: customerRow.id, name: customerRow.name }
              : null,
        }}
      />
    </>
  );
}
