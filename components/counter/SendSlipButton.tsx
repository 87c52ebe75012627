'use client';

import { useState } from 'react';
import { sendJson } from '@/components/ui/api-client';
import { button } from '@/components/ui/styles';

/** E-mails the latest test's slip to the customer (the server checks consent and sends it once). */
export function SendSlipButton({ lampId }: { lampId: number }) {
  const [state, setState] = useState<{ busy: boolean; said: string | null; failed: boolean }>({
    busy: false,
    said: null,
    failed: false,
  });
  async function send() {
    setState({ busy: true, said: null, failed: false });
    try {
      const r = await sendJson<{ queued: boolean; to?: string }>('POST', `/api/counter/lamps/${lampId}/slip`);
      setState({
        busy: false,
        said: r.queued ? `The slip is on its way to ${r.to}.` : 'The slip of this test was sent before.',
        failed: false,
      });
    } catch (e) {
      setState({
        busy: false,
        said: e instanceof Error ? e.message : 'The slip could not be sent.',
        failed: true,
      });
    }
  }
  return (
    <span className="inline-flex flex-col items-start gap-1">
      <button type="button" className={button.secondary} onClick={send} disabled={state.busy}>
        {state.busy ? 'Sending…' : 'E-mail the test slip'}
      </button>
      {state.said && (
        <span
          role={state.failed ? 'alert' : 'status'}
          className={`text-caption ${state.failed ? 'text-ember-700' : 'text-moss-800'}`}
        >
          {state.said}
        </span>
      )}
    </span>
  );
}
