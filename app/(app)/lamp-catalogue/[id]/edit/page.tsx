import type { Metadata } from 'next';
import { LampTypeForm } from '@/components/catalogue/LampTypeForm';
import { EditEntryPage, type EntryPageProps } from '../../../catalogue-entry';

export const metadata: Metadata = { title: 'Edit lamp type' };

export default function EditLampTypePage({ params }: EntryPageProps) {
  return (
    <EditEntryPage
      kind="lamp-type"
      params={params}
      lead="Changes apply to lamps added from now on; designs keep the values their lamps were drawn with."
      refusal={{
        title: 'You can read this entry but not change it',
        body: 'The lamp catalogue is kept by the organisation’s owner and staff.',
      }}
      form={(lampType) => <LampTypeForm organisationId={lampType.organisationId} lampType={lampType} />}
    />
  );
}
