import type { Metadata } from 'next';
import { SpeciesForm } from '@/components/species/SpeciesForm';
import { NewEntryPage } from '../../catalogue-entry';

export const metadata: Metadata = { title: 'New species sheet' };

export default function NewSpeciesPage() {
  return (
    <NewEntryPage
      kind="species"
      title="New species sheet"
      lead="Give the species’ needs and where each figure comes from. Every figure is checked against the design in the studio."
      refusal={{
        title: 'Only owners and staff add species sheets',
        body: 'Ask the organisation’s owner or staff to add the species you keep.',
      }}
      form={(organisationId) => <SpeciesForm organisationId={organisationId} sheet={null} />}
    />
  );
}
