import { Breadcrumbs } from '@/components/ui/Breadcrumbs';
import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { AddLampForm } from '@/components/lamp-log/AddLampForm';
import { BackdropPanel } from '@/components/lamp-log/BackdropPanel';
import { CsvImport } from '@/components/lamp-log/CsvImport';
import { ExampleDataMark } from '@/components/lamp-log/ExampleDataMark';
import { LampTable } from '@/components/lamp-log/LampTable';
import { EmptyState } from '@/components/ui/EmptyState';
import { PageHeader } from '@/components/ui/PageHeader';
import { UnitToggle } from '@/components/ui/UnitToggle';
import { card } from '@/components/ui/styles';
import { allLampTypes } from '@/lib/lamp-types/queries';
import { todayIso } from '@/lib/lamp-log/dates';
import { enclosureForLampsPage } from '@/lib/lamp-log/access';
import { designLampsOf } from '@/lib/lamp-log/design-lamps';
import { isExampleData } from '@/lib/organisations/queries';
import { lampRowsOf } from '@/lib/lamp-log/queries';
import { lampsOfEnclosure } from '@/lib/lamp-log/queries';
import { backdropsOf, uploadJson } from '@/lib/uploads/queries';
import { parseId } from '@/lib/api/schemas';
import { requireUser } from '@/lib/session';

export const metadata: Metadata = { title: 'Lamps of an enclosure' };

export default async function EnclosureLampsPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requireUser(`/enclosures/${id}/lamps`);
  const enclosureId = parseId(id);
  if (enclosureId === null) notFound();
  const found = await enclosureForLampsPage(user, enclosureId);
  if (!found) notFound();
  const { enclosure, canEdit } = found;
  const [rows, lampTypes, designLamps, backdrops, example] = await Promise.all([
    lampsOfEnclosure(enclosure.id, { limit: 200 }),
    allLampTypes(enclosure.organisationId),
    designLampsOf(enclosure.id),
    backdropsOf(enclosure.id, 12),
    isExampleData(enclosure.organisationId),
  ]);
  const lamps = await lampRowsOf(
    rows.map((l) => l.id),
    todayIso(),
  );
  const active = lamps.filter((l) => l.status !== 'retired');
  const retired = lamps.filter((l) => l.status === 'retired');

  return (
    <>
      <Breadcrumbs
        trail={[
          { href: '/enclosures', label: 'Enclosures' },
          { href: `/enclosures/${enclosure.id}`, label: enclosure.name },
        ]}
        current="Lamps"
      />
      <PageHeader
        title={`Lamps of ${enclosure.name}`}
        lead={
          enclosure.speciesName
            ? `Species: ${enclosure.speciesName}`
            : 'No species set on this enclosure: set it to date the basking zone.'
        }
        actions={<UnitToggle />}
      />
      {example && <ExampleDataMark />}
      <div className="space-y-8">
        {active.length > 0 ? (
          <LampTable lamps={active} showEnclosure={false} />
        ) : (
          <EmptyState title="No lamps in use">
            <p>
              Add the lamps of this enclosure below: the type from the catalogue, when it was first switched
              on and its hours a day.
            </p>
          </EmptyState>
        )}
        {retired.length > 0 && (
          <details>
            <summary className="cursor-pointer text-body text-basalt-700">
              Retired lamps ({retired.length})
            </summary>
            <div className="mt-2">
              <LampTable lamps={retired} showEnclosure={false} />
            </div>
          </details>
        )}
        {canEdit && (
          <div className="grid gap-6 lg:grid-cols-2">
            <section aria-labelledby="add-lamp" className={`${card} p-4`}>
              <h2 id="add-lamp" className="mb-3 text-lead font-semibold">
                Add a lamp
              </h2>
              <AddLampForm
                enclosureId={enclosure.id}
                lampTypes={lampTypes.map((t) => ({
                  id: t.id,
                  name: t.name,
                  tech: t.tech,
                  uvbAt30: t.uvbAt30,
                }))}
                designLamps={designLamps}
              />
            </section>
            <section aria-labelledby="import" className={`${card} p-4`}>
              <h2 id="import" className="mb-3 text-lead font-semibold">
                Import readings (CSV)
              </h2>
              {lamps.length > 0 ? (
                <CsvImport enclosureId={enclosure.id} />
              ) : (
                <p className="text-body text-basalt-500">
                  Add a lamp first; the file names lamps by their name.
                </p>
              )}
            </section>
          </div>
        )}
        <section aria-labelledby="photo" className={`${card} p-4`}>
          <h2 id="photo" className="mb-3 text-lead font-semibold">
            Photo for tracing in the studio
          </h2>
          <BackdropPanel enclosureId={enclosure.id} initial={backdrops.map(uploadJson)} canEdit={canEdit} />
        </section>
      </div>
    </>
  );
}
