/**
 * Next.js calls register() once when a server starts.
 * - Every request is stamped with the address of the connection it came on, for the rate limits.
 * - A production server refuses to start without a strong NEXTAUTH_SECRET (it would otherwise start and
 *   then fail every sign-in, or worse, run with a guessable key): the check runs here, before the first
 *   request, and ends the process with the reason.
 * Background jobs (lamp reminders, …) do not run here: `npm start` starts a job process of their own
 * beside the server (scripts/jobs.ts), so their work never holds up requests.
 */
export async function register() {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  if (process.env.NEXT_PHASE === 'phase-production-build') return;
  // Rate limits need the connection's address, which route handlers cannot see (lib/security/peer-address.ts).
  const { installPeerAddressStamp } = await import('./lib/security/peer-address');
  installPeerAddressStamp();
  const { requireStrongSecretOrExit } = await import('./lib/auth/require-secret');
  requireStrongSecretOrExit();
  // npm start refuses a database that can lose acknowledged saves (scripts/migrate.ts); a server started
  // some other way says so loudly. Not fatal here: the database may simply be down, and the app recovers.
  const [{ durabilityProblems }, { getSequelize }, { logger }] = await Promise.all([
    import('./lib/db-durability'),
    import('./lib/db'),
    import('./lib/log'),
  ]);
  durabilityProblems(getSequelize()).then(
    (problems) => {
      for (const p of problems) logger().error({ problem: p }, 'WARNING: database not crash-safe');
    },
    () => undefined,
  );
}
