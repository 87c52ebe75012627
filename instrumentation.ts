/**
 * Next.js calls register() once when a server starts.
 * - A production server refuses to start without a strong NEXTAUTH_SECRET (it would otherwise start and
 *   then fail every sign-in, or worse, run with a guessable key): the check runs here, before the first
 *   request, and ends the process with the reason.
 * - The Node.js server runs the lamp reminder job on an interval (lib/reminders/schedule.ts); `npm run
 *   reminders` runs one pass by hand. Set REMINDERS_INTERVAL_MINUTES=0 to turn the schedule off (e.g.
 *   when a separate worker runs it).
 */
export async function register() {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  if (process.env.NEXT_PHASE === 'phase-production-build') return;
  const { requireStrongSecretOrExit } = await import('./lib/auth/require-secret');
  requireStrongSecretOrExit();
  const { startReminderSchedule } = await import('./lib/reminders/schedule');
  startReminderSchedule();
  // npm start refuses a database that can lose acknowledged saves (scripts/migrate.ts); a server started
  // some other way says so loudly. Not fatal here: the database may simply be down, and the app recovers.
  const [{ durabilityProblems }, { getSequelize }] = await Promise.all([
    import('./lib/db-durability'),
    import('./lib/db'),
  ]);
  durabilityProblems(getSequelize()).then(
    (problems) => {
      for (const p of problems) console.error(`WARNING: database not crash-safe: ${p}`);
    },
    () => undefined,
  );
}
