import { afterAll, beforeAll } from 'vitest';

/**
 * One trusted proxy in front for the calling file's tests (TRUST_PROXY=1): the address it appends to
 * X-Forwarded-For is the client's, so a test can be a request from any address it names.
 */
export function trustOneProxy(): void {
  const before = process.env.TRUST_PROXY;
  beforeAll(() => {
    process.env.TRUST_PROXY = '1';
  });
  afterAll(() => {
    if (before === undefined) delete process.env.TRUST_PROXY;
    else process.env.TRUST_PROXY = before;
  });
}
