import type { Metadata } from 'next';
import { LampTypeForm } from '@/components/catalogue/LampTypeForm';
import { EntryFormPage } from '@/components/ui/EntryFormPage';
import { can } from '@/lib/permissions';
import { requireMembership } from '@/lib/session';

export const metadata: Metadata = { title: 'Add a lamp type' };

export default async function NewLampTypePage() {
  const session = await requireMembership('/lamp-catalogue/new');
  if (!session) return null;
  const { user, membership } = session;
  return (
    <EntryFormPage
      back={{ href: '/lamp-catalogue', label: 'Lamp catalogue' }}
      title="Add a lamp type"
      lead="Describe a kind of lamp by its technology — never a brand. Start from the technology’s defaults and correct what you know."
      allowed={can(user, 'create', { kind: 'lamp-type', organisationId: membership.organisationId })}
      refusal={{
        title: 'Only owners and staff add lamp types',
        body: 'Ask the organisation’s owner or staff to add the lamp you use.',
      }}
    >
      <LampTypeForm organisationId={membership.organisationId} lampType={null} />
    </EntryFormPage>
  );
}
