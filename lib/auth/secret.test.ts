import { describe, expect, it } from 'vitest';
import { authSecret, MIN_SECRET_LENGTH } from './secret';

const env = (vars: Record<string, string | undefined>) => vars as NodeJS.ProcessEnv;

describe('authSecret', () => {
  it('refuses to run in production without a strong secret', () => {
    expect(() => authSecret(env({ NODE_ENV: 'production' }))).toThrow(/NEXTAUTH_SECRET/);
    expect(() =>
      authSecret(env({ NODE_ENV: 'production', NEXTAUTH_SECRET: 'x'.repeat(MIN_SECRET_LENGTH - 1) })),
    ).toThrow(/at least 32/);
    const strong = 'k'.repeat(MIN_SECRET_LENGTH);
    expect(authSecret(env({ NODE_ENV: 'production', NEXTAUTH_SECRET: strong }))).toBe(strong);
  });

  it('falls back to a fixed development key outside production, and prefers a configured one', () => {
    const dev = authSecret(env({ NODE_ENV: 'development' }));
    expect(dev.length).toBeGreaterThanOrEqual(MIN_SECRET_LENGTH);
    expect(authSecret(env({ NODE_ENV: 'test', NEXTAUTH_SECRET: 'configured' }))).toBe('configured');
  });
});
