'use client';

import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { fieldError, sendJson } from '@/components/ui/api-client';
import { Field } from '@/components/ui/Field';
import { Notice } from '@/components/ui/Notice';
import { Select } from '@/components/ui/Select';
import { button } from '@/components/ui/styles';
import { useLengthUnit } from '@/components/ui/units';
import { WARM_UP_MINUTES, type ReadingThrough, type ReadingWarmedUp } from '@/shared/reading-setup';
import { ReadingSetupFields } from './ReadingSetupFields';

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
  const router = useRouter();
  const [unit] = useLengthUnit();
  const [through, setThrough] = useState<string>(last.through ?? '');
  const shareDefault =
    through === 'lid'
      ? (lidShare ?? '')
      : through === last.through && last.throughTransmission !== null
        ? last.throughTransmission
        : '';
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<{ field?: string; message: string } | null>(null);
  const [saved, setSaved] = useState<string | null>(null);

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const num = (k: string) => (form.get(k) === '' ? undefined : Number(form.get(k)));
    // Asked here rather than defaulted: a reading is only comparable when its set-up is known.
    if (!through) return setError({ field: 'through', message: 'Say what was between lamp and meter.' });
    if (!form.get('warmedUp'))
      return setError({ field: 'warmedUp', message: 'Say whether the lamp had warmed up.' });
    setBusy(true);
    setError(null);
    setSaved(null);
    try {
      await sendJson('POST', `/api/lamps/${lampId}/readings`, {
        takenAt: new Date(String(form.get('takenAt'))).toISOString(),
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
      setSaved('Reading saved.');
      (e.target as HTMLFormElement).querySelector<HTMLInputElement>('input[name=value]')!.value = '';
      router.refresh();
    } catch (err) {
      setError(fieldError(err));
    } finally {
      setBusy(false);
    }
  }

  const err = (f: string) => (error?.field === f ? error.message : null);
  return (
    <form onSubmit={submit} className="space-y-3" aria-label="Add a reading" noValidate>
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
        <Field
          label={`Distance below the lamp (${unit})`}
          name="distance"
          type="number"
          step="any"
          min="0"
          inputMode="decimal"
          required
          hint="Straight below the lamp, to the meter's sensor."
          error={err('distance')}
        />
        <Field
          label="Meter value"
          name="value"
          type="number"
          step="any"
          min="0"
          inputMode="decimal"
          required
          error={err('value')}
        />
        <Select label="Meter kind" name="unit" defaultValue="uvb" error={err('unit')}>
          <option value="uvb">Broadband UVB meter (µW/cm²)</option>
          <option value="uvi">UV Index meter (UVI)</option>
        </Select>
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
