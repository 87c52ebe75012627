import { Worker } from 'node:worker_threads';
import { afterEach, describe, expect, it } from 'vitest';
import { DomainError } from '@/lib/errors';
import {
  EngineBusyError,
  EngineCancelledError,
  EngineTimeoutError,
  WorkerPool,
  type PoolOptions,
} from './pool';

const spawn = () => new Worker(new URL('./testing/spin-worker.mjs', import.meta.url));
const pools: WorkerPool[] = [];
function pool(opts: Partial<PoolOptions> = {}) {
  const p = new WorkerPool({ size: 1, maxQueue: 4, timeoutMs: 10_000, spawn, ...opts });
  pools.push(p);
  return p;
}
afterEach(async () => {
  await Promise.all(pools.splice(0).map((p) => p.close()));
});

describe('worker pool', () => {
  it('runs tasks on its threads and answers each caller with its own result', async () => {
    const p = pool({ size: 2 });
    const values = await Promise.all([1, 2, 3, 4, 5].map((v) => p.run('echo', { value: { v } })));
    expect(values).toEqual([1, 2, 3, 4, 5].map((v) => ({ v })));
    expect(p.stats.threads).toBeLessThanOrEqual(2);
    expect(p.stats.started).toBe(2);
  });

  it('keeps the calling thread free while a task spins on a worker', async () => {
    const p = pool();
    const running = p.run('spin', { ms: 400 });
    // A timer on this thread fires long before the worker's 400 ms of busy work end.
    const t0 = Date.now();
    await new Promise((r) => setTimeout(r, 20));
    expect(Date.now() - t0).toBeLessThan(300);
    expect(p.stats.busy).toBe(1);
    await expect(running).resolves.toBe(400);
  });

  it('refuses at once when every thread is busy and the queue is full', async () => {
    const p = pool({ maxQueue: 1 });
    const a = p.run('spin', { ms: 300 });
    const b = p.run('echo', { value: 'b' });
    await expect(p.run('echo', { value: 'c' })).rejects.toBeInstanceOf(EngineBusyError);
    await expect(Promise.all([a, b])).resolves.toEqual([300, 'b']);
  });

  it('stops a task past its time limit, ends its thread and goes on with the next task', async () => {
    const p = pool();
    const slow = p.run('spin', { ms: 5_000 }, { timeoutMs: 150 });
    const next = p.run('echo', { value: 'after' });
    const error = await slow.catch((e: unknown) => e);
    expect(error).toBeInstanceOf(EngineTimeoutError);
    expect((error as DomainError).kind).toBe('unavailable');
    await expect(next).resolves.toBe('after');
    expect(p.stats).toMatchObject({ timedOut: 1, started: 2 });
  });

  it('gives a fresh thread’s first task its start-up time on top of the limit, and later tasks none', async () => {
    const p = pool({ startupMs: 2_000 });
    // 400 ms of work under a 150 ms limit passes on a fresh thread (it may be loading its code) ...
    await expect(p.run('spin', { ms: 400 }, { timeoutMs: 150 })).resolves.toBe(400);
    // ... but not on the same thread once it has answered.
    await expect(p.run('spin', { ms: 2_000 }, { timeoutMs: 150 })).rejects.toBeInstanceOf(EngineTimeoutError);
    expect(p.stats).toMatchObject({ tasks: 2, timedOut: 1, started: 1 });
  });

  it('cancels a running task (ending its thread) and a queued one (never started)', async () => {
    const p = pool();
    const running = new AbortController();
    const queued = new AbortController();
    const a = p.run('spin', { ms: 5_000 }, { signal: running.signal });
    const b = p.run('spin', { ms: 5_000 }, { signal: queued.signal });
    queued.abort();
    await expect(b).rejects.toBeInstanceOf(EngineCancelledError);
    const t0 = Date.now();
    running.abort();
    await expect(a).rejects.toBeInstanceOf(EngineCancelledError);
    expect(Date.now() - t0).toBeLessThan(1_000);
    await expect(p.run('echo', { value: 1 })).resolves.toBe(1);
    expect(p.stats.cancelled).toBe(2);
  });

  it('passes a task’s domain error on with its kind, and survives a thread that dies', async () => {
    const p = pool();
    const error = await p
      .run('fail', { message: 'no', kind: 'beyond_limit', code: 'x' })
      .catch((e: unknown) => e);
    expect(error).toBeInstanceOf(DomainError);
    expect(error).toMatchObject({ kind: 'beyond_limit', code: 'x', message: 'no' });
    await expect(p.run('exit', {})).rejects.toThrow(/stopped unexpectedly/);
    await expect(p.run('echo', { value: 'still here' })).resolves.toBe('still here');
  });
});
