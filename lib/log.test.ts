import { describe, expect, it } from 'vitest';
import { errorForLog, requestIdOf } from './log';

describe('errorForLog', () => {
  it('keeps the kind, code and first line of the message, not the SQL the driver attached', () => {
    const e = Object.assign(
      new Error(
        '(conn=8, no: 1406) Data too long for column\nsql: INSERT INTO users VALUES (ann@example.com)',
      ),
      {
        name: 'SequelizeDatabaseError',
        parent: { code: 'ER_DATA_TOO_LONG', sql: 'INSERT INTO users VALUES (ann@example.com)' },
        sql: 'INSERT INTO users VALUES (ann@example.com)',
      },
    );
    const logged = errorForLog(e);
    expect(logged).toMatchObject({
      type: 'SequelizeDatabaseError',
      message: '(conn=8, no: 1406) Data too long for column',
      code: 'ER_DATA_TOO_LONG',
    });
    expect(JSON.stringify(logged)).not.toContain('ann@example.com');
    expect((logged.stack as string[]).length).toBeGreaterThan(0);
  });

  it('logs a thrown non-error as text', () => {
    expect(errorForLog('plain')).toEqual({ message: 'plain' });
  });
});

describe('requestIdOf', () => {
  it('keeps a plausible caller id and replaces anything else with a new one', () => {
    expect(requestIdOf(new Headers({ 'x-request-id': 'lb-1234-abcd' }))).toBe('lb-1234-abcd');
    for (const bad of ['short', 'has space in it', 'x'.repeat(101), '<script>alert(1)</script>']) {
      expect(requestIdOf(new Headers({ 'x-request-id': bad }))).toMatch(/^[0-9a-f-]{36}$/);
    }
    expect(requestIdOf(new Headers())).toMatch(/^[0-9a-f-]{36}$/);
  });
});
