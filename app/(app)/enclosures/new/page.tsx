import { Breadcrumbs } from '@/components/ui/Breadcrumbs';
import type { Metadata } from 'next';
import Link from '@/components/ui/Link';
import { GuidedStart } from '@/components/guided-start/GuidedStart';
import { EmptyState } from '@/components/ui/EmptyState';
import { PageHeader } from '@/components/ui/PageHeader';
import { button } from '@/components/ui/styles';
import { TYPICAL_ENCLOSURES } from '@/lib/guided-start/typical-enclosures';
import { can } from '@/lib/permissions';
import { requireMembership, type SearchParamsProps } from '@/lib/session';
import { allSheets } from '@/lib/species/queries';
import { createAction, proposeAction } from './actions';

export const metadata: Metadata = { title: 'Guided start' };

export default async function GuidedStartPage({ searchParams }: SearchParamsProps) {
  const session = await requireMembership('/enclosures/new');
  if (!session) return null;
  const { user, organisationId } = session;
  const sheets = await allSheets(organisationId);
  const staff = can(user, 'read', { kind: 'member', organisationId });
  const wanted = Number((await searchParams).species);
  const initialSpeciesId = sheets.some((s) => s.id === wanted) ? wanted : null;
  const sizeHints = Object.fromEntries(
    Object.entries(TYPICAL_ENCLOSURES).map(([k, v]) => [k, { ...v.enclosure, lid: v.lid }]),
  );

  return (
    <>
      <Breadcrumbs trail={[{ href: '/enclosures', label: 'Enclosures' }]} />
      <PageHeader
        title="Guided start"
        lead="Tell us the species, the enclosure and its lid. Baskwell searches your lamp catalogue for a starting set-up — UV lamp, heat, basking perch and a cool-side hide — checks it against the species sheet and explains why."
      />
      {sheets.length === 0 ? (
        <EmptyState
          title="No species sheets yet"
          action={
            can(user, 'create', { kind: 'species', organisationId }) && (
              <Link href="/species/new" className={button.primary}>
                Add a species sheet
              </Link>
            )
          }
        >
          <p>The guided start plans for one species: add its sheet first.</p>
        </EmptyState>
      ) : (
        <GuidedStart
          organisationId={organisationId}
          species={sheets.map((s) => ({
            id: s.id,
            commonName: s.commonName,
            scientificName: s.scientificName,
            uvZone: s.uvZone,
            seedKey: s.seedKey,
          }))}
          chooseKeeper={staff}
          sizeHints={sizeHints}
          initialSpeciesId={initialSpeciesId}
          actions={{ propose: proposeAction, create: createAction }}
        />
      )}
    </>
  );
}
