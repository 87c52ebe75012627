'use client';

import { LocalTime } from '@/components/ui/LocalTime';
import { button } from '@/components/ui/styles';
import { useApiMutation } from '@/components/ui/useApiMutation';

export type PendingInvitation = {
  id: number;
  email: string;
  role: string;
  expiresAt: string;
  canRevoke: boolean;
};

/** Invitations not yet accepted, each with a way to withdraw it. */
export function PendingInvitations({ invitations }: { invitations: PendingInvitation[] }) {
  const withdraw = useApiMutation((id: number) => ({ method: 'DELETE', url: `/api/invitations/${id}` }));
  const busyId = withdraw.isPending ? withdraw.variables : null;
  if (invitations.length === 0) return <p className="text-body text-basalt-500">No invitations waiting.</p>;
  return (
    <>
      {withdraw.error && (
        <p role="alert" className="mb-2 text-body text-ember-700">
          {withdraw.error.message}
        </p>
      )}
      <ul className="divide-y divide-basalt-100 rounded-lg border border-basalt-200 bg-white">
        {invitations.map((inv) => (
          <li key={inv.id} className="flex flex-wrap items-center justify-between gap-2 px-4 py-2">
            <span>
              <span className="font-medium">{inv.email}</span>{' '}
              <span className="text-basalt-500">
                · {inv.role} · until <LocalTime value={inv.expiresAt} shown="day" />
              </span>
            </span>
            {inv.canRevoke && (
              <button
                type="button"
                className={button.quietDanger}
                disabled={busyId === inv.id}
                aria-label={`Withdraw the invitation to ${inv.email}`}
                onClick={() => withdraw.mutate(inv.id)}
              >
                Withdraw
              </button>
            )}
          </li>
        ))}
      </ul>
    </>
  );
}
