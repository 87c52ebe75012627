'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { sendJson } from '@/components/ui/api-client';
import { button } from '@/components/ui/styles';

/** Deletes the person after a plain confirmation that says what stays. */
export function DeleteCustomerButton({ id, name }: { id: number; name: string }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function remove() {
    if (
      !window.confirm(
        `Delete ${name}? Their name, e-mail, phone, notes and consent are removed. The lamp tests stay without their name, for the shop's own lamp statistics.`,
      )
    )
      return;
    setBusy(true);
    setError(null);
    try {
      await sendJson('DELETE', `/api/customers/${id}`);
      router.push('/customers');
      router.refresh();
    } catch (e) {
      setError(e instanceof Error ? e.message : 'The customer could not be deleted.');
      setBusy(false);
    }
  }
  return (
    <span className="inline-flex flex-col items-end">
      <button type="button" className={button.secondary} onClick={remove} disabled={busy}>
        {busy ? 'Deleting…' : 'Delete customer'}
      </button>
      {error && (
        <span role="alert" className="mt-1 text-caption text-ember-700">
          {error}
        </span>
      )}
    </span>
  );
}
