/**
 * Sentences for the sign-in page. next-auth hands the page the code our authorize function threw
 * (see credentials.ts); this file is safe to import in client components.
 */
export function signInErrorMessage(code: string | null | undefined): string {
  if (!code) return '';
  const [kind, minutes] = code.split(':');
  switch (kind) {
    case 'CredentialsSignin':
      return 'That email and password do not match an account that can sign in. Just created the account? Open the confirmation link we e-mailed you first.';
    case 'TooManyAttempts': {
      const n = Math.max(1, Number(minutes) || 15);
      return `Too many sign-in attempts. Try again in ${n} ${n === 1 ? 'minute' : 'minutes'}.`;
    }
    case 'SlowDown': {
      const n = Math.max(1, Number(minutes) || 1);
      return `Too many wrong passwords for this account. Wait ${n} ${n === 1 ? 'second' : 'seconds'}, then try again.`;
    }
    case 'ServiceUnavailable':
      return 'Sign-in is unavailable right now (the database cannot be reached). Try again in a minute.';
    case 'SessionRequired':
      return 'Sign in to continue.';
    default:
      return 'Sign-in did not work. Try again.';
  }
}
