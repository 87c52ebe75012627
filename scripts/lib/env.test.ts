import { describe, expect, it } from 'vitest';
import { parseDotEnv, urlPort, usesPrivateDb } from './env.mjs';

describe('parseDotEnv', () => {
  it('reads plain, quoted, exported and commented lines', () => {
    const env = parseDotEnv(
      [
        '# a comment',
        'DB_PORT=3410',
        'export SMTP_PORT = 2600  # trailing comment',
        'MAIL_FROM="Shop <shop@example.com>"',
        "NEXTAUTH_SECRET='has # and = inside'",
        'MULTI="line one\\nline two"',
        'EMPTY=',
        'not a variable line',
        '',
      ].join('\n'),
    );
    expect(env).toEqual({
      DB_PORT: '3410',
      SMTP_PORT: '2600',
      MAIL_FROM: 'Shop <shop@example.com>',
      NEXTAUTH_SECRET: 'has # and = inside',
      MULTI: 'line one\nline two',
      EMPTY: '',
    });
  });

  it('accepts Windows line ends', () => {
    expect(parseDotEnv('A=1\r\nB=2\r\n')).toEqual({ A: '1', B: '2' });
  });
});

describe('usesPrivateDb', () => {
  it('runs our own MariaDB for a local host only, unless told the server is external', () => {
    expect(usesPrivateDb({ DB_HOST: '127.0.0.1' })).toBe(true);
    expect(usesPrivateDb({ DB_HOST: 'localhost' })).toBe(true);
    expect(usesPrivateDb({ DB_HOST: 'db.internal.example' })).toBe(false);
    expect(usesPrivateDb({ DB_HOST: '127.0.0.1', DB_EXTERNAL: '1' })).toBe(false);
  });
});

describe('urlPort', () => {
  it('reads the port, or the scheme default', () => {
    expect(urlPort('http://127.0.0.1:2580')).toBe(2580);
    expect(urlPort('http://example.com')).toBe(80);
    expect(urlPort('https://example.com/x')).toBe(443);
  });
});
