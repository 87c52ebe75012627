import { Breadcrumbs } from '@/components/ui/Breadcrumbs';
import type { Metadata } from 'next';
import Link from '@/components/ui/Link';
import { notFound } from 'next/navigation';
import { DesignsSection } from '@/components/designs/DesignsSection';
import { EnclosureDetails } from '@/components/enclosures/EnclosureDetails';
import { PageHeader } from '@/components/ui/PageHeader';
import { UnitToggle } from '@/components/ui/UnitToggle';
import { button } from '@/components/ui/styles';
import { loadOwnedForPage } from '@/lib/access';
import { enclosureJson } from '@/lib/enclosures/queries';
import { can } from '@/lib/permissions';
import { requireUser } from '@/lib/session';

export const metadata: Metadata = { title: 'Enclosure' };

export default async function EnclosurePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requireUser(`/enclosures/${id}`);
  const found = await loadOwnedForPage('enclosure', id, user);
  // Someone else's enclosure looks exactly like a missing one.
  if (!found) notFound();
  const { canEdit, canDelete } = found;
  const enclosure = enclosureJson(found.record);
  const seesPeople = can(user, 'read', { kind: 'member', organisationId: enclosure.organisationId });
  const subtitle = [enclosure.animalName, enclosure.speciesName].filter(Boolean).join(' · ');

  return (
    <>
      <Breadcrumbs trail={[{ href: '/enclosures', label: 'Enclosures' }]} current={enclosure.name} />
      <PageHeader
        title={enclosure.name}
        lead={subtitle || undefined}
        actions={
          <>
            {/* The lamps actually installed, their meter readings and replacement dates live on their own page. */}
            <Link href={`/enclosures/${enclosure.id}/lamps`} className={button.secondary}>
              Lamps and readings
            </Link>
            <UnitToggle />
          </>
        }
      />
      <div className="space-y-8">
        <EnclosureDetails
          enclosure={enclosure}
          chooseKeeper={seesPeople ? { organisationId: enclosure.organisationId } : undefined}
          canEdit={canEdit}
          canDelete={canDelete}
        />
        <DesignsSection enclosureId={enclosure.id} canEdit={canEdit} />
      </div>
    </>
  );
}
