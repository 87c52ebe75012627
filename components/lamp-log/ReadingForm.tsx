'use client';

import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { fieldError, sendJson } from '@/components/ui/api-client';
import { Field } from '@/components/ui/Field';
import { Notice } from '@/components/ui/Notice';
import { Select } from '@/components/ui/Select';
import { button } from '@/components/ui/styles';
import { useLengthUnit } from '@/components/ui/units';

/** datetime-local value of "now" in the browser's time zone. */
function nowLocal(): string {
  const d = new Date();
  d.setMinutes(d.getMinutes() - d.getTimezoneOffset());
  return d.toISOString().slice(0, 16);
}

/** One meter reading, typed in. Distances in the page's unit (cm or in); the server stores cm. */
export function ReadingForm({ lampId, lastMeter }: { lampId: number; lastMeter: string | null }) {
  const router = useRouter();
  const [unit] = useLengthUnit();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<{ field?: string; message: string } | null>(null);
  const [saved, setSaved] = useState<string | null>(null);

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const num = (k: string) => (form.get(k) === '' ? undefined : Number(form.get(k)));
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
        <Select label="Unit" name="unit" defaultValue="uvb" error={err('unit')}>
          <option value="uvb">UVB µW/cm² (broadband meter)</option>
          <option value="uvi">UV Index (UVI meter)</option>
        </Select>
        <Field
          label="Meter"
          name="meter"
          defaultValue={lastMeter ?? ''}
          placeholder="e.g. shop's broadband meter"
          error={err('meter')}
        />
        <Field label="Note" name="note" placeholder="Optional" error={err('note')} />
      </div>
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
