'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { sendJson } from '@/components/ui/api-client';
import { button } from '@/components/ui/styles';

/** Deletes a sheet after a plain confirmation; enclosures keep their species name. */
export function DeleteSheetButton({ id, name }: { id: number; name: string }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function remove() {
    if (
      !window.confirm(
        `Delete the species sheet “${name}”? Enclosures that name this species keep their designs.`,
      )
    )
      return;
    setBusy(true);
    setError(null);
    try {
      await sendJson('DELETE', `/api/species/${id}`);
      router.push('/species');
      router.refresh();
    } catch (e) {
      setError(e instanceof Error ? e.message : 'The sheet could not be deleted.');
      setBusy(false);
    }
  }
  return (
    <span className="inline-flex flex-col items-end">
      <button type="button" className={button.secondary} onClick={remove} disabled={busy}>
        {busy ? 'Deleting…' : 'Delete'}
      </button>
      {error && (
        <span role="alert" className="mt-1 text-caption text-ember-700">
          {error}
        </span>
      )}
    </span>
  );
}
