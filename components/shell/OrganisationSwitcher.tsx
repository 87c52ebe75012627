'use client';

import { useRouter } from 'next/navigation';
import { useId, useTransition } from 'react';
import { useSwitchOrganisation } from '@/components/ui/useApiMutation';
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
  // The pages re-render inside a transition, so the picker stays disabled until they show the new one.
  const switchTo = useSwitchOrganisation({
    refresh: false,
    onSuccess: () => startTransition(() => router.refresh()),
  });
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
        disabled={pending || switchTo.isPending}
        onChange={(e) => switchTo.mutate(Number(e.target.value))}
        className={`max-w-56 rounded-md border border-basalt-600 bg-basalt-800 px-2 py-1 text-body text-white ${focusRing}`}
      >
        {memberships.map((m) => (
          <option key={m.organisationId} value={m.organisationId}>
            {m.organisationName} ({m.role})
          </option>
        ))}
      </select>
      {switchTo.isError && (
        <span role="alert" className="text-caption text-ember-300">
          Could not switch. Try again.
        </span>
      )}
    </div>
  );
}
