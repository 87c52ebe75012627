'use client';

import { Field } from '@/components/ui/Field';
import { FormActions } from '@/components/ui/FormActions';
import { Notice } from '@/components/ui/Notice';
import { button, card } from '@/components/ui/styles';
import { Select } from '@/components/ui/Select';
import { TextArea } from '@/components/ui/TextArea';
import { UnitToggle } from '@/components/ui/UnitToggle';
import { useLengthUnit } from '@/components/ui/units';
import { useEntryForm } from '@/components/ui/useEntryForm';
import {
  LAMP_FIELD_LABELS,
  lampTypeInputSchema,
  type LampTypeDto,
  type LampTypeField,
} from '@/lib/lamp-types/schema';
import { LAMP_TECH_IDS, type LampTech as LampTechId } from '@/simulation';
import {
  initialLampState,
  lampPayload,
  techDefaults,
  withLengthUnit,
  type LampFormState,
} from './lamp-form-state';
import { techLabel } from './labels';

type NumericField = Exclude<LampTypeField, 'lengthCm'>;
const NUMERIC: { key: NumericField; hint: string }[] = [
  { key: 'uvbAt30', hint: 'µW/cm² directly below, 30 cm away, new and bare. 0 for heat-only lamps.' },
  { key: 'uviPerUvb', hint: 'UV Index per µW/cm² of broadband UVB; depends on the spectrum.' },
  { key: 'radiantFraction', hint: 'Share of the power leaving as radiant heat, 0 to 1.' },
  { key: 'beamDeg', hint: 'Full beam angle, 1–360° (360: a bare lamp lighting all around).' },
  {
    key: 'reflectorGain',
    hint: '1 for a bare lamp; a built-in reflector multiplies the output inside its beam.',
  },
  { key: 'watts', hint: 'Electrical power.' },
  { key: 'halfLifeMonths', hint: 'Months until UVB output halves. Empty: the technology’s default.' },
  { key: 'replaceAfterMonths', hint: 'Typical replacement interval. Empty: replace when it fails.' },
];

/** Create or edit a catalogue entry; checked with the API's own schema before sending. */
export function LampTypeForm({
  organisationId,
  lampType,
}: {
  organisationId: number;
  lampType: LampTypeDto | null;
}) {
  const [unit] = useLengthUnit();
  const form = useEntryForm<LampFormState, LampTypeDto>({
    initial: () => initialLampState(lampType, unit),
    toPayload: (st) => ({ ...lampPayload(st), decayPoints: lampType?.decayPoints ?? null }),
    schema: lampTypeInputSchema,
    createPath: '/api/lamp-types',
    createExtra: { organisationId },
    updatePath: lampType ? `/api/lamp-types/${lampType.id}` : null,
    savedHref: (saved) => `/lamp-catalogue/${saved.id}`,
    failure: 'The lamp type could not be saved. Try again.',
  });
  const { draft: st, update, errors, general, saving } = form;

  // Lengths follow the page's cm/in choice (state derived during render, as React recommends).
  if (st.lengthUnit !== unit) form.reshow(withLengthUnit(st, unit));

  return (
    <form onSubmit={form.submit} noValidate className="space-y-6">
      {general && <Notice tone="error">{general}</Notice>}
      <fieldset className={`${card} grid gap-4 p-5 sm:grid-cols-2`}>
        <legend className="px-1 text-lead font-semibold text-basalt-900">Lamp type</legend>
        <Field
          label="Name"
          value={st.name}
          onChange={(e) => update({ name: e.target.value })}
          error={errors.name}
          hint="A generic description, e.g. “T5 tube, high output, 115 cm”."
        />
        <div>
          <Select
            id="tech"
            label="Technology"
            value={st.tech}
            onChange={(e) => update({ tech: e.target.value as LampTechId })}
          >
            {LAMP_TECH_IDS.map((t) => (
              <option key={t} value={t}>
                {techLabel(t)}
              </option>
            ))}
          </Select>
          <button
            type="button"
            className={`${button.quiet} mt-1`}
            onClick={() => update(techDefaults(st.tech, st.lengthUnit))}
          >
            Fill in this technology’s defaults
          </button>
        </div>
        <Select
          id="form"
          label="Form"
          value={st.form}
          onChange={(e) => update({ form: e.target.value as 'tube' | 'bulb' })}
        >
          <option value="tube">Tube</option>
          <option value="bulb">Bulb, spot or panel</option>
        </Select>
        {st.form === 'tube' && (
          <div>
            <div className="flex items-end gap-2">
              <Field
                className="flex-1"
                label={`Tube length (${st.lengthUnit})`}
                inputMode="decimal"
                value={st.length}
                onChange={(e) => update({ length: e.target.value })}
                error={errors.lengthCm}
              />
              <UnitToggle />
            </div>
          </div>
        )}
      </fieldset>

      <fieldset className={`${card} grid gap-4 p-5 sm:grid-cols-2`}>
        <legend className="px-1 text-lead font-semibold text-basalt-900">Output and ageing</legend>
        {NUMERIC.map(({ key, hint }) => (
          <Field
            key={key}
            label={LAMP_FIELD_LABELS[key]}
            inputMode="decimal"
            value={st[key]}
            onChange={(e) => update({ [key]: e.target.value })}
            error={errors[key]}
            hint={hint}
          />
        ))}
      </fieldset>

      <fieldset className={`${card} grid gap-3 p-5`}>
        <legend className="px-1 text-lead font-semibold text-basalt-900">Where the figures come from</legend>
        <p className="text-body text-basalt-600">
          For each figure, a published source, your own meter readings, or “common practice, no published
          source”.
        </p>
        {(
          [
            'uvbAt30',
            'uviPerUvb',
            'radiantFraction',
            'beamDeg',
            'watts',
            'halfLifeMonths',
            'replaceAfterMonths',
          ] as const
        ).map((f) => (
          <Field
            key={f}
            label={`Source: ${LAMP_FIELD_LABELS[f]}`}
            value={st.sources[f] ?? ''}
            onChange={(e) => update({ sources: { ...st.sources, [f]: e.target.value } })}
            error={errors[`sources.${f}`]}
          />
        ))}
        <TextArea
          id="lamp-notes"
          label="Notes"
          rows={3}
          value={st.notes}
          onChange={(e) => update({ notes: e.target.value })}
          error={errors.notes}
        />
      </fieldset>

      <FormActions
        saving={saving}
        submitLabel={lampType ? 'Save changes' : 'Add lamp type'}
        onCancel={form.cancel}
      />
    </form>
  );
}
