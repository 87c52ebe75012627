'use server';

import { headers } from 'next/headers';
import { ApiError, fromZod, isDatabaseUnavailable } from '@/lib/api/errors';
import { DomainError } from '@/lib/errors';
import { assertSameOriginHeaders } from '@/lib/api/request';
import type { CurrentUser } from '@/lib/auth/session-user';
import { guidedStartSchema, type GuidedStartInput } from '@/lib/guided-start/input';
import { createFromGuidedStart } from '@/lib/guided-start/mutations';
import { proposeFor, type ProposalView } from '@/lib/guided-start/queries';
import { currentUser } from '@/lib/session';
import { logger } from '@/lib/log';

/**
 * The guided start's two steps as server actions, in the same order as every route handler:
 * same origin → parse (zod) → who (session, re-checked in the database) → may they (in the service) → act.
 * Errors come back as a message (and the field, when one is to blame), never internals.
 */

export type ActionResult<T> =
  { ok: true; data: T } | { ok: false; error: { message: string; field?: string } };

const fail = (message: string, field?: string) => ({ ok: false as const, error: { message, field } });

async function run<T>(
  raw: unknown,
  act: (user: CurrentUser, input: GuidedStartInput) => Promise<T>,
): Promise<ActionResult<T>> {
  try {
    // Next checks Origin against Host for actions but lets a request without Origin through; ours
    // refuses that too when a session cookie rides along (the route handlers' rule, lib/api/request.ts).
    assertSameOriginHeaders(await headers());
    const parsed = guidedStartSchema.safeParse(raw);
    if (!parsed.success) {
      const e = fromZod(parsed.error);
      return fail(e.message, e.field);
    }
    const user = await currentUser();
    if (!user) return fail('Your session has ended. Sign in again; your answers stay on this page.');
    return { ok: true, data: await act(user, parsed.data) };
  } catch (e) {
    if (e instanceof DomainError || e instanceof ApiError) return fail(e.message, e.field);
    if (isDatabaseUnavailable(e))
      return fail(
        'The database cannot be reached right now; your answers stay on this page. Try again in a few seconds.',
      );
    logger().error({ err: e }, 'guided start failed');
    return fail('Something went wrong on our side. Nothing was created; try again.');
  }
}

export async function proposeAction(raw: unknown): Promise<ActionResult<ProposalView>> {
  return run(raw, proposeFor);
}

export async function createAction(
  raw: unknown,
): Promise<ActionResult<{ enclosureId: number; variantId: number }>> {
  return run(raw, createFromGuidedStart);
}
