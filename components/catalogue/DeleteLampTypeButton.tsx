'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { sendJson } from '@/components/ui/api-client';
import { button } from '@/components/ui/styles';

/** Removes a catalogue entry; the server refuses (409) while lamps in the lamp log use it. */
export function DeleteLampTypeButton({ id, name }: { id: number; name: string }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function remove() {
    if (!window.confirm(`Remove “${name}” from the catalogue? Designs keep their lamps.`)) return;
    setBusy(true);
    setError(null);
    try {
      await sendJson('DELETE', `/api/lamp-types/${id}`);
      router.push('/lamp-catalogue');
      router.refresh();
    } catch (e) {
      setError(e instanceof Error ? e.message : 'The lamp type could not be removed.');
      setBusy(false);
    }
  }
  return (
    <span className="inline-flex flex-col items-end">
      <button type="button" className={button.secondary} onClick={remove} disabled={busy}>
        {busy ? 'Removing…' : 'Remove'}
      </button>
      {error && (
        <span role="alert" className="mt-1 max-w-xs text-right text-caption text-ember-700">
          {error}
        </span>
      )}
    </span>
  );
}
