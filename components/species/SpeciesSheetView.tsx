'use client';

import { Notice } from '@/components/ui/Notice';
import { card } from '@/components/ui/styles';
import { targetWarning, zoneBaskingUvi } from '@/lib/species/consistency';
import { FIELD_LABELS, SHEET_FIELDS, type SheetField, type SpeciesSheetDto } from '@/lib/species/schema';
import { LOW_MELANIN_CAUTION, neededBaskingCm, UV_ZONES, type UvZone } from '@/simulation';
import { formatLengthRounded } from '@/shared/units';
import { formatRange, formatTempRange, formatTempValue, zoneHabit } from './format';
import { UnitToggle } from '@/components/ui/UnitToggle';
import { useLengthUnit, useTempUnit } from '@/components/ui/units';

/** One species sheet, every figure with the number of the source it comes from. */
export function SpeciesSheetView({ sheet }: { sheet: SpeciesSheetDto }) {
  const [unit] = useTempUnit();
  const [lengthUnit] = useLengthUnit();
  const zone = UV_ZONES[sheet.uvZone as UvZone];
  const baskingUvi = zoneBaskingUvi(sheet.uvZone as UvZone);
  const values: Record<SheetField, string> = {
    uvZone: `Zone ${sheet.uvZone} — ${zoneHabit(zone.label)}; UV Index ${baskingUvi.min}–${baskingUvi.max} at the basking spot, ${zone.mean[0]}–${zone.mean[1]} on average`,
    uvbTargetUw: sheet.uvbTargetUw
      ? `${formatRange(sheet.uvbTargetUw, 'µW/cm²', 0)} (for reference only: the UV Index decides, and what a broadband meter reads depends on the lamp and the meter)`
      : 'none given',
    baskingSurfaceC: formatTempRange(sheet.baskingSurfaceC, unit),
    warmAirC: formatTempRange(sheet.warmAirC, unit),
    coolAirC: formatTempRange(sheet.coolAirC, unit),
    nightMinC: sheet.nightMinC === null ? 'none given' : formatTempValue(sheet.nightMinC, unit),
    photoperiodH: formatRange(sheet.photoperiodH, 'hours of light a day', 0),
    adultLengthCm:
      sheet.adultLengthCm === null
        ? 'none given (the basking spot is then only asked to be a few cm long)'
        : `${formatLengthRounded(sheet.adultLengthCm, lengthUnit)}; the basking spot must fit about ${formatLengthRounded(neededBaskingCm({ adultLengthCm: sheet.adultLengthCm }), lengthUnit)} of it`,
    climbs: sheet.climbs ? 'Yes: the underside of a mesh lid or guard counts as a surface it reaches' : 'No',
  };
  const sourceNumbers = (f: SheetField) =>
    sheet.sources.flatMap((s, i) => (s.covers.includes(f) ? [i + 1] : []));
  const warning = targetWarning(sheet.uvZone, sheet.uvbTargetUw);

  return (
    <div className="space-y-6">
      <section className={`${card} p-5`} aria-labelledby="needs-heading">
        <div className="mb-3 flex items-center justify-between gap-3">
          <h2 id="needs-heading" className="text-lead font-semibold text-basalt-900">
            Light and heat
          </h2>
          <UnitToggle quantity="temperature" />
        </div>
        <dl className="divide-y divide-basalt-100">
          {SHEET_FIELDS.map((f) => {
            const refs = sourceNumbers(f);
            return (
              <div key={f} className="grid gap-1 py-2 sm:grid-cols-[14rem_1fr_auto] sm:gap-4">
                <dt className="font-medium text-basalt-700">{FIELD_LABELS[f]}</dt>
                <dd className="tabular-nums text-basalt-900">{values[f]}</dd>
                <dd className="text-caption text-basalt-500">
                  {refs.length > 0 ? `source ${refs.map((n) => `[${n}]`).join(' ')}` : 'no source given'}
                </dd>
              </div>
            );
          })}
        </dl>
        {sheet.lowMelanin && (
          <div className="mt-4">
            <Notice tone="warning" title="Albino or hypomelanistic morph">
              {LOW_MELANIN_CAUTION}
            </Notice>
          </div>
        )}
        {warning && (
          <div className="mt-4">
            <Notice tone="warning" title="The shop rule of thumb and the UV Index target disagree">
              {warning}
            </Notice>
          </div>
        )}
      </section>

      {sheet.notes && (
        <section className={`${card} p-5`} aria-labelledby="notes-heading">
          <h2 id="notes-heading" className="mb-2 text-lead font-semibold text-basalt-900">
            Notes
          </h2>
          <p className="whitespace-pre-line text-body text-basalt-800">{sheet.notes}</p>
        </section>
      )}

      <section className={`${card} p-5`} aria-labelledby="sources-heading">
        <h2 id="sources-heading" className="mb-2 text-lead font-semibold text-basalt-900">
          Sources
        </h2>
        {sheet.sources.length === 0 ? (
          <p className="text-body text-ember-800">
            No source is given for this sheet. Treat every figure as unverified until someone adds one.
          </p>
        ) : (
          <ol className="space-y-3">
            {sheet.sources.map((s, i) => (
              <li key={i} className="grid grid-cols-[2rem_1fr] text-body">
                <span className="font-medium text-basalt-500">[{i + 1}]</span>
                <div>
                  <p className="text-basalt-900">{s.citation}</p>
                  <p className="text-caption text-basalt-600">Confidence: {s.confidence}</p>
                  {s.covers.length > 0 && (
                    <p className="text-caption text-basalt-500">
                      For: {s.covers.map((c) => FIELD_LABELS[c]).join(', ')}
                    </p>
                  )}
                </div>
              </li>
            ))}
          </ol>
        )}
      </section>
    </div>
  );
}
