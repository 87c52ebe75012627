import { authSecret } from './secret';

/**
 * At server start (instrumentation.ts, Node.js runtime only): a production server without a strong
 * NEXTAUTH_SECRET ends here with the reason, before it answers a request. A module of its own so the
 * Edge build of instrumentation.ts never sees `process.exit`.
 */
export function requireStrongSecretOrExit(): void {
  try {
    authSecret();
  } catch (e) {
    console.error(`Baskwell cannot start: ${e instanceof Error ? e.message : String(e)}`);
    process.exit(1);
  }
}
