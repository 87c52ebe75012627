'use client';

import type { ComponentProps } from 'react';
import { Field } from '@/components/ui/Field';
import { Select } from '@/components/ui/Select';
import { THROUGH_LABEL, WARMED_UP_LABEL } from '@/shared/reading-setup';
import { shareInput } from '@/components/ui/share-input';

/**
 * How a reading was taken — what lay between lamp and meter (with the share of UVB it passes) and
 * whether the lamp had warmed up — the fields every reading form asks, the lamp log's and the counter's.
 * `through` is controlled (the share field depends on it); the rest are named form fields.
 */
export function ReadingSetupFields({
  through,
  onThrough,
  shareDefault,
  lidShare,
  warmedUpDefault,
  error,
  lidHint = 'The lamp’s setting for its lid; change it if you measured through another.',
  onWarmedUp,
}: {
  through: string;
  onThrough: (value: string) => void;
  shareDefault: number | '';
  /** The share the lid is known to pass, or null (then the field is required for a lid). */
  lidShare: number | null;
  warmedUpDefault: string;
  error: (field: string) => string | null;
  lidHint?: string;
  onWarmedUp?: (value: string) => void;
}) {
  return (
    <>
      <Select
        label="Between lamp and meter"
        name="through"
        value={through}
        onChange={(e) => onThrough(e.target.value)}
        required
        error={error('through')}
      >
        <option value="" disabled>
          Choose…
        </option>
        {(['nothing', 'lid', 'screen', 'glass'] as const).map((t) => (
          <option key={t} value={t}>
            {THROUGH_LABEL[t]}
          </option>
        ))}
      </Select>
      {['lid', 'screen', 'glass'].includes(through) && (
        <Field
          // A fresh field for each choice, so the lid's own share is filled in when it is chosen.
          key={through}
          label="Share of UVB it passes (0–1)"
          name="throughTransmission"
          {...shareInput}
          defaultValue={shareDefault}
          required={through === 'screen' || (through === 'lid' && lidShare === null)}
          hint={
            through === 'lid'
              ? lidHint
              : through === 'glass'
                ? 'Ordinary glass passes almost no UVB. Leave empty unless the maker gives a share: the reading is then kept but not used.'
                : 'Measure it: one reading with the screen and one without, at the same distance, divided.'
          }
          error={error('throughTransmission')}
        />
      )}
      <Select
        label="Lamp warmed up"
        name="warmedUp"
        defaultValue={warmedUpDefault}
        onChange={onWarmedUp ? (e) => onWarmedUp(e.target.value) : undefined}
        required
        error={error('warmedUp')}
      >
        <option value="" disabled>
          Choose…
        </option>
        <option value="yes">{WARMED_UP_LABEL.yes}</option>
        <option value="no">{WARMED_UP_LABEL.no}</option>
      </Select>
    </>
  );
}

type FieldError = (field: string) => string | null;

/** A decimal number of zero or more, as a meter or a tape measure gives it. */
const reading = { type: 'number', inputMode: 'decimal', step: 'any', min: '0', required: true } as const;

/** Where the meter was: straight below the lamp, in the page's length unit. */
export function DistanceBelowLampField({
  unit,
  error,
  ...rest
}: { unit: string; error: FieldError } & Pick<ComponentProps<typeof Field>, 'defaultValue'>) {
  return (
    <Field
      label={`Distance below the lamp (${unit})`}
      name="distance"
      {...reading}
      hint="Straight below the lamp, to the meter's sensor."
      error={error('distance')}
      {...rest}
    />
  );
}

/** What the meter showed, in the unit `MeterKindSelect` names. */
export function MeterValueField({ error }: { error: FieldError }) {
  return <Field label="Meter value" name="value" {...reading} error={error('value')} />;
}

/** The two kinds of UV meter a reading can come from. */
export function MeterKindSelect({ error }: { error: FieldError }) {
  return (
    <Select label="Meter kind" name="unit" defaultValue="uvb" error={error('unit')}>
      <option value="uvb">Broadband UVB meter (µW/cm²)</option>
      <option value="uvi">UV Index meter (UVI)</option>
    </Select>
  );
}
