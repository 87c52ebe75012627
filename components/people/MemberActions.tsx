'use client';

import { useQueryClient } from '@tanstack/react-query';
import { useId, useState } from 'react';
import { button, focusRing } from '@/components/ui/styles';
import { useApiMutation } from '@/components/ui/useApiMutation';
import { refetchAfterWrite } from '@/components/ui/refetch-after-write';

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
  const queryClient = useQueryClient();
  const selectId = useId();
  const [confirming, setConfirming] = useState(false);
  const url = `/api/organisations/${organisationId}/members`;
  const change = useApiMutation(
    (to: { role: Role } | 'removed') =>
      to === 'removed'
        ? { method: 'DELETE', url: `${url}?userId=${userId}` }
        : { method: 'PATCH', url, body: { userId, role: to.role } },
    // The members table's pages come from this same address (useServerList keys them by it).
    { onSuccess: () => void refetchAfterWrite(queryClient, [url]) },
  );
  const busy = change.isPending;

  return (
    <div className="flex flex-wrap items-center justify-end gap-2">
      <label htmlFor={selectId} className="sr-only">
        Role of {name}
      </label>
      <select
        id={selectId}
        value={role}
        disabled={busy}
        onChange={(e) => change.mutate({ role: e.target.value as Role })}
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
            onClick={() => change.mutate('removed')}
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
      {change.error && (
        <p role="alert" className="w-full text-right text-caption text-ember-700">
          {change.error.message}
        </p>
      )}
    </div>
  );
}
