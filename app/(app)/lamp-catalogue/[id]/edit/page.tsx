import { Breadcrumbs } from '@/components/ui/Breadcrumbs';
import type { Metadata } from 'next';
import { LampTypeForm } from '@/components/catalogue/LampTypeForm';
import { Notice } from '@/components/ui/Notice';
import { PageHeader } from '@/components/ui/PageHeader';
import { requireUser } from '@/lib/session';
import { loadLampType } from '../../load';

export const metadata: Metadata = { title: 'Edit lamp type' };

export default async function EditLampTypePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requireUser(`/lamp-catalogue/${id}/edit`);
  const { lampType, mayEdit } = await loadLampType(user, id);
  return (
    <>
      <Breadcrumbs trail={[{ href: `/lamp-catalogue/${lampType.id}`, label: lampType.name }]} />
      <PageHeader
        title={`Edit: ${lampType.name}`}
        lead="Changes apply to lamps added from now on; designs keep the values their lamps were drawn with."
      />
      {mayEdit ? (
        <LampTypeForm organisationId={lampType.organisationId} lampType={lampType} />
      ) : (
        <Notice tone="warning" title="You can read this entry but not change it">
          The lamp catalogue is kept by the organisation’s owner and staff.
        </Notice>
      )}
    </>
  );
}
