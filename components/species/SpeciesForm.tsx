'use client';

import { Field } from '@/components/ui/Field';
import { TextArea } from '@/components/ui/TextArea';
import { formatLength } from '@/shared/units';
import { FormActions } from '@/components/ui/FormActions';
import { Notice } from '@/components/ui/Notice';
import { card, input } from '@/components/ui/styles';
import { targetWarning, zoneBaskingUvi, zoneTargetText } from '@/lib/species/consistency';
import { speciesInputSchema, type SpeciesSheetDto } from '@/lib/species/schema';
import { UV_ZONES, type UvZone } from '@/simulation';
import { initialState, toPayload, withUnit, type SpeciesFormState, type TempRangeField } from './form-state';
import { zoneHabit } from './format';
import { SourcesEditor } from './SourcesEditor';
import { UnitToggle } from '@/components/ui/UnitToggle';
import { useTempUnit } from '@/components/ui/units';
import { useEntryForm } from '@/components/ui/useEntryForm';

const TEMP_LABELS: Record<TempRangeField, string> = {
  baskingSurfaceC: 'Basking surface',
  warmAirC: 'Warm side air',
  coolAirC: 'Cool side air',
};

/** Create (no `sheet`) or edit a species sheet. Validates with the API's own schema before sending. */
export function SpeciesForm({
  organisationId,
  sheet,
}: {
  organisationId: number;
  sheet: SpeciesSheetDto | null;
}) {
  const [unit] = useTempUnit();
  const form = useEntryForm<SpeciesFormState, SpeciesSheetDto>({
    initial: () => initialState(sheet, unit),
    toPayload,
    schema: speciesInputSchema,
    createPath: '/api/species',
    createExtra: { organisationId },
    updatePath: sheet ? `/api/species/${sheet.id}` : null,
    savedHref: (saved) => `/species/${saved.id}`,
    failure: 'The sheet could not be saved. Try again.',
  });
  const { draft: state, update, errors, general, saving } = form;

  // Temperatures follow the page's °C/°F choice (state derived during render, as React recommends).
  if (state.unit !== unit) form.reshow(withUnit(state, unit));

  const setPair = (key: 'uvbTargetUw' | 'photoperiodH', end: 'min' | 'max', v: string) =>
    update({ [key]: { ...state[key], [end]: v } });
  const setTemp = (key: TempRangeField, end: 'min' | 'max', v: string) =>
    update({ temps: { ...state.temps, [key]: { ...state.temps[key], [end]: v } } });

  const err = (path: string) => errors[path] ?? null;
  const pairError = (key: string) => err(`${key}.min`) ?? err(`${key}.max`) ?? err(key);
  const zoneWarning = (() => {
    const zone = Number(state.uvZone);
    const min = Number(state.uvbTargetUw.min);
    const max = Number(state.uvbTargetUw.max);
    if (!zone || !state.uvbTargetUw.min || !state.uvbTargetUw.max || !(min <= max)) return null;
    return targetWarning(zone, { min, max });
  })();

  const zoneText = [1, 2, 3, 4].includes(Number(state.uvZone))
    ? zoneTargetText(Number(state.uvZone) as UvZone)
    : null;

  return (
    <form onSubmit={form.submit} noValidate className="space-y-6">
      {general && <Notice tone="error">{general}</Notice>}

      <fieldset className={`${card} grid gap-4 p-5 sm:grid-cols-2`}>
        <legend className="px-1 text-lead font-semibold text-basalt-900">Species</legend>
        <Field
          label="Common name"
          value={state.commonName}
          onChange={(e) => update({ commonName: e.target.value })}
          error={err('commonName')}
          required
        />
        <Field
          label="Scientific name"
          value={state.scientificName}
          onChange={(e) => update({ scientificName: e.target.value })}
          error={err('scientificName')}
          required
        />
        <div className="sm:col-span-2">
          <label htmlFor="uv-zone" className="mb-1 block text-body font-medium text-basalt-800">
            UV Index target (Ferguson zone)
          </label>
          <select
            id="uv-zone"
            className={input}
            value={state.uvZone}
            onChange={(e) => update({ uvZone: e.target.value })}
            aria-invalid={err('uvZone') ? true : undefined}
            aria-describedby="uv-zone-target uv-zone-derived"
          >
            <option value="">Choose a zone…</option>
            {([1, 2, 3, 4] as UvZone[]).map((z) => {
              const uvi = zoneBaskingUvi(z);
              return (
                <option key={z} value={z}>
                  {`Zone ${z}: ${zoneHabit(UV_ZONES[z].label)} — UV Index ${uvi.min}–${uvi.max} at the basking spot`}
                </option>
              );
            })}
          </select>
          {zoneText ? (
            <>
              <p
                id="uv-zone-target"
                className="mt-1 text-caption text-basalt-700"
                data-testid="uv-zone-target"
              >
                {zoneText.target} Zones of Ferguson et al. 2010 (Zoo Biology 29:317–334).
              </p>
              <p
                id="uv-zone-derived"
                className="mt-1 text-caption text-basalt-500"
                data-testid="uv-zone-derived"
              >
                {zoneText.derived}
              </p>
            </>
          ) : (
            <p id="uv-zone-target" className="mt-1 text-caption text-basalt-500">
              The zone sets the UV Index the basking spot is judged by (Ferguson et al. 2010, Zoo Biology
              29:317–334).
            </p>
          )}
          {err('uvZone') && <p className="mt-1 text-caption font-medium text-ember-700">{err('uvZone')}</p>}
        </div>
        <RangeInputs
          legend="Shop rule of thumb (optional, µW/cm² on a broadband meter)"
          hint="Shown beside the UV Index verdict for keepers with a broadband UVB meter, never deciding it: lamps differ several-fold in UV Index per µW/cm², and meters in what they read."
          value={state.uvbTargetUw}
          onChange={(end, v) => setPair('uvbTargetUw', end, v)}
          error={pairError('uvbTargetUw')}
        />
        {zoneWarning && (
          <div className="sm:col-span-2">
            <Notice tone="warning">{zoneWarning}</Notice>
          </div>
        )}
      </fieldset>

      <fieldset className={`${card} grid gap-4 p-5 sm:grid-cols-2`}>
        <legend className="px-1 text-lead font-semibold text-basalt-900">Temperatures</legend>
        <div className="flex items-center justify-end sm:col-span-2">
          <UnitToggle quantity="temperature" />
        </div>
        {(Object.keys(TEMP_LABELS) as TempRangeField[]).map((k) => (
          <RangeInputs
            key={k}
            legend={`${TEMP_LABELS[k]} (°${state.unit})`}
            value={state.temps[k]}
            onChange={(end, v) => setTemp(k, end, v)}
            error={pairError(k)}
          />
        ))}
        <Field
          label={`Night minimum (°${state.unit}, optional)`}
          inputMode="decimal"
          value={state.nightMin}
          onChange={(e) => update({ nightMin: e.target.value })}
          error={err('nightMinC')}
        />
        <RangeInputs
          legend="Photoperiod (hours of light a day, optional)"
          value={state.photoperiodH}
          onChange={(end, v) => setPair('photoperiodH', end, v)}
          error={pairError('photoperiodH')}
        />
      </fieldset>

      <fieldset className={`${card} grid gap-4 p-5 sm:grid-cols-2`}>
        <legend className="px-1 text-lead font-semibold text-basalt-900">The animal</legend>
        <Field
          label="Adult total length (cm, nose to tail tip; optional)"
          inputMode="decimal"
          value={state.adultLength}
          onChange={(e) => update({ adultLength: e.target.value })}
          error={err('adultLengthCm')}
          hint={
            Number(state.adultLength) > 0
              ? `${formatLength(Number(state.adultLength), 'in')}. The basking spot must fit about its head and body.`
              : 'Sizes the basking spot: UV and heat must meet over about its head and body.'
          }
        />
        <div className="flex flex-col gap-3">
          <Check
            label="Climbs walls and mesh"
            hint="The check then counts the underside of every mesh, lid included, as a place it can reach."
            checked={state.climbs}
            onChange={(climbs) => update({ climbs })}
          />
          <Check
            label="Albino or hypomelanistic morph"
            hint="Less skin pigment: the check aims one UV zone lower and shows a caution."
            checked={state.lowMelanin}
            onChange={(lowMelanin) => update({ lowMelanin })}
          />
        </div>
      </fieldset>

      <fieldset className={`${card} p-5`}>
        <legend className="px-1 text-lead font-semibold text-basalt-900">Notes</legend>
        <TextArea
          id="notes"
          label="Notes"
          hideLabel
          rows={4}
          value={state.notes}
          onChange={(e) => update({ notes: e.target.value })}
          error={err('notes')}
        />
      </fieldset>

      <SourcesEditor sources={state.sources} onChange={(sources) => update({ sources })} errors={errors} />

      <FormActions
        saving={saving}
        submitLabel={sheet ? 'Save changes' : 'Add species sheet'}
        onCancel={form.cancel}
      />
    </form>
  );
}

function RangeInputs({
  legend,
  hint,
  value,
  onChange,
  error,
}: {
  legend: string;
  hint?: string;
  value: { min: string; max: string };
  onChange: (end: 'min' | 'max', v: string) => void;
  error: string | null;
}) {
  return (
    <fieldset>
      <legend className="mb-1 block text-body font-medium text-basalt-800">{legend}</legend>
      <div className="flex items-center gap-2">
        <input
          aria-label={`${legend}: from`}
          inputMode="decimal"
          className={input}
          value={value.min}
          onChange={(e) => onChange('min', e.target.value)}
          aria-invalid={error ? true : undefined}
        />
        <span aria-hidden className="text-basalt-500">
          –
        </span>
        <input
          aria-label={`${legend}: to`}
          inputMode="decimal"
          className={input}
          value={value.max}
          onChange={(e) => onChange('max', e.target.value)}
          aria-invalid={error ? true : undefined}
        />
      </div>
      {hint && <p className="mt-1 text-caption text-basalt-500">{hint}</p>}
      {error && <p className="mt-1 text-caption font-medium text-ember-700">{error}</p>}
    </fieldset>
  );
}

function Check({
  label,
  hint,
  checked,
  onChange,
}: {
  label: string;
  hint: string;
  checked: boolean;
  onChange: (v: boolean) => void;
}) {
  return (
    <label className="flex items-start gap-2 text-body text-basalt-800">
      <input
        type="checkbox"
        className="mt-1"
        checked={checked}
        onChange={(e) => onChange(e.target.checked)}
      />
      <span>
        {label}
        <span className="block text-caption text-basalt-500">{hint}</span>
      </span>
    </label>
  );
}
