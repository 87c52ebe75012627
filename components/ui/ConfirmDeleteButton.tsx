'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { sendJson } from './api-client';
import { button } from './styles';

/**
 * Deletes a thing after a plain confirmation that says what happens, then opens the list it was in.
 * The error, if any, is shown beside the button.
 */
export function ConfirmDeleteButton({
  url,
  confirm,
  then,
  label = 'Delete',
  failure,
}: {
  /** The DELETE route. */
  url: string;
  /** The question asked first: what goes and what stays. */
  confirm: string;
  /** Where to go once deleted. */
  then: string;
  label?: string;
  failure: string;
}) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function remove() {
    if (!window.confirm(confirm)) return;
    setBusy(true);
    setError(null);
    try {
      await sendJson('DELETE', url);
      router.push(then);
      router.refresh();
    } catch (e) {
      setError(e instanceof Error ? e.message : failure);
      setBusy(false);
    }
  }
  return (
    <span className="inline-flex flex-col items-end">
      <button type="button" className={button.secondary} onClick={remove} disabled={busy}>
        {busy ? 'Deleting…' : label}
      </button>
      {error && (
        <span role="alert" className="mt-1 text-caption text-ember-700">
          {error}
        </span>
      )}
    </span>
  );
}
