import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { CustomerForm } from '@/components/customers/CustomerForm';
import { EntryFormPage } from '@/components/ui/EntryFormPage';
import { mayUseCounter } from '@/lib/customers/access';
import { currentMembership, requireUser } from '@/lib/session';

export const metadata: Metadata = { title: 'New customer' };

/** Keepers are customers themselves and never see the shop's customer pages: 404, as for the list. */
export default async function NewCustomerPage() {
  const user = await requireUser('/customers/new');
  const membership = await currentMembership(user);
  if (!membership || !mayUseCounter(user, membership.organisationId)) notFound();
  return (
    <EntryFormPage
      back={{ href: '/customers', label: 'All customers' }}
      title="New customer"
      lead="A name is enough; e-mail and phone are optional. Reminder e-mails only with the customer's consent."
      allowed
      refusal={{ title: '', body: '' }}
    >
      <CustomerForm organisationId={membership.organisationId} customer={null} />
    </EntryFormPage>
  );
}
