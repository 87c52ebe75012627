import type { Metadata } from 'next';
import { SpeciesForm } from '@/components/species/SpeciesForm';
import { EntryFormPage } from '@/components/ui/EntryFormPage';
import { requireUser } from '@/lib/session';
import { loadSheet } from '../../load';

export const metadata: Metadata = { title: 'Edit species sheet' };

export default async function EditSpeciesPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requireUser(`/species/${id}/edit`);
  const { sheet, mayEdit } = await loadSheet(user, id);
  return (
    <EntryFormPage
      back={{ href: `/species/${sheet.id}`, label: sheet.commonName }}
      title={`Edit: ${sheet.commonName}`}
      allowed={mayEdit}
      refusal={{
        title: 'You can read this sheet but not change it',
        body: 'Species sheets are kept by the organisation’s owner and staff. Ask one of them to make the change.',
      }}
    >
      <SpeciesForm organisationId={sheet.organisationId} sheet={sheet} />
    </EntryFormPage>
  );
}
