'use client';

import { useRouter } from 'next/navigation';
import { type FormEvent } from 'react';
import { fieldError } from '@/components/ui/api-client';
import { Field } from '@/components/ui/Field';
import { Notice } from '@/components/ui/Notice';
import { button } from '@/components/ui/styles';
import { cmToDisplay } from '@/shared/units';
import { useLengthUnit } from '@/components/ui/units';
import { useApiMutation } from '@/components/ui/useApiMutation';
import type { LampSummary } from '@/lib/lamp-log/queries';
import { type DesignLampOption, DesignLampSelect } from './DesignLampSelect';
import { LampUseFields } from './LampUseFields';
import { shareInput } from '@/components/ui/share-input';

/** Edit a lamp, retire it (its readings stay), or delete one logged by mistake. */
export function LampSettings({
  lamp,
  designLamps,
  canDelete,
}: {
  lamp: LampSummary;
  designLamps: DesignLampOption[];
  canDelete: boolean;
}) {
  const router = useRouter();
  const [unit] = useLengthUnit();
  const url = `/api/lamps/${lamp.id}`;
  const save = useApiMutation((body: Record<string, unknown>) => ({ method: 'PATCH', url, body }));
  const remove = useApiMutation(() => ({ method: 'DELETE', url }), {
    onSuccess: () => router.push(`/enclosures/${lamp.enclosure.id}/lamps`),
  });
  const failed = save.error ?? remove.error;
  const error = failed && fieldError(failed);
  const busy = save.isPending;
  const saved = save.isSuccess;

  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const text = (k: string) => String(form.get(k) ?? '').trim();
    remove.reset();
    save.mutate({
      label: text('label'),
      hoursPerDay: Number(text('hoursPerDay')),
      firstUsedOn: text('firstUsedOn'),
      baskingDistance: text('baskingDistance') === '' ? null : Number(text('baskingDistance')),
      baskingTransmission: text('baskingTransmission') === '' ? null : Number(text('baskingTransmission')),
      designObjectId: text('designObjectId') || null,
      retiredOn: text('retiredOn') || null,
      lengthUnit: unit,
    });
  }

  function confirmRemove() {
    if (
      !window.confirm(`Delete “${lamp.label}” and all its readings? To keep its history, retire it instead.`)
    )
      return;
    save.reset();
    remove.mutate();
  }

  const err = (f: string) => (error?.field === f ? error.message : null);
  return (
    <form onSubmit={submit} className="space-y-3" aria-label="Lamp settings" noValidate>
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="Name" name="label" defaultValue={lamp.label} required error={err('label')} />
        <LampUseFields firstUsedOn={lamp.firstUsedOn} hoursPerDay={lamp.hoursPerDay} error={err} />
        <Field
          key={unit}
          label={`Lamp to basking spot (${unit})`}
          name="baskingDistance"
          type="number"
          step="any"
          defaultValue={
            lamp.baskingDistanceCm === null
              ? ''
              : Number(cmToDisplay(lamp.baskingDistanceCm, unit).toFixed(1))
          }
          error={err('baskingDistance')}
        />
        <Field
          label="Share of UVB passing between (0–1)"
          name="baskingTransmission"
          {...shareInput}
          defaultValue={lamp.baskingTransmission ?? ''}
          hint="Empty: nothing in between. A mesh lid passes about 0.5–0.7."
          error={err('baskingTransmission')}
        />
        <DesignLampSelect
          label="Lamp in the design"
          designLamps={designLamps}
          linked={lamp.designObjectId}
          error={err('designObjectId')}
        />
        <Field
          label="Retired on"
          name="retiredOn"
          type="date"
          defaultValue={lamp.retiredOn ?? ''}
          hint="Set when the lamp comes out; its readings stay."
          error={err('retiredOn')}
        />
      </div>
      {error && <Notice tone="error">{error.message}</Notice>}
      {saved && <Notice tone="success">Saved.</Notice>}
      <div className="flex flex-wrap gap-2">
        <button type="submit" className={button.primary} disabled={busy}>
          {busy ? 'Saving…' : 'Save'}
        </button>
        {canDelete && (
          <button
            type="button"
            className={button.quietDanger}
            onClick={confirmRemove}
            disabled={remove.isPending || remove.isSuccess}
          >
            Delete lamp
          </button>
        )}
      </div>
    </form>
  );
}
