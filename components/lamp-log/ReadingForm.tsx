'use client';

import { useRef, useState, type FormEvent } from 'react';
import { fieldError } from '@/components/ui/api-client';
import { Field } from '@/components/ui/Field';
import { Notice } from '@/components/ui/Notice';
import { button } from '@/components/ui/styles';
import { useLengthUnit } from '@/components/ui/units';
import { useApiMutation } from '@/components/ui/useApiMutation';
import { WARM_UP_MINUTES, type ReadingThrough, type ReadingWarmedUp } from '@/shared/reading-setup';
import {
  DistanceBelowLampField,
  MeterKindSelect,
  MeterValueField,
  ReadingSetupFields,
} from './ReadingSetupFields';

/** What the form offers and remembers from the last reading: never "not recorded". */
export type ReadingSetupDefaults = {
  through: Exclude<ReadingThrough, 'not-recorded'> | null;
  throughTransmission: number | null;
  warmedUp: Exclude<ReadingWarmedUp, 'not-recorded'> | null;
};

/** datetime-local value of "now" in the browser's time zone. */
function nowLocal(): string {
  const d = new Date();
  d.setMinutes(d.getMinutes() - d.getTimezoneOffset());
  return d.toISOString().slice(0, 16);
}

/** One meter reading, typed in. Distances in the page's unit (cm or in); the server stores cm. */
export function ReadingForm({
  lampId,
  lastMeter,
  lidShare,
  last,
}: {
  lampId: number;
  lastMeter: string | null;
  /** The share of UVB the lamp's lid passes (the lamp's setting), or null without a lid. */
  lidShare: number | null;
  /** The set-up of the last reading that recorded one, offered again. */
  last: ReadingSetupDefaults;
}) {
  const [unit] = useLengthUnit();
  const formRef = useRef<HTMLFormElement>(null);
  const [through, setThrough] = useState<string>(last.through ?? '');
  const shareDefault =
    through === 'lid'
      ? (lidShare ?? '')
      : through === last.through && last.throughTransmission !== null
        ? last.throughTransmission
        : '';
  // What the form itself refuses before sending.
  const [missing, setMissing] = useState<{ field: string; message: string } | null>(null);
  const add = useApiMutation(
    (body: Record<string, unknown>) => ({ method: 'POST', url: `/api/lamps/${lampId}/readings`, body }),
    {
      onSuccess: () => {
        // The next reading is usually another value at the same set-up: only the value is cleared.
        const value = formRef.current?.querySelector<HTMLInputElement>('input[name=value]');
        if (value) value.value = '';
      },
    },
  );
  const error = missing ?? (add.error && fieldError(add.error));
  const busy = add.isPending;
  const saved = add.isSuccess ? 'Reading saved.' : null;

  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const num = (k: string) => (form.get(k) === '' ? undefined : Number(form.get(k)));
    const takenAt = new Date(String(form.get('takenAt')));
    // The set-up is asked here rather than defaulted: a reading is only comparable when it is known.
    const refused = Number.isNaN(takenAt.getTime())
      ? { field: 'takenAt', message: 'Enter when the reading was taken.' }
      : !through
        ? { field: 'through', message: 'Say what was between lamp and meter.' }
        : !form.get('warmedUp')
          ? { field: 'warmedUp', message: 'Say whether the lamp had warmed up.' }
          : null;
    setMissing(refused);
    if (refused) return add.reset();
    add.mutate({
      takenAt: takenAt.toISOString(),
      distance: num('distance'),
      distanceUnit: unit,
      value: num('value'),
      unit: form.get('unit'),
      through,
      throughTransmission: ['lid', 'screen', 'glass'].includes(through)
        ? (num('throughTransmission') ?? null)
        : null,
      warmedUp: form.get('warmedUp'),
      meter: String(form.get('meter') ?? '') || null,
      note: String(form.get('note') ?? '') || null,
    });
  }

  const err = (f: string) => (error?.field === f ? error.message : null);
  return (
    <form ref={formRef} onSubmit={submit} className="space-y-3" aria-label="Add a reading" noValidate>
      <div className="grid gap-3 sm:grid-cols-2">
        {/* Filled in the browser: the server's clock and time zone are not the reader's. */}
        <div
          ref={(div) => {
            const el = div?.querySelector('input');
            if (el && !el.value) el.value = nowLocal();
          }}
        >
          <Field label="Taken at" name="takenAt" type="datetime-local" required error={err('takenAt')} />
        </div>
        <DistanceBelowLampField unit={unit} error={err} />
        <MeterValueField error={err} />
        <MeterKindSelect error={err} />
        <ReadingSetupFields
          through={through}
          onThrough={setThrough}
          shareDefault={shareDefault}
          lidShare={lidShare}
          warmedUpDefault={last.warmedUp ?? ''}
          error={err}
        />
        <Field
          label="Meter (optional)"
          name="meter"
          defaultValue={lastMeter ?? ''}
          placeholder="Its model or whose it is, in your words"
          error={err('meter')}
        />
        <Field label="Note" name="note" placeholder="Optional" error={err('note')} />
      </div>
      <p className="text-caption text-basalt-500">
        Switch the lamp on at least {WARM_UP_MINUTES} minutes before measuring. The lamp log takes out what
        was between lamp and meter once, so any set-up works if it is recorded; the bare lamp (lid off, or the
        meter between lamp and lid) is the most direct.
      </p>
      {error && !error.field && <Notice tone="error">{error.message}</Notice>}
      {error?.field && (
        <p className="sr-only" role="alert">
          {error.message}
        </p>
      )}
      {saved && <Notice tone="success">{saved}</Notice>}
      <button type="submit" className={button.primary} disabled={busy}>
        {busy ? 'Saving…' : 'Add reading'}
      </button>
    </form>
  );
}
