import { describe, expect, it, vi } from 'vitest';
import { errorResponse } from '@/lib/api/errors';
import { DomainError, notFound } from '@/lib/errors';

// A production build gives each route its own copy of a module; a second import after resetModules is
// such a copy here: its classes are different objects from the ones imported above.
async function anotherCopy() {
  vi.resetModules();
  const errors = await import('@/lib/errors');
  const pool = await import('@/lib/engine-pool/pool');
  return { errors, pool };
}

describe('domain errors made by another copy of the module', () => {
  it('are still domain errors, so the pipeline answers their status and not 500', async () => {
    const { errors, pool } = await anotherCopy();
    expect(errors.DomainError).not.toBe(DomainError);
    const timeout = new pool.EngineTimeoutError(20_000);
    expect(timeout instanceof DomainError).toBe(true);
    const res = errorResponse(timeout, 'test', { error: () => {} } as never);
    expect(res.status).toBe(503);
    expect(res.headers.get('retry-after')).toBe('30');
    expect(((await res.json()) as { error: { code: string } }).error.code).toBe('engine_timeout');
    expect(errorResponse(errors.notFound('That lamp'), 'test').status).toBe(404);
  });

  it('keeps subclasses apart: a plain domain error is not an engine timeout', async () => {
    const { pool } = await anotherCopy();
    expect(notFound() instanceof pool.EngineTimeoutError).toBe(false);
    expect(new pool.EngineTimeoutError(1) instanceof pool.EngineTimeoutError).toBe(true);
    expect(new pool.EngineBusyError() instanceof pool.EngineTimeoutError).toBe(false);
  });

  it('leaves other errors alone', () => {
    expect(new Error('x') instanceof DomainError).toBe(false);
    expect((null as unknown as object) instanceof DomainError).toBe(false);
    expect(({ kind: 'not_found' } as unknown) instanceof DomainError).toBe(false);
    const log = { error: vi.fn() };
    expect(errorResponse(new Error('boom'), 'test', log as never).status).toBe(500);
    expect(log.error).toHaveBeenCalledOnce();
  });
});
