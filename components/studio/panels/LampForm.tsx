'use client';
import { LAMP_TECHS, type LampPresetId } from '@/simulation';
import { measuredCurveNote } from '@/lib/lamp-log/decay';
import {
  applyCatalogueType,
  applyForm,
  applyPreset,
  applyTech,
  matchingCatalogueCurve,
  matchingCatalogueType,
  matchingPreset,
  PRESET_OPTIONS,
  TECH_OPTIONS,
} from '../state/lampPresets';
import { calibrationDate } from '../state/calibration';
import type { LampObject } from '../state/types';
import { Grid2, NumberField, Section, SelectField } from './FormFields';
import { useObjectEdit } from './useObjectEdit';
import { useCommandContext, useStudio } from '../hooks/useStudio';
import { checkWithinDepth } from './validate';

/** The lamp's output figures: each optional, its technology's typical value shown when left empty. */
function outputFields(d: (typeof LAMP_TECHS)[keyof typeof LAMP_TECHS]) {
  return [
    {
      key: 'uvbAt30',
      label: 'UVB at 30 cm',
      plainUnit: 'µW/cm²',
      fallback: d.uvbAt30,
      hint: 'New, bare, straight below',
    },
    { key: 'uviPerUvb', label: 'UVI per µW/cm²', fallback: d.uviPerUvb, hint: 'Depends on the spectrum' },
    { key: 'reflectorGain', label: 'Reflector gain', plainUnit: '×', fallback: 1, hint: '1 = no reflector' },
    { key: 'beamDeg', label: 'Beam angle', plainUnit: '°', fallback: d.beamDeg },
    { key: 'watts', label: 'Power', plainUnit: 'W', fallback: d.watts },
    { key: 'ageMonths', label: 'Age', plainUnit: 'months', fallback: 0, hint: 'Time in use so far' },
  ] as const;
}

export function LampForm({ lamp }: { lamp: LampObject }) {
  const { field, replace, units } = useObjectEdit(lamp);
  const { store } = useCommandContext();
  const depth = useStudio(store, (s) => s.history.present.enclosure.depth);
  const z = field('z', 'length');
  const d = LAMP_TECHS[lamp.tech];
  const preset = matchingPreset(lamp);
  // The shop's own catalogue types whose measured curve was adopted: a lamp made from one ages by it.
  const catalogue = useStudio(store, (s) => s.session.catalogueTypes);
  const readOnly = useStudio(store, (s) => s.readOnly);
  const measured = matchingCatalogueCurve(lamp, catalogue);
  const fromCatalogue = matchingCatalogueType(lamp, catalogue);
  return (
    <>
      <Section title="Lamp type">
        {lamp.calibration ? (
          <p
            className="rounded-md border border-moss-300 bg-moss-50 px-2 py-1.5 text-sm text-moss-900"
            data-testid="lamp-calibrated"
          >
            <span className="font-semibold">
              <span aria-hidden="true">✓ </span>Calibrated {calibrationDate(lamp.calibration.at)}
            </span>{' '}
            from {lamp.calibration.from}: the output figures below are this lamp’s, from the lamp log.
            Changing them by hand removes the mark.
          </p>
        ) : (
          <p className="text-caption text-basalt-500" data-testid="lamp-uncalibrated">
            Not calibrated: catalogue figures. Log meter readings of the real lamp to calibrate it.
          </p>
        )}
        <SelectField<LampPresetId>
          label="Preset (generic lamp class)"
          testId="lamp-preset"
          value={preset ?? ''}
          options={[{ value: '', label: 'Custom values', disabled: true }, ...PRESET_OPTIONS]}
          onChange={(id) => replace(applyPreset(lamp, id))}
        />
        {!readOnly && catalogue.length > 0 && (
          <SelectField
            label="From your catalogue"
            testId="lamp-catalogue"
            value={fromCatalogue?.id ?? ''}
            options={[
              { value: '', label: 'Choose a type', disabled: true },
              ...catalogue.map((t) => ({ value: t.id, label: t.name })),
            ]}
            onChange={(id) => {
              const t = catalogue.find((c) => c.id === id);
              if (t) replace(applyCatalogueType(lamp, t));
            }}
          />
        )}
        {measured && (
          <p className="text-caption text-moss-900" data-testid="lamp-measured-curve">
            {measuredCurveNote(measured.lamps, measured.name)}
          </p>
        )}
        <Grid2>
          <SelectField
            label="Technology"
            testId="lamp-tech"
            value={lamp.tech}
            options={TECH_OPTIONS}
            onChange={(t) => replace(applyTech(lamp, t))}
          />
          <SelectField
            label="Shape"
            testId="lamp-form"
            value={lamp.form}
            options={[
              { value: 'tube', label: 'Tube' },
              { value: 'bulb', label: 'Bulb' },
            ]}
            onChange={(f) => replace(applyForm(lamp, f))}
          />
        </Grid2>
        <p className="text-caption text-basalt-500">
          Presets are generic classes with typical figures. Override any value below with your lamp’s own,
          ideally from a meter reading.
        </p>
      </Section>
      <Section title="Position">
        <Grid2>
          <NumberField
            label={lamp.form === 'tube' ? 'Centre x' : 'x'}
            testId="field-x"
            {...field('x', 'length')}
          />
          <NumberField label="Height y" testId="field-y" {...field('y', 'length')} />
          {lamp.form === 'tube' && (
            <NumberField label="Tube length" testId="field-length" {...field('length', 'length')} />
          )}
          <NumberField
            label="From the front"
            optional
            fallback={depth / 2}
            testId="field-z"
            hint="Depth: 0 is the front glass"
            {...z}
            check={(v) => checkWithinDepth(v, depth, units) ?? z.check(v)}
          />
        </Grid2>
      </Section>
      <Section title="Output">
        <Grid2>
          {outputFields(d).map(({ key, ...f }) => (
            <NumberField key={key} optional testId={`field-${key}`} {...f} {...field(key, 'plain')} />
          ))}
        </Grid2>
      </Section>
    </>
  );
}
