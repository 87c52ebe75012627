import type { Metadata } from 'next';
import Link from '@/components/ui/Link';
import { SpeciesList } from '@/components/species/SpeciesList';
import { EmptyState } from '@/components/ui/EmptyState';
import { PageHeader } from '@/components/ui/PageHeader';
import { button } from '@/components/ui/styles';
import { can } from '@/lib/permissions';
import { requireMembership } from '@/lib/session';
import { allSheets } from '@/lib/species/queries';

export const metadata: Metadata = { title: 'Species' };

export default async function SpeciesPage() {
  const session = await requireMembership('/species');
  if (!session) return null;
  const { user, organisationId } = session;
  const mayEdit = can(user, 'create', { kind: 'species', organisationId });
  const sheets = await allSheets(organisationId);
  return (
    <>
      <PageHeader
        title="Species"
        lead="Species sheets: what each species needs from its light and heat. Designs are checked against them."
        actions={
          mayEdit && (
            <Link href="/species/new" className={button.primary}>
              New species sheet
            </Link>
          )
        }
      />
      {sheets.length === 0 ? (
        <EmptyState title="No species sheets yet">
          <p>
            A sheet records the species&apos; UV zone (Ferguson zones 1–4), the UVB and UV Index wanted in the
            basking zone, and the basking-surface and cool-side temperatures, with where each figure comes
            from.
          </p>
          <p>
            {mayEdit
              ? 'Owners and staff add and edit sheets; keepers read them.'
              : 'Owners and staff of your organisation add sheets here; you can read them.'}{' '}
            Check every sheet against current husbandry literature and a reptile-experienced vet.
          </p>
        </EmptyState>
      ) : (
        <SpeciesList sheets={sheets} />
      )}
    </>
  );
}
