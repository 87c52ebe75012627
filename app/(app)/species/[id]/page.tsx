import { Breadcrumbs } from '@/components/ui/Breadcrumbs';
import { LocalTime } from '@/components/ui/LocalTime';
import Link from '@/components/ui/Link';
import { DeleteSheetButton } from '@/components/species/DeleteSheetButton';
import { ProvenanceNote } from '@/components/species/ProvenanceNote';
import { SpeciesSheetView } from '@/components/species/SpeciesSheetView';
import { PageHeader } from '@/components/ui/PageHeader';
import { button } from '@/components/ui/styles';
import { requireUser } from '@/lib/session';
import { entryMetadata, type EntryPageProps, loadEntry } from '../../catalogue-entry';

export const generateMetadata = entryMetadata('species');

export default async function SpeciesSheetPage({ params }: EntryPageProps) {
  const { id } = await params;
  const user = await requireUser(`/species/${id}`);
  const { entry: sheet, mayEdit } = await loadEntry('species', user, id);

  return (
    <>
      <Breadcrumbs trail={[{ href: '/species', label: 'All species' }]} />
      <PageHeader
        title={sheet.commonName}
        lead={<span className="italic">{sheet.scientificName}</span>}
        actions={
          <>
            <Link
              href={`/enclosures/new?species=${sheet.id}`}
              className={mayEdit ? button.secondary : button.primary}
            >
              Plan an enclosure
            </Link>
            {mayEdit && (
              <>
                <Link href={`/species/${sheet.id}/edit`} className={button.primary}>
                  Edit sheet
                </Link>
                <DeleteSheetButton id={sheet.id} name={sheet.commonName} />
              </>
            )}
          </>
        }
      />
      <div className="mb-6">
        <ProvenanceNote sources={sheet.sources} startingSheet={sheet.seedKey !== null} />
      </div>
      <SpeciesSheetView sheet={sheet} />
      <p className="mt-6 text-caption text-basalt-500">
        Last changed <LocalTime value={sheet.updatedAt} shown="day" />.{' '}
        {!mayEdit && 'Only the organisation’s owner and staff can change this sheet.'}
      </p>
    </>
  );
}
