'use client';

import { useRouter } from 'next/navigation';
import { useId, useState, useTransition } from 'react';
import { sendJson } from '@/components/ui/api-client';
import { focusRing } from '@/components/ui/styles';
import type { MembershipClaim } from '@/lib/permissions';

/** Picks which of the user's organisations the pages show. */
export function OrganisationSwitcher({
  memberships,
  currentId,
}: {
  memberships: MembershipClaim[];
  currentId: number;
}) {
  const id = useId();
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [error, setError] = useState('');
  if (memberships.length < 2) {
    const only = memberships[0];
    return only ? <span className="text-body font-medium text-white">{only.organisationName}</span> : null;
  }
  return (
    <div className="flex items-center gap-2">
      <label htmlFor={id} className="sr-only">
        Organisation
      </label>
      <select
        id={id}
        value={currentId}
        disabled={pending}
        onChange={async (e) => {
          setError('');
          try {
            await sendJson('PUT', '/api/current-organisation', { organisationId: Number(e.target.value) });
            startTransition(() => router.refresh());
          } catch {
            setError('Could not switch. Try again.');
          }
        }}
        className={`max-w-56 rounded-md border border-basalt-600 bg-basalt-800 px-2 py-1 text-body text-white ${focusRing}`}
      >
        {memberships.map((m) => (
          <option key={m.organisationId} value={m.organisationId}>
            {m.organisationName} ({m.role})
          </option>
        ))}
      </select>
      {error && (
        <span role="alert" className="text-caption text-ember-300">
          {error}
        </span>
      )}
    </div>
  );
}
