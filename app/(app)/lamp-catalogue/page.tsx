import type { Metadata } from 'next';
import { EmptyState } from '@/components/ui/EmptyState';
import { PageHeader } from '@/components/ui/PageHeader';
import { can } from '@/lib/permissions';
import { currentMembership, requireUser } from '@/lib/session';

export const metadata: Metadata = { title: 'Lamp catalogue' };

export default async function LampCataloguePage() {
  const user = await requireUser('/lamp-catalogue');
  const membership = await currentMembership(user);
  const mayEdit = membership
    ? can(user, 'create', { kind: 'lamp-type', organisationId: membership.organisationId })
    : false;
  return (
    <>
      <PageHeader
        title="Lamp catalogue"
        lead="The lamp types your organisation uses: technology, wattage, UVB output at 30 cm and beam."
      />
      <EmptyState title="No lamp types yet">
        <p>
          Each entry describes a kind of lamp by its technology (T5 or T8 tube, compact, mercury vapour, metal
          halide, LED UVB, halogen, incandescent, ceramic), its UVB at 30 cm when new, its UV Index ratio,
          wattage and beam. Designs and the lamp log pick lamps from here.
        </p>
        <p>
          {mayEdit
            ? 'Owners and staff add and edit entries here.'
            : 'Owners and staff of your organisation add entries here.'}{' '}
          Catalogue values are averages: a meter reading of the real lamp is what counts.
        </p>
      </EmptyState>
    </>
  );
}
