'use client';

import { button } from '@/components/ui/styles';
import { useApiMutation } from '@/components/ui/useApiMutation';

/** E-mails the latest test's slip to the customer (the server checks consent and sends it once). */
export function SendSlipButton({ lampId }: { lampId: number }) {
  // Sending changes nothing the page shows, so its server parts are not re-rendered.
  const send = useApiMutation<void, { queued: boolean; to?: string }>(
    () => ({ method: 'POST', url: `/api/counter/lamps/${lampId}/slip` }),
    { refresh: false },
  );
  const said = send.error
    ? send.error.message || 'The slip could not be sent.'
    : send.data
      ? send.data.queued
        ? `The slip is on its way to ${send.data.to}.`
        : 'The slip of this test was sent before.'
      : null;
  return (
    <span className="inline-flex flex-col items-start gap-1">
      <button
        type="button"
        className={button.secondary}
        onClick={() => send.mutate()}
        disabled={send.isPending}
      >
        {send.isPending ? 'Sending…' : 'E-mail the test slip'}
      </button>
      {said && (
        <span
          role={send.error ? 'alert' : 'status'}
          className={`text-caption ${send.error ? 'text-ember-700' : 'text-moss-800'}`}
        >
          {said}
        </span>
      )}
    </span>
  );
}
