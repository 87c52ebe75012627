import { Breadcrumbs } from '@/components/ui/Breadcrumbs';
import type { Metadata } from 'next';
import { SpeciesForm } from '@/components/species/SpeciesForm';
import { Notice } from '@/components/ui/Notice';
import { PageHeader } from '@/components/ui/PageHeader';
import { requireUser } from '@/lib/session';
import { loadSheet } from '../../load';

export const metadata: Metadata = { title: 'Edit species sheet' };

export default async function EditSpeciesPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requireUser(`/species/${id}/edit`);
  const { sheet, mayEdit } = await loadSheet(user, id);
  return (
    <>
      <Breadcrumbs trail={[{ href: `/species/${sheet.id}`, label: sheet.commonName }]} />
      <PageHeader title={`Edit: ${sheet.commonName}`} />
      {mayEdit ? (
        <SpeciesForm organisationId={sheet.organisationId} sheet={sheet} />
      ) : (
        <Notice tone="warning" title="You can read this sheet but not change it">
          Species sheets are kept by the organisation’s owner and staff. Ask one of them to make the change.
        </Notice>
      )}
    </>
  );
}
