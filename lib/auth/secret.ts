/**
 * The key that signs and encrypts session cookies. Production refuses to run without a strong one;
 * development and tests fall back to a fixed key so a fresh checkout works without setup.
 */
const DEVELOPMENT_SECRET = 'baskwell-development-only-secret-never-use-in-production';
export const MIN_SECRET_LENGTH = 32;

export function authSecret(env: NodeJS.ProcessEnv = process.env): string {
  const secret = env.NEXTAUTH_SECRET ?? '';
  if (env.NODE_ENV === 'production') {
    if (secret.length < MIN_SECRET_LENGTH) {
      throw new Error(
        `NEXTAUTH_SECRET must be set to a random string of at least ${MIN_SECRET_LENGTH} characters in production ` +
          '(for example: openssl rand -base64 48).',
      );
    }
    return secret;
  }
  return secret || DEVELOPMENT_SECRET;
}
