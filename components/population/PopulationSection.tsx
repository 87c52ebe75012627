import { ExampleDataMark } from '@/components/lamp-log/ExampleDataMark';
import { card } from '@/components/ui/styles';
import type { AdoptionView } from '@/lib/population/queries';
import { MIN_LAMPS, MIN_READINGS, MIN_SPAN_MONTHS } from '@/lib/population/fit';
import type { AdoptedCurve } from '@/lib/lamp-types/schema';
import { formatMoment } from '@/lib/time/format';
import { AdoptCurveButtons } from './AdoptCurveButtons';
import { PopulationChart, type PopulationView } from './PopulationChart';
import { PopulationTable } from './PopulationTable';

/**
 * What the shop's own tests say about a lamp type: the curve measured from every reading of its lamps of
 * this type (enclosures and counter), drawn against the catalogue's, with the counts behind it — or, with
 * too few tests, how many more it takes. Staff and owners may adopt it for the organisation's lamps.
 */
export function PopulationSection({
  typeName,
  lampTypeId,
  view,
  adopted,
  history,
  mayAdopt,
  example,
  zone,
}: {
  typeName: string;
  lampTypeId: number;
  /** Null when the curve could not be worked out just now (the engine threads were busy). */
  view: PopulationView | null;
  adopted: AdoptedCurve | null;
  history: AdoptionView[];
  mayAdopt: boolean;
  example: boolean;
  zone: string;
}) {
  const when = (iso: string) => formatMoment(iso, zone, 'day');
  return (
    <section
      className={`${card} space-y-4 p-5`}
      aria-labelledby="population-heading"
      data-testid="population"
    >
      <div>
        <h2 id="population-heading" className="text-lead font-semibold text-basalt-900">
          How your lamps of this type age
          {example && <ExampleDataMark compact />}
        </h2>
        <p className="text-body text-basalt-700">
          Learned from every reading of your organisation’s lamps of this type — in enclosures and tested at
          the counter — each brought to the bare lamp at 30 cm and compared with the catalogue’s new lamp.
        </p>
      </div>
      {view === null ? (
        <p role="alert" className="text-body text-ember-700" data-testid="population-error">
          The measured curve could not be worked out just now (the server is busy): reload the page in a
          minute. The curve in force below is unchanged.
        </p>
      ) : (
        <PopulationFigures view={view} typeName={typeName} />
      )}
      <div className="space-y-2 border-t border-basalt-100 pt-3" data-testid="curve-in-force">
        <p className="text-body text-basalt-800">
          {adopted
            ? `In force for your lamps of this type: your shop’s measured curve (${adopted.lamps} lamps, ${adopted.readings} readings), adopted ${when(adopted.adoptedAt)}. The lamp log’s outlooks, the counter’s verdicts and the guided start’s lamps age by it; a new lamp’s output stays the catalogue’s figure.`
            : 'In force for your lamps of this type: the catalogue’s curve.'}
        </p>
        <AdoptCurveButtons
          lampTypeId={lampTypeId}
          adopted={Boolean(adopted)}
          mayAdopt={mayAdopt && view !== null && view.ok}
        />
        <p className="text-caption text-basalt-600">
          A curve needs at least {MIN_LAMPS} lamps, {MIN_READINGS} readings and {MIN_SPAN_MONTHS} months of
          lamp age between them. Adopting freezes the curve as it is now; later tests change the curve shown
          here, not the one in force, until it is adopted again.
        </p>
        {history.length > 0 && (
          <details className="text-body text-basalt-700">
            <summary className="cursor-pointer">Adoptions of this type ({history.length})</summary>
            <ul className="mt-1 list-disc pl-5">
              {history.map((h) => (
                <li key={h.id}>
                  Adopted {when(h.adoptedAt)}
                  {h.adoptedBy ? ` by ${h.adoptedBy}` : ''} ({h.lamps} lamps, {h.readings} readings
                  {h.halfLifeMonths !== null ? `, half-life ${h.halfLifeMonths.toFixed(1)} months` : ''})
                  {h.withdrawnAt
                    ? `; out of force ${when(h.withdrawnAt)}${h.withdrawnBy ? ` (${h.withdrawnBy})` : ''}`
                    : '; in force'}
                  .
                </li>
              ))}
            </ul>
          </details>
        )}
      </div>
    </section>
  );
}

/** The counts, the summary (or why there is no curve), and the chart with its table. */
function PopulationFigures({ view, typeName }: { view: PopulationView; typeName: string }) {
  return (
    <>
      <p className="text-body text-basalt-800" data-testid="population-counts">
        {view.readings} reading{view.readings === 1 ? '' : 's'} of {view.lamps} lamp
        {view.lamps === 1 ? '' : 's'} ({view.enclosureLamps} in enclosures, {view.counterLamps} at the
        counter), over {view.spanMonths.toFixed(1)} months of lamp age
        {view.left > 0 ? `; ${view.left} more left out (burn-in, or not brought to the bare lamp)` : ''}.
      </p>
      {view.ok ? (
        <p className="text-body text-basalt-800" data-testid="population-summary">
          {view.note} A new lamp measures about {Math.round(view.startShare * 100)} % of the catalogue’s
          figure
          {view.halfLifeMonths !== null
            ? `, and its output halves in about ${view.halfLifeMonths.toFixed(1)} months of 12-hour days`
            : ''}
          . Every figure is an estimate from meter readings: check each lamp with a meter.
        </p>
      ) : (
        <p
          className="rounded-md border border-basalt-200 bg-basalt-50 px-3 py-2 text-body text-basalt-800"
          data-testid="population-not-enough"
        >
          {view.message}
        </p>
      )}
      <div className="grid gap-4 xl:grid-cols-[3fr_2fr]">
        <PopulationChart view={view} typeName={typeName} />
        <PopulationTable view={view} />
      </div>
    </>
  );
}
