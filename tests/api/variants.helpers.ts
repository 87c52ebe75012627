// Calls the real route handler functions with real Requests carrying a real (next-auth-encoded) session
// cookie, as a browser would after signing in.
import { encode } from 'next-auth/jwt';
import { authSecret } from '@/lib/auth/secret';
import type { User } from '@/models';

export const ORIGIN = 'http://localhost:3000';

export async function sessionCookie(user: User): Promise<string> {
  const token = await encode({
    token: {
      uid: user.id,
      sv: user.sessionVersion ?? 1,
      name: user.name,
      email: user.email,
      sub: String(user.id),
    },
    secret: authSecret(),
  });
  return `next-auth.session-token=${token}`;
}

type Handler = (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

export type Call = {
  status: number;
  body: any; // eslint-disable-line @typescript-eslint/no-explicit-any -- JSON of many shapes, checked by each test
  res: Response;
};

/** Calls `handler` as Next would for `method path` with optional user session and JSON body. */
export async function call(
  handler: Handler,
  opts: {
    method?: string;
    path: string;
    params?: Record<string, string | number>;
    user?: User | null;
    body?: unknown;
  },
): Promise<Call> {
  const headers = new Headers({ origin: ORIGIN });
  if (opts.user) headers.set('cookie', await sessionCookie(opts.user));
  if (opts.body !== undefined) headers.set('content-type', 'application/json');
  const req = new Request(`${ORIGIN}${opts.path}`, {
    method: opts.method ?? 'GET',
    headers,
    body: opts.body === undefined ? undefined : JSON.stringify(opts.body),
  });
  const params = Object.fromEntries(Object.entries(opts.params ?? {}).map(([k, v]) => [k, String(v)]));
  const res = await handler(req, { params: Promise.resolve(params) });
  const type = res.headers.get('content-type') ?? '';
  const body = type.includes('application/json') ? await res.json() : null;
  return { status: res.status, body, res };
}
