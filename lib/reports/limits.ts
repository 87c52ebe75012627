import { DomainError } from '@/lib/errors';

import { checkLimits, countAttempt, limitKey } from '@/lib/rate-limit';
import { MONTH_CHOICES } from '@/shared/designs/compare-params';

/**
 * Exports run the engine (on a worker thread, but a thread is still a core): each signed-in person may
 * make this many PNG or PDF exports a window, and each share link this many downloads (whoever holds it).
 * The JSON design file costs nothing and is not counted.
 */
export const EXPORT_LIMIT = { perUser: 30, perShareLink: 60, windowMs: 10 * 60_000 } as const;

/** Lamp ages an export may be asked for: the ones the compare page offers. */
export const EXPORT_MONTHS = MONTH_CHOICES;

/** Counts one export against `key`, refusing with 429 (and Retry-After) once its limit is reached. */
export async function countExport(kind: 'user' | 'share', id: string | number): Promise<void> {
  const key = limitKey(`export-${kind}`, String(id));
  const limit = kind === 'user' ? EXPORT_LIMIT.perUser : EXPORT_LIMIT.perShareLink;
  const verdict = await checkLimits([{ key, limit }], EXPORT_LIMIT.windowMs);
  if (!verdict.allowed) {
    const seconds = Math.max(1, Math.ceil(verdict.retryAfterMs / 1000));
    throw new DomainError(
      'rate_limited',
      `That is ${limit} pictures and reports in ${EXPORT_LIMIT.windowMs / 60_000} minutes, the most the server makes${kind === 'user' ? ' for one person' : ' for one link'}. Try again in ${Math.ceil(seconds / 60)} minutes.`,
      { retryAfterS: seconds },
    );
  }
  await countAttempt([key], EXPORT_LIMIT.windowMs);
}
