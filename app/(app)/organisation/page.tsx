import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { ContactForm } from '@/components/organisations/ContactForm';
import { PageHeader } from '@/components/ui/PageHeader';
import { organisationContact } from '@/lib/organisations/queries';
import { can } from '@/lib/permissions';
import { currentMembership, requireUser } from '@/lib/session';

export const metadata: Metadata = { title: 'Organisation settings' };

/** The organisation's own settings: how customers reach the shop. The owner's page. */
export default async function OrganisationSettingsPage() {
  const user = await requireUser('/organisation');
  const membership = await currentMembership(user);
  if (!membership || !can(user, 'update', { kind: 'organisation', id: membership.organisationId }))
    notFound();
  const org = await organisationContact(membership.organisationId);
  if (!org) notFound();
  return (
    <>
      <PageHeader
        title="Organisation settings"
        lead={`How customers reach ${org.name}: shown on the counter's test slips and in the e-mails they get from you.`}
      />
      <ContactForm
        organisationId={org.id}
        initial={{
          contactPhone: org.contactPhone ?? '',
          contactEmail: org.contactEmail ?? '',
          contactAddress: org.contactAddress ?? '',
        }}
      />
    </>
  );
}
