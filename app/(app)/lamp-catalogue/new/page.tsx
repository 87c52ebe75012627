import type { Metadata } from 'next';
import { LampTypeForm } from '@/components/catalogue/LampTypeForm';
import { NewEntryPage } from '../../catalogue-entry';

export const metadata: Metadata = { title: 'Add a lamp type' };

export default function NewLampTypePage() {
  return (
    <NewEntryPage
      kind="lamp-type"
      title="Add a lamp type"
      lead="Describe a kind of lamp by its technology — never a brand. Start from the technology’s defaults and correct what you know."
      refusal={{
        title: 'Only owners and staff add lamp types',
        body: 'Ask the organisation’s owner or staff to add the lamp you use.',
      }}
      form={(organisationId) => <LampTypeForm organisationId={organisationId} lampType={null} />}
    />
  );
}
