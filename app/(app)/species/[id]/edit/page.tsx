import type { Metadata } from 'next';
import { SpeciesForm } from '@/components/species/SpeciesForm';
import { EditEntryPage, type EntryPageProps } from '../../../catalogue-entry';

export const metadata: Metadata = { title: 'Edit species sheet' };

export default function EditSpeciesPage({ params }: EntryPageProps) {
  return (
    <EditEntryPage
      kind="species"
      params={params}
      refusal={{
        title: 'You can read this sheet but not change it',
        body: 'Species sheets are kept by the organisation’s owner and staff. Ask one of them to make the change.',
      }}
      form={(sheet) => <SpeciesForm organisationId={sheet.organisationId} sheet={sheet} />}
    />
  );
}
