import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { CounterScreen } from '@/components/counter/CounterScreen';
import Link from '@/components/ui/Link';
import { PageHeader } from '@/components/ui/PageHeader';
import { button } from '@/components/ui/styles';
import { parseId } from '@/lib/api/schemas';
import { counterChoices, counterLampView } from '@/lib/counter/queries';
import { counterLampForPage, customerForPage, mayUseCounter } from '@/lib/customers/access';
import { customerLinkedTo } from '@/lib/customers/keeper-link';
import { lampForPage } from '@/lib/lamp-log/access';
import { currentMembership, requireUser } from '@/lib/session';
import type { CurrentUser } from '@/lib/auth/session-user';

export const metadata: Metadata = { title: 'Counter test' };

type Props = { searchParams: Promise<{ customer?: string; lamp?: string; enclosureLamp?: string }> };

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
  const inEnclosure = !keptRow && sp.enclosureLamp ? await enclosureLampOffer(user, sp.enclosureLamp) : null;
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
                kind: 'counter',
                id: kept.id,
                name: kept.label ?? kept.lampTypeName,
                customerId: kept.customer?.id ?? null,
                customerName: kept.customer?.name ?? null,
              }
            : inEnclosure && inEnclosure.organisationId === organisationId
              ? inEnclosure.kept
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

/**
 * A lamp in the enclosure of a keeper linked to a customer, offered for a counter test that adds its
 * reading to that lamp; null when it is not one (or this user may not change it).
 */
async function enclosureLampOffer(user: CurrentUser, raw: string) {
  const id = parseId(raw);
  const found = id ? await lampForPage(user, id) : null;
  if (!found || !found.canEdit || found.lamp.retiredOn) return null;
  const { lamp } = found;
  const customer = await customerLinkedTo(lamp.enclosure.organisationId, lamp.enclosure.keeperId);
  if (!customer) return null;
  return {
    organisationId: lamp.enclosure.organisationId,
    kept: {
      kind: 'enclosure' as const,
      id: lamp.id,
      name: `${lamp.label} in ${lamp.enclosure.name}`,
      customerId: customer.id,
      customerName: customer.name,
    },
  };
}
