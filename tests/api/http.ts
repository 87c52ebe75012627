// Calls the real route handlers with real Requests carrying a real next-auth session cookie,
// the way a browser does after signing in.
import { encode } from 'next-auth/jwt';
import { newSessionId } from '@/lib/auth/ended-sessions';
import { authSecret } from '@/lib/auth/secret';
import { memberships } from '@/lib/auth/session-user';
import type { User } from '@/models';

export const ORIGIN = 'http://localhost:3000';

/** The cookie next-auth would set after `user` signed in (same secret, same encoding). */
export async function sessionCookie(user: User, sessionVersion = user.sessionVersion ?? 1): Promise<string> {
  const token = await encode({
    token: {
      sub: String(user.id),
      name: user.name,
      email: user.email,
      uid: user.id,
      sv: sessionVersion,
      sid: newSessionId(),
      memberships: await memberships(user.id),
      checkedAt: Date.now(),
    },
    secret: authSecret(),
  });
  return `next-auth.session-token=${token}`;
}

type Handler = (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

export type Reply = {
  status: number;
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- JSON of many shapes, each test checks its own
  body: any;
  text: string;
  res: Response;
};

export type CallOptions = {
  method?: string;
  path: string;
  params?: Record<string, string | number>;
  as?: User | null;
  cookie?: string;
  body?: unknown;
  rawBody?: string;
  headers?: Record<string, string>;
};

export async function call(handler: Handler, o: CallOptions): Promise<Reply> {
  const headers = new Headers({ origin: ORIGIN, ...o.headers });
  const cookie = o.cookie ?? (o.as ? await sessionCookie(o.as) : undefined);
  if (cookie) headers.set('cookie', cookie);
  let body: string | undefined = o.rawBody;
  if (o.body !== undefined) {
    body = JSON.stringify(o.body);
    if (!headers.has('content-type')) headers.set('content-type', 'application/json');
  }
  const req = new Request(`${ORIGIN}${o.path}`, { method: o.method ?? 'GET', headers, body });
  const params = Object.fromEntries(Object.entries(o.params ?? {}).map(([k, v]) => [k, String(v)]));
  const res = await handler(req, { params: Promise.resolve(params) });
  const text = await res.text();
  let parsed: unknown = null;
  try {
    parsed = text ? JSON.parse(text) : null;
  } catch {
    parsed = null;
  }
  return { status: res.status, body: parsed, text, res };
}

/**
 * `call` for a route written as its handler's method and folder, `'PATCH /api/readings/[id]'`: `id` fills
 * the `[id]` of the path and the handler's params, so neither is written out twice.
 */
export function send(
  handler: Handler,
  route: string,
  { id, ...o }: Omit<CallOptions, 'method' | 'path' | 'params'> & { id?: number } = {},
): Promise<Reply> {
  const [method, pattern] = route.split(' ') as [string, string];
  if (id === undefined) return call(handler, { ...o, method, path: pattern });
  return call(handler, { ...o, method, path: pattern.replace('[id]', String(id)), params: { id } });
}

/** Responses must never carry internals: stack frames, SQL or driver names. */
export function expectNoInternals(reply: Reply): void {
  const leaks = [
    /\bat .+\(.+:\d+:\d+\)/,
    /\bSELECT\b/i,
    /\bINSERT INTO\b/i,
    /sequelize/i,
    /mariadb/i,
    /node_modules/,
  ];
  for (const leak of leaks) {
    if (leak.test(reply.text))
      throw new Error(`response leaks internals (${leak}): ${reply.text.slice(0, 300)}`);
  }
}
