'use client';

import { useId, useState, type FormEvent } from 'react';
import { fieldError } from '@/components/ui/api-client';
import { button, input } from '@/components/ui/styles';
import { useApiMutation } from '@/components/ui/useApiMutation';
import {
  THROUGH_LABEL,
  WARMED_UP_LABEL,
  type ReadingThrough,
  type ReadingWarmedUp,
} from '@/shared/reading-setup';
import { shareInput } from '@/components/ui/share-input';

type Setup = {
  id: number;
  through: ReadingThrough;
  throughTransmission: number | null;
  warmedUp: ReadingWarmedUp;
};

/**
 * Corrects how a reading was taken (what was between lamp and meter, whether the lamp had warmed up):
 * the way to record the set-up of a reading logged before readings said so.
 */
export function ReadingSetupEdit({ reading, label }: { reading: Setup; label: string }) {
  const id = useId();
  // The form is drawn only once opened: a lamp's page lists many readings, and a closed form in each row
  // would be sent and hydrated for nothing.
  const [open, setOpen] = useState(false);
  const [through, setThrough] = useState<ReadingThrough>(reading.through);
  const change = useApiMutation((body: Record<string, unknown>) => ({
    method: 'PATCH',
    url: `/api/readings/${reading.id}`,
    body,
  }));
  const error = change.error && fieldError(change.error).message;
  const busy = change.isPending;

  function save(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const share = String(form.get('throughTransmission') ?? '').trim();
    change.mutate({
      through,
      throughTransmission:
        ['lid', 'screen', 'glass'].includes(through) && share !== '' ? Number(share) : null,
      warmedUp: form.get('warmedUp'),
    });
  }

  return (
    <details className="mt-1 text-caption" onToggle={(e) => setOpen(e.currentTarget.open)}>
      <summary
        className="cursor-pointer text-basalt-600 underline"
        aria-label={`Change the set-up of ${label}`}
      >
        Change set-up
      </summary>
      {open && (
        <form onSubmit={save} className="mt-1 space-y-1" aria-label={`Set-up of ${label}`} noValidate>
          <label htmlFor={`${id}-through`} className="block">
            Between lamp and meter
          </label>
          <select
            id={`${id}-through`}
            className={`${input} text-caption`}
            value={through}
            onChange={(e) => setThrough(e.target.value as ReadingThrough)}
          >
            {(['not-recorded', 'nothing', 'lid', 'screen', 'glass'] as const).map((t) => (
              <option key={t} value={t}>
                {THROUGH_LABEL[t]}
              </option>
            ))}
          </select>
          {['lid', 'screen', 'glass'].includes(through) && (
            <>
              <label htmlFor={`${id}-share`} className="block">
                Share of UVB it passes (0–1){through === 'lid' ? ', empty: the lamp’s lid' : ''}
              </label>
              <input
                id={`${id}-share`}
                name="throughTransmission"
                {...shareInput}
                className={`${input} text-caption`}
                defaultValue={reading.through === through ? (reading.throughTransmission ?? '') : ''}
              />
            </>
          )}
          <label htmlFor={`${id}-warm`} className="block">
            Lamp warmed up
          </label>
          <select
            id={`${id}-warm`}
            name="warmedUp"
            className={`${input} text-caption`}
            defaultValue={reading.warmedUp}
          >
            {(['not-recorded', 'yes', 'no'] as const).map((w) => (
              <option key={w} value={w}>
                {WARMED_UP_LABEL[w]}
              </option>
            ))}
          </select>
          {error && (
            <p role="alert" className="font-medium text-ember-700">
              {error}
            </p>
          )}
          <button type="submit" className={button.secondary} disabled={busy}>
            {busy ? 'Saving…' : 'Save set-up'}
          </button>
        </form>
      )}
    </details>
  );
}
