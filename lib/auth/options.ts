import 'server-only';
import type { NextAuthOptions } from 'next-auth';
import type { JWT } from 'next-auth/jwt';
import CredentialsProvider from 'next-auth/providers/credentials';
import { authorizeCredentials } from './credentials';
import { safeReturnTo } from './return-to';
import { SESSION_MAX_AGE_S, SESSION_REFRESH_MS } from './lifetime';
import { authSecret } from './secret';
import { endSession, isSessionEnded, loadActiveSession, newSessionId } from './ended-sessions';
import { loadUserById, type CurrentUser } from './session-user';
import { logger } from '@/lib/log';

export { SESSION_MAX_AGE_S, SESSION_REFRESH_MS };
/** A changed session version ends a session at the next request, and in next-auth's own answer within a minute. */
export const SESSION_RECHECK_MS = 60_000;

/** The token carrying the account as just loaded (its name, address and memberships), checked `now`. */
const checked = (token: JWT, fresh: CurrentUser, now: number): JWT => ({
  ...token,
  name: fresh.name,
  email: fresh.email,
  memberships: fresh.memberships,
  checkedAt: now,
});

export const authOptions: NextAuthOptions = {
  // JWT sessions are re-issued on every /api/auth/session answer (updateAge applies to database sessions only).
  session: { strategy: 'jwt', maxAge: SESSION_MAX_AGE_S },
  jwt: { maxAge: SESSION_MAX_AGE_S },
  // A getter: the secret is checked when next-auth first needs it (a request), not when the build imports this file.
  get secret() {
    return authSecret();
  },
  pages: { signIn: '/sign-in', error: '/sign-in' },
  providers: [
    CredentialsProvider({
      name: 'Email and password',
      credentials: {
        email: { label: 'Email', type: 'email' },
        password: { label: 'Password', type: 'password' },
      },
      authorize: (credentials, req) => authorizeCredentials(credentials, req?.headers),
    }),
  ],
  callbacks: {
    // Where next-auth sends the browser after signing in or out: a path of this app, never another site.
    redirect({ url, baseUrl }) {
      const base = new URL(baseUrl);
      let target: URL;
      try {
        target = new URL(url, base);
      } catch {
        return baseUrl;
      }
      if (target.origin !== base.origin) return baseUrl;
      return new URL(safeReturnTo(`${target.pathname}${target.search}${target.hash}`, '/'), base).toString();
    },
    async jwt({ token, user }) {
      const now = Date.now();
      if (user) {
        const fresh = await loadUserById(Number(user.id));
        if (!fresh) throw new Error('The account could not be loaded.');
        return {
          ...checked(token, fresh, now),
          uid: fresh.id,
          sv: fresh.sessionVersion,
          sid: newSessionId(),
        };
      }
      if (typeof token.uid !== 'number' || typeof token.sv !== 'number' || typeof token.sid !== 'string')
        throw new Error('Malformed session.');
      if (typeof token.checkedAt === 'number' && now - token.checkedAt < SESSION_RECHECK_MS) {
        // A signed-out cookie is refused at once even between full checks: one primary-key lookup, so a copy
        // of the cookie taken before sign-out gets nothing from next-auth's own session answer either.
        if (await isSessionEnded(token.sid)) throw new Error('Session ended.');
        return token;
      }
      // Throwing makes next-auth clear the cookie: the session has ended (signed out, everywhere or here, or removed).
      const fresh = await loadActiveSession(token);
      if (!fresh) throw new Error('Session ended.');
      return checked(token, fresh, now);
    },
    async session({ session, token }) {
      session.user = {
        id: token.uid,
        name: token.name ?? '',
        email: token.email ?? '',
        sessionVersion: token.sv,
        memberships: token.memberships ?? [],
      };
      return session;
    },
  },
  events: {
    // Plain sign-out ends this session on the server too: a copy of the cookie is refused from now on.
    async signOut({ token }) {
      if (typeof token?.sid !== 'string' || typeof token.uid !== 'number') return;
      const exp = typeof token.exp === 'number' ? new Date(token.exp * 1000) : undefined;
      await endSession(token.sid, token.uid, exp);
    },
  },
  logger: {
    // next-auth's default logger prints request details; keep only the code and message (no bodies, no passwords).
    error: (code, metadata) => logger().error({ code, error: errorMessage(metadata) }, 'auth error'),
    warn: (code) => logger().warn({ code }, 'auth warning'),
    debug: () => {},
  },
};

function errorMessage(metadata: unknown): string {
  if (metadata instanceof Error) return metadata.message;
  const inner = (metadata as { error?: unknown } | null)?.error;
  return inner instanceof Error ? inner.message : '';
}
