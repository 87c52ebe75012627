'use client';

import { useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useId, useState } from 'react';
import { fieldError, sendJson } from '@/components/ui/api-client';
import { button, focusRing } from '@/components/ui/styles';

type Role = 'owner' | 'staff' | 'keeper';

/** The owner's controls on one member row: change role, remove (with confirmation). */
export function MemberActions({
  organisationId,
  userId,
  name,
  role,
  isSelf,
}: {
  organisationId: number;
  userId: number;
  name: string;
  role: Role;
  isSelf: boolean;
}) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const selectId = useId();
  const [error, setError] = useState('');
  const [busy, setBusy] = useState(false);
  const [confirming, setConfirming] = useState(false);
  const url = `/api/organisations/${organisationId}/members`;

  async function run(action: () => Promise<unknown>) {
    setBusy(true);
    setError('');
    try {
      await action();
      // The members table's pages come from this same address (useServerList keys them by it).
      await queryClient.invalidateQueries({ queryKey: [url] });
      router.refresh();
    } catch (e) {
      setError(fieldError(e).message);
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="flex flex-wrap items-center justify-end gap-2">
      <label htmlFor={selectId} className="sr-only">
        Role of {name}
      </label>
      <select
        id={selectId}
        value={role}
        disabled={busy}
        onChange={(e) => run(() => sendJson('PATCH', url, { userId, role: e.target.value }))}
        className={`rounded-md border border-basalt-300 bg-white px-2 py-1 text-body ${focusRing}`}
      >
        <option value="owner">owner</option>
        <option value="staff">staff</option>
        <option value="keeper">keeper</option>
      </select>
      {confirming ? (
        <>
          <button
            type="button"
            className={button.danger}
            disabled={busy}
            autoFocus
            onClick={() => run(() => sendJson('DELETE', `${url}?userId=${userId}`))}
          >
            {isSelf ? 'Yes, leave' : `Yes, remove ${name}`}
          </button>
          <button type="button" className={button.quiet} onClick={() => setConfirming(false)}>
            Cancel
          </button>
        </>
      ) : (
        <button
          type="button"
          className={button.quietDanger}
          disabled={busy}
          onClick={() => setConfirming(true)}
        >
          {isSelf ? 'Leave…' : 'Remove…'}
        </button>
      )}
      {error && (
        <p role="alert" className="w-full text-right text-caption text-ember-700">
          {error}
        </p>
      )}
    </div>
  );
}
