import type { Metadata } from 'next';
import Link from '@/components/ui/Link';
import { LampTypeTable } from '@/components/catalogue/LampTypeTable';
import { EmptyState } from '@/components/ui/EmptyState';
import { Notice } from '@/components/ui/Notice';
import { PageHeader } from '@/components/ui/PageHeader';
import { button } from '@/components/ui/styles';
import { allLampTypes } from '@/lib/lamp-types/queries';
import { can } from '@/lib/permissions';
import { requireMembership } from '@/lib/session';

export const metadata: Metadata = { title: 'Lamp catalogue' };

export default async function LampCataloguePage() {
  const session = await requireMembership('/lamp-catalogue');
  if (!session) return null;
  const { user, organisationId } = session;
  const lampTypes = await allLampTypes(organisationId);
  const mayEdit = can(user, 'create', { kind: 'lamp-type', organisationId });
  const add = mayEdit && (
    <Link href="/lamp-catalogue/new" className={button.primary}>
      Add a lamp type
    </Link>
  );

  return (
    <>
      <PageHeader
        title="Lamp catalogue"
        lead="Generic lamp technologies and the defaults a new lamp of each kind gets in a design: UVB at 30 cm, UV Index ratio, heat, beam, power and ageing."
        actions={add}
      />
      <div className="mb-6">
        <Notice tone="warning" title="Catalogue values are typical, not your lamp">
          Real lamps of one technology differ widely. Each entry says where its figures come from; most are
          common practice or from memory. A meter reading of the real lamp, logged in the lamp log, is what
          counts.
        </Notice>
      </div>
      {lampTypes.length === 0 ? (
        <EmptyState title="No lamp types yet" action={add}>
          <p>Each entry describes a kind of lamp by its technology, output, beam, power and ageing.</p>
          {!mayEdit && <p>Owners and staff of your organisation add entries here.</p>}
        </EmptyState>
      ) : (
        <LampTypeTable lampTypes={lampTypes} />
      )}
    </>
  );
}
