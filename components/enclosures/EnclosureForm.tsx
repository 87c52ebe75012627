'use client';

import { useState, type FormEvent } from 'react';
import { Field } from '@/components/ui/Field';
import { Notice } from '@/components/ui/Notice';
import { TextArea } from '@/components/ui/TextArea';
import { fieldError } from '@/components/ui/api-client';
import { button } from '@/components/ui/styles';
import { ENCLOSURE_MAX_CM, ENCLOSURE_MIN_CM } from '@/shared/enclosure-size';
import { cmToDisplay, displayToCm } from '@/shared/units';
import { useLengthUnit } from '@/components/ui/units';
import { PersonPicker, type PickedPerson } from '@/components/people/PersonPicker';
import type { EnclosureView } from './types';

export type EnclosureInput = {
  name: string;
  keeperId?: number;
  widthCm: number;
  heightCm: number;
  depthCm: number;
  speciesName: string | null;
  animalName: string | null;
  notes: string | null;
};

type Props = {
  initial?: EnclosureView;
  /**
   * Owners and staff pick the keeper among the organisation's members, searched as they type; a
   * keeper's enclosures are always their own.
   */
  chooseKeeper?: { organisationId: number };
  submitLabel: string;
  /** Sends the input; a refusal it throws (an ApiClientError) is shown beside the field it names. */
  onSubmit: (input: EnclosureInput) => Promise<unknown>;
  onCancel?: () => void;
};

const round = (v: number) => String(Number(v.toFixed(1)));

/** Create or edit an enclosure. Sizes are typed in the chosen unit and stored in centimetres. */
export function EnclosureForm({ initial, chooseKeeper, submitLabel, onSubmit, onCancel }: Props) {
  const [unit] = useLengthUnit();
  const [keeper, setKeeper] = useState<PickedPerson | null>(
    initial ? { id: initial.keeperId, name: initial.keeperName ?? 'Former member' } : null,
  );
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [general, setGeneral] = useState('');
  const [busy, setBusy] = useState(false);

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const text = (k: string) => String(form.get(k) ?? '').trim();
    const size = (k: string) => {
      const raw = text(k).replace(',', '.');
      return raw === '' ? Number.NaN : displayToCm(Number(raw), unit);
    };
    const local: Record<string, string> = {};
    for (const [k, label] of [
      ['widthCm', 'width'],
      ['heightCm', 'height'],
      ['depthCm', 'depth'],
    ] as const) {
      const v = size(k);
      if (!Number.isFinite(v)) local[k] = `Enter the ${label} as a number.`;
      else if (v < ENCLOSURE_MIN_CM) local[k] = `The ${label} must be at least 1 cm (0.4 in).`;
      else if (v > ENCLOSURE_MAX_CM) local[k] = `The ${label} can be at most ${ENCLOSURE_MAX_CM} cm.`;
    }
    if (!text('name')) local.name = 'Enter a name for the enclosure.';
    setErrors(local);
    setGeneral('');
    if (Object.keys(local).length) return;
    setBusy(true);
    try {
      await onSubmit({
        name: text('name'),
        // Sent when chosen or changed: a new enclosure without one is kept by whoever adds it (the
        // API's default), and an unchanged keeper (perhaps a former member) is left as it is.
        ...(chooseKeeper && keeper && keeper.id !== initial?.keeperId ? { keeperId: keeper.id } : {}),
        widthCm: Number(size('widthCm').toFixed(2)),
        heightCm: Number(size('heightCm').toFixed(2)),
        depthCm: Number(size('depthCm').toFixed(2)),
        speciesName: text('speciesName') || null,
        animalName: text('animalName') || null,
        notes: text('notes') || null,
      });
    } catch (error) {
      const { field, message } = fieldError(error);
      if (
        field &&
        ['name', 'keeperId', 'widthCm', 'heightCm', 'depthCm', 'speciesName', 'animalName', 'notes'].includes(
          field,
        )
      ) {
        setErrors({ [field]: message });
      } else setGeneral(message);
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} className="space-y-4" noValidate>
      {general && <Notice tone="error">{general}</Notice>}
      <div className="grid gap-4 sm:grid-cols-2">
        <Field
          label="Name"
          name="name"
          defaultValue={initial?.name}
          required
          error={errors.name}
          placeholder="e.g. Desert vivarium"
        />
        {chooseKeeper && (
          <PersonPicker
            label="Keeper"
            organisationId={chooseKeeper.organisationId}
            people="members"
            value={keeper}
            onChange={setKeeper}
            clearable={!initial}
            hint={initial ? undefined : 'Type part of a name or e-mail; leave it empty to keep it yourself.'}
            error={errors.keeperId}
          />
        )}
      </div>
      <fieldset>
        <legend className="mb-1 text-body font-medium text-basalt-800">
          Inside size ({unit === 'cm' ? 'centimetres' : 'inches'})
        </legend>
        <div className="grid grid-cols-3 gap-3">
          {(
            [
              ['widthCm', 'Width'],
              ['heightCm', 'Height'],
              ['depthCm', 'Depth'],
            ] as const
          ).map(([k, label]) => (
            <Field
              key={`${k}-${unit}`}
              label={`${label} (${unit})`}
              name={k}
              inputMode="decimal"
              defaultValue={initial ? round(cmToDisplay(initial[k], unit)) : ''}
              required
              error={errors[k]}
            />
          ))}
        </div>
      </fieldset>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field
          label="Species"
          name="speciesName"
          defaultValue={initial?.speciesName ?? ''}
          error={errors.speciesName}
          placeholder="e.g. Bearded dragon"
        />
        <Field
          label="Animal's name"
          name="animalName"
          defaultValue={initial?.animalName ?? ''}
          error={errors.animalName}
        />
      </div>
      <TextArea
        label="Notes"
        name="notes"
        rows={3}
        defaultValue={initial?.notes ?? ''}
        error={errors.notes}
        hint="Materials, lid, what sits where — anything that helps plan the set-up."
      />
      <div className="flex gap-2">
        <button type="submit" className={button.primary} disabled={busy}>
          {busy ? 'Saving…' : submitLabel}
        </button>
        {onCancel && (
          <button type="button" className={button.secondary} onClick={onCancel} disabled={busy}>
            Cancel
          </button>
        )}
      </div>
    </form>
  );
}
