import type { Metadata } from 'next';
import Link from '@/components/ui/Link';
import { SpeciesForm } from '@/components/species/SpeciesForm';
import { Notice } from '@/components/ui/Notice';
import { PageHeader } from '@/components/ui/PageHeader';
import { link } from '@/components/ui/styles';
import { requireUser } from '@/lib/session';
import { loadSheet } from '../../load';

export const metadata: Metadata = { title: 'Edit species sheet' };

export default async function EditSpeciesPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requireUser(`/species/${id}/edit`);
  const { sheet, mayEdit } = await loadSheet(user, id);
  return (
    <>
      <p className="mb-2 text-body">
        <Link href={`/species/${sheet.id}`} className={link}>
          ← {sheet.commonName}
        </Link>
      </p>
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
