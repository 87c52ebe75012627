import type { Metadata } from 'next';
import { SpeciesForm } from '@/components/species/SpeciesForm';
import { EntryFormPage } from '@/components/ui/EntryFormPage';
import { can } from '@/lib/permissions';
import { requireMembership } from '@/lib/session';

export const metadata: Metadata = { title: 'New species sheet' };

export default async function NewSpeciesPage() {
  const session = await requireMembership('/species/new');
  if (!session) return null;
  const { user, membership } = session;
  return (
    <EntryFormPage
      back={{ href: '/species', label: 'All species' }}
      title="New species sheet"
      lead="Give the species’ needs and where each figure comes from. Every figure is checked against the design in the studio."
      allowed={can(user, 'create', { kind: 'species', organisationId: membership.organisationId })}
      refusal={{
        title: 'Only owners and staff add species sheets',
        body: 'Ask the organisation’s owner or staff to add the species you keep.',
      }}
    >
      <SpeciesForm organisationId={membership.organisationId} sheet={null} />
    </EntryFormPage>
  );
}
