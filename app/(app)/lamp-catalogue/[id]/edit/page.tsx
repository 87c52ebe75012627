import type { Metadata } from 'next';
import { LampTypeForm } from '@/components/catalogue/LampTypeForm';
import { EntryFormPage } from '@/components/ui/EntryFormPage';
import { requireUser } from '@/lib/session';
import { loadLampType } from '../../load';

export const metadata: Metadata = { title: 'Edit lamp type' };

export default async function EditLampTypePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requireUser(`/lamp-catalogue/${id}/edit`);
  const { lampType, mayEdit } = await loadLampType(user, id);
  return (
    <EntryFormPage
      back={{ href: `/lamp-catalogue/${lampType.id}`, label: lampType.name }}
      title={`Edit: ${lampType.name}`}
      lead="Changes apply to lamps added from now on; designs keep the values their lamps were drawn with."
      allowed={mayEdit}
      refusal={{
        title: 'You can read this entry but not change it',
        body: 'The lamp catalogue is kept by the organisation’s owner and staff.',
      }}
    >
      <LampTypeForm organisationId={lampType.organisationId} lampType={lampType} />
    </EntryFormPage>
  );
}
