// How long a session lasts, in a module of its own so client code (the keep-alive) can read it without
// pulling in the server's auth options.

/**
 * A session's JWT cookie expires an hour after it was last issued. next-auth re-issues it (another
 * hour) each time /api/auth/session is asked, which an open tab does every SESSION_REFRESH_MS; a tab
 * closed or hidden for an hour is signed out. A changed session version still ends it at once.
 */
export const SESSION_MAX_AGE_S = 3600;
/** How often a visible signed-in tab renews its session: well inside the lifetime, even if a timer is late. */
export const SESSION_REFRESH_MS = 10 * 60_000;
