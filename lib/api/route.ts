import type { Logger } from 'pino';
import type { ZodType, z } from 'zod';
import type { CurrentUser } from '@/lib/auth/session-user';
import { loadOwned, type OwnedKind, type OwnedRecord } from '@/lib/access';
import { requestIdOf, requestLogger } from '@/lib/log';
import type { Action } from '@/lib/permissions';
import { ApiError, errorResponse, fromZod, unauthenticated } from './errors';
import { assertNotFormBody, assertSameOrigin, isStateChanging, readJsonBody } from './request';
import { idParams } from './schemas';
import { sessionUser } from './session';

/**
 * The one pipeline of every route handler, in a fixed order:
 *   transport checks (same origin, no form bodies, JSON only, size cap) → parse (zod) → who (session, re-checked in
 *   the database) → may they (`allow`, called by the handler once it knows the thing) → act.
 * Anything thrown becomes a typed JSON error without internals.
 */

type Schema = ZodType | undefined;
type Out<S extends Schema> = S extends ZodType ? z.output<S> : undefined;
type RouteContext = { params: Promise<Record<string, string | string[] | undefined>> };

type Spec<P extends Schema, Q extends Schema, B extends Schema, A extends boolean> = {
  params?: P;
  query?: Q;
  body?: B;
  /** Defaults to true: no session → 401. */
  auth?: A;
  /** The JSON body's size cap in bytes (413 beyond it); defaults to MAX_JSON_BODY_BYTES. */
  maxBodyBytes?: number;
  handler: (input: {
    req: Request;
    params: Out<P>;
    query: Out<Q>;
    body: Out<B>;
    user: A extends false ? CurrentUser | null : CurrentUser;
    /** Logs with this request's id. */
    log: Logger;
  }) => Promise<Response | unknown>;
};

export function route<
  P extends Schema = undefined,
  Q extends Schema = undefined,
  B extends Schema = undefined,
  A extends boolean = true,
>(spec: Spec<P, Q, B, A>) {
  return async (req: Request, ctx?: RouteContext): Promise<Response> => {
    // Every response names its request id, and every log line about the request carries it, so a
    // person reporting a failure can quote one id that finds the server's side of the story.
    const requestId = requestIdOf(req.headers);
    const response = await handle(spec, req, ctx, requestId);
    try {
      response.headers.set('X-Request-Id', requestId);
    } catch {
      // A response with immutable headers (e.g. a redirect made by Response.redirect) goes out without it.
    }
    return response;
  };
}

/**
 * The route of one thing named by the id in its address (`/api/lamps/12`): the id is parsed and the
 * thing loaded for this user and `action` with `loadOwned` (404 to whoever may not see it, 403 to whoever
 * may see it but not do this) before the handler runs, which gets it as `thing`.
 */
export function ownedRoute<K extends OwnedKind, Q extends Schema = undefined, B extends Schema = undefined>(
  kind: K,
  action: Action,
  spec: Omit<Spec<typeof idParams, Q, B, true>, 'params' | 'auth' | 'handler'> & {
    handler: (
      input: Parameters<Spec<typeof idParams, Q, B, true>['handler']>[0] & { thing: OwnedRecord<K> },
    ) => Promise<Response | unknown>;
  },
) {
  return route<typeof idParams, Q, B, true>({
    ...spec,
    params: idParams,
    handler: async (input) =>
      spec.handler({ ...input, thing: await loadOwned(kind, input.params.id, input.user, action) }),
  });
}

async function handle<P extends Schema, Q extends Schema, B extends Schema, A extends boolean>(
  spec: Spec<P, Q, B, A>,
  req: Request,
  ctx: RouteContext | undefined,
  requestId: string,
): Promise<Response> {
  try {
    if (isStateChanging(req.method)) {
      assertSameOrigin(req);
      assertNotFormBody(req);
    }
    const rawBody = spec.body ? await readJsonBody(req, spec.maxBodyBytes) : undefined;
    const params = parse(spec.params, ctx ? await ctx.params : {}, undefined);
    const query = parse(spec.query, Object.fromEntries(new URL(req.url).searchParams), undefined);
    const body = parse(spec.body, rawBody ?? {}, undefined);
    const user = await sessionUser(req);
    if (!user && spec.auth !== false) throw unauthenticated();
    const log = requestLogger(requestId);
    const result = await spec.handler({ req, params, query, body, user, log } as Parameters<
      Spec<P, Q, B, A>['handler']
    >[0]);
    if (result instanceof Response) return result;
    return json(result ?? { ok: true });
  } catch (error) {
    return errorResponse(error, `${req.method} ${new URL(req.url).pathname}`, requestLogger(requestId));
  }
}

function parse<S extends Schema>(schema: S, value: unknown, prefix: string | undefined): Out<S> {
  if (!schema) return undefined as Out<S>;
  const r = schema.safeParse(value);
  if (!r.success) throw fromZod(r.error, prefix);
  return r.data as Out<S>;
}

export function json(data: unknown, status = 200): Response {
  return Response.json(data, { status, headers: { 'Cache-Control': 'no-store' } });
}

export const created = (data: unknown) => json(data, 201);

export { allow } from '@/lib/access';
export { ApiError };
