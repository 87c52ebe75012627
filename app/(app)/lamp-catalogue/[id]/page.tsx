import { Breadcrumbs } from '@/components/ui/Breadcrumbs';
import Link from '@/components/ui/Link';
import { CautionList } from '@/components/cautions/CautionList';
import { DeleteLampTypeButton } from '@/components/catalogue/DeleteLampTypeButton';
import { LampTypeView } from '@/components/catalogue/LampTypeView';
import { ZoneDistancesTable } from '@/components/catalogue/ZoneDistancesTable';
import { PageHeader } from '@/components/ui/PageHeader';
import { button, card } from '@/components/ui/styles';
import { PopulationSection } from '@/components/population/PopulationSection';
import { ageingSource } from '@/lib/lamp-log/decay';
import { populationPage } from '@/lib/population/queries';
import { requireUser } from '@/lib/session';
import { viewerZone } from '@/lib/time/viewer-zone';
import { entryMetadata, type EntryPageProps, loadEntry } from '../../catalogue-entry';

export const generateMetadata = entryMetadata('lamp-type');

export default async function LampTypePage({ params }: EntryPageProps) {
  const { id } = await params;
  const user = await requireUser(`/lamp-catalogue/${id}`);
  const { entry: lampType, mayEdit } = await loadEntry('lamp-type', user, id);
  const population = await populationPage(user, lampType.id);
  return (
    <>
      <Breadcrumbs trail={[{ href: '/lamp-catalogue', label: 'Lamp catalogue' }]} />
      <PageHeader
        title={lampType.name}
        lead={
          lampType.presetKey
            ? 'A starting entry, taken from the engine’s generic presets. Edit it to match the lamps you use.'
            : 'Added by your organisation.'
        }
        actions={
          mayEdit && (
            <>
              <Link href={`/lamp-catalogue/${lampType.id}/edit`} className={button.primary}>
                Edit
              </Link>
              <DeleteLampTypeButton id={lampType.id} name={lampType.name} />
            </>
          )
        }
      />
      <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
        <div className="space-y-6">
          <LampTypeView lampType={lampType} />
          <ZoneDistancesTable lampType={lampType} />
          {population ? (
            <PopulationSection
              typeName={lampType.name}
              lampTypeId={lampType.id}
              view={population.view}
              adopted={lampType.adoptedCurve ?? null}
              history={population.history}
              mayAdopt={population.mayAdopt}
              example={population.example}
              zone={await viewerZone()}
            />
          ) : (
            lampType.uvbAt30 > 0 && (
              <p className={`${card} p-4 text-body text-basalt-800`} data-testid="curve-in-force">
                {ageingSource(lampType)}
              </p>
            )
          )}
          {lampType.notes && (
            <section className={`${card} p-5`}>
              <h2 className="mb-2 text-lead font-semibold text-basalt-900">Notes</h2>
              <p className="whitespace-pre-line text-body text-basalt-800">{lampType.notes}</p>
            </section>
          )}
        </div>
        <CautionList
          techs={[lampType.tech]}
          spectra={[{ name: lampType.name, uviPerUvb: lampType.uviPerUvb, uvbAt30: lampType.uvbAt30 }]}
          title="Safety with this lamp"
        />
      </div>
    </>
  );
}
