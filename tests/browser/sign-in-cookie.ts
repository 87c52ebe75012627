// Signing in without a browser, for browser-stage tests that only need a session cookie.
import { BASE_URL } from './harness';

/** Signs in through next-auth's own endpoints, as a script would; returns the session cookie. */
export async function signInCookie(email: string, password: string): Promise<string> {
  const csrf = await fetch(`${BASE_URL}/api/auth/csrf`);
  const jar = csrf.headers.getSetCookie().map((c) => c.split(';')[0]!);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const res = await fetch(`${BASE_URL}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: {
      'content-type': 'application/x-www-form-urlencoded',
      cookie: jar.join('; '),
      origin: BASE_URL,
    },
    body: new URLSearchParams({ csrfToken, email, password, json: 'true' }),
  });
  const session = res.headers.getSetCookie().find((c) => c.startsWith('next-auth.session-token='));
  if (!session) throw new Error(`sign-in as ${email} gave no session cookie (${res.status})`);
  return session.split(';')[0]!;
}
