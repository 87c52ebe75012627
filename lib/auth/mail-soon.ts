import { deliverQueued } from '@/lib/reminders/outbox';

/**
 * Sends one message a request has just put in the outbox, after the request has been answered: the
 * answer's timing then does not depend on the mail server (or on whether there was anything to send),
 * and a failed delivery stays in the outbox for the next delivery run.
 */
const pending = new Set<Promise<unknown>>();

export function deliverSoon(messageId: number): void {
  const delivery = deliverQueued({ ids: [messageId] }).catch((e: unknown) => {
    console.error('e-mail not sent yet; it stays in the outbox', e instanceof Error ? e.message : e);
  });
  pending.add(delivery);
  void delivery.finally(() => pending.delete(delivery));
}

/** Waits for the deliveries started by requests already answered (tests, orderly shutdown). */
export async function settleMail(): Promise<void> {
  await Promise.allSettled([...pending]);
}
