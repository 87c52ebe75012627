'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Notice } from '@/components/ui/Notice';
import { fieldError } from '@/components/ui/api-client';
import { button, card } from '@/components/ui/styles';
import { useApiMutation } from '@/components/ui/useApiMutation';
import { formatLengthRounded } from '@/shared/units';
import { useLengthUnit } from '@/components/ui/units';
import { EnclosureForm, type EnclosureInput } from './EnclosureForm';
import type { EnclosureView } from './types';

type Props = {
  enclosure: EnclosureView;
  /** Owners and staff see and change the keeper (their organisation's id). */
  chooseKeeper?: { organisationId: number };
  canEdit: boolean;
  canDelete: boolean;
};

/** An enclosure's properties, with editing in place and a two-step delete. */
export function EnclosureDetails({ enclosure, chooseKeeper, canEdit, canDelete }: Props) {
  const router = useRouter();
  const [unit] = useLengthUnit();
  const [editing, setEditing] = useState(false);
  const [confirming, setConfirming] = useState(false);
  const [saved, setSaved] = useState(false);
  const url = `/api/enclosures/${enclosure.id}`;
  const save = useApiMutation((input: EnclosureInput) => ({ method: 'PATCH', url, body: input }), {
    onSuccess: () => {
      setEditing(false);
      setSaved(true);
    },
  });
  const remove = useApiMutation(() => ({ method: 'DELETE', url }), {
    onSuccess: () => router.replace('/enclosures'),
  });
  const deleteError = remove.error ? fieldError(remove.error).message : '';
  // Busy until the list replaces this page: the enclosure is gone, a second delete would only fail.
  const busy = remove.isPending || remove.isSuccess;

  if (editing) {
    return (
      <section aria-labelledby="edit-enclosure" className={`${card} p-5`}>
        <h2 id="edit-enclosure" className="mb-4 text-lead font-semibold">
          Edit enclosure
        </h2>
        <EnclosureForm
          initial={enclosure}
          chooseKeeper={chooseKeeper}
          submitLabel="Save changes"
          onCancel={() => setEditing(false)}
          onSubmit={save.mutateAsync}
        />
      </section>
    );
  }

  const rows: [string, string][] = [
    ['Animal', enclosure.animalName ?? '—'],
    ['Species', enclosure.speciesName ?? '—'],
    ...(chooseKeeper ? [['Keeper', enclosure.keeperName ?? 'Former member'] as [string, string]] : []),
    ['Width', `${formatLengthRounded(enclosure.widthCm, unit)}`],
    ['Height', `${formatLengthRounded(enclosure.heightCm, unit)}`],
    ['Depth', `${formatLengthRounded(enclosure.depthCm, unit)}`],
  ];

  return (
    <section aria-labelledby="properties" className={`${card} p-5`}>
      <div className="mb-4 flex flex-wrap items-center justify-between gap-2">
        <h2 id="properties" className="text-lead font-semibold">
          Properties
        </h2>
        <div className="flex gap-2">
          {canEdit && (
            <button
              type="button"
              className={button.secondary}
              onClick={() => (setEditing(true), setSaved(false))}
            >
              Edit
            </button>
          )}
          {canDelete && !confirming && (
            <button type="button" className={button.quietDanger} onClick={() => setConfirming(true)}>
              Delete…
            </button>
          )}
        </div>
      </div>
      {saved && (
        <div className="mb-4">
          <Notice tone="success">Saved.</Notice>
        </div>
      )}
      {confirming && (
        <div
          className="mb-4 rounded-md border border-ember-200 bg-ember-50 p-4"
          role="alertdialog"
          aria-labelledby="confirm-delete"
        >
          <p id="confirm-delete" className="font-semibold text-ember-900">
            Delete “{enclosure.name}” for good?
          </p>
          <p className="mt-1 text-body text-ember-900">
            Its designs, lamps and meter readings are deleted with it. This cannot be undone.
          </p>
          {deleteError && <p className="mt-2 text-body font-medium text-ember-800">{deleteError}</p>}
          <div className="mt-3 flex gap-2">
            <button
              type="button"
              className={button.danger}
              disabled={busy}
              autoFocus
              onClick={() => remove.mutate()}
            >
              {busy ? 'Deleting…' : 'Yes, delete it'}
            </button>
            <button
              type="button"
              className={button.secondary}
              disabled={busy}
              onClick={() => setConfirming(false)}
            >
              Keep it
            </button>
          </div>
        </div>
      )}
      <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-3">
        {rows.map(([k, v]) => (
          <div key={k}>
            <dt className="text-caption uppercase tracking-wide text-basalt-500">{k}</dt>
            <dd className="text-body text-basalt-900">{v}</dd>
          </div>
        ))}
      </dl>
      <div className="mt-4">
        <h3 className="text-caption uppercase tracking-wide text-basalt-500">Notes</h3>
        <p className="mt-1 whitespace-pre-line text-body text-basalt-800">
          {enclosure.notes || 'No notes yet.'}
        </p>
      </div>
    </section>
  );
}
