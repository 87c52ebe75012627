/**
 * A small pool of worker threads that runs named tasks one at a time each, with a time limit and a
 * cancel. The engine is synchronous CPU work: run on the server's event loop, one heavy design held up
 * every other request (the health check included) for seconds. In a worker it only takes a core.
 *
 * A running task cannot be interrupted from outside, so a task that runs out of time or is cancelled
 * ends its worker (`terminate`) and a fresh one is started for the next task. A queue of bounded length
 * holds tasks while every worker is busy; beyond it the pool refuses at once (busy) rather than let
 * waiting requests pile up.
 *
 * Generic: knows nothing of the engine. `index.ts` gives it the engine's worker and task names.
 */
import type { Worker } from 'node:worker_threads';
import { DomainError, type DomainErrorKind } from '@/lib/errors';

export type PoolOptions = {
  /** Worker threads at most (started when first needed, kept while the process lives). */
  size: number;
  /** Tasks that may wait for a free worker; one more is refused with `EngineBusyError`. */
  maxQueue: number;
  /** Default time limit of one task in milliseconds, counted from when a worker starts it. */
  timeoutMs: number;
  /**
   * Extra time for a new worker's first task (ms): the worker loads its code before it can start, and on a
   * busy machine that alone can take longer than a task may. Later tasks get the plain limit.
   */
  startupMs?: number;
  /** Starts one worker speaking the protocol of `worker-protocol.ts`. */
  spawn: () => Worker;
};

export type RunOptions = {
  /** This task's time limit (ms), instead of the pool's default. */
  timeoutMs?: number;
  /** Aborting cancels the task: dropped from the queue, or its worker ended if it already runs. */
  signal?: AbortSignal;
};

/** The message a worker receives, and the two it may answer with. */
export type TaskRequest = { id: number; name: string; input: unknown };
export type SerialisedError = {
  name: string;
  message: string;
  /** A domain error's kind (lib/errors.ts): it is rebuilt as one, and the pipeline answers its status. */
  kind?: DomainErrorKind;
  code?: string;
  field?: string;
  issues?: { field: string; message: string }[];
};
export type TaskReply =
  { id: number; ok: true; value: unknown } | { id: number; ok: false; error: SerialisedError };

/** Every worker is busy and the queue is full: try again in a few seconds. */
export class EngineBusyError extends DomainError {
  constructor() {
    super('unavailable', 'The server is computing many designs right now; try again in a few seconds.', {
      code: 'engine_busy',
      retryAfterS: 5,
    });
    this.name = 'EngineBusyError';
  }
}

/** A task ran past its time limit; its worker was ended. */
export class EngineTimeoutError extends DomainError {
  constructor(readonly limitMs: number) {
    super(
      'unavailable',
      `Computing this design took longer than the server allows (${Math.round(limitMs / 1000)} s), so it was stopped. Try again in a minute; if it keeps happening, simplify the design.`,
      { code: 'engine_timeout', retryAfterS: 30 },
    );
    this.name = 'EngineTimeoutError';
  }
}

/** The caller cancelled (e.g. the browser went away); nobody reads this answer. */
export class EngineCancelledError extends DomainError {
  constructor() {
    super('cancelled', 'The request was cancelled.');
    this.name = 'EngineCancelledError';
  }
}

type Job = {
  name: string;
  input: unknown;
  timeoutMs: number;
  signal?: AbortSignal;
  onAbort?: () => void;
  resolve: (value: unknown) => void;
  reject: (error: unknown) => void;
  settled?: boolean;
};

type Slot = { worker: Worker; job: Job | null; id: number; timer: NodeJS.Timeout | null; fresh: boolean };

/** Rebuilds an error thrown inside a task: a domain error stays one (its kind, code and field reach the client). */
export function reviveError(e: SerialisedError): Error {
  if (e.kind) return new DomainError(e.kind, e.message, { code: e.code, field: e.field, issues: e.issues });
  const error = new Error(e.message);
  error.name = e.name;
  return error;
}

export class WorkerPool {
  private readonly slots = new Set<Slot>();
  private readonly queue: Job[] = [];
  private nextId = 1;
  private closed = false;
  /** Tasks handed to a worker, tasks stopped for running out of time, workers started in all (for tests and the health of the pool). */
  readonly counts = { tasks: 0, timedOut: 0, cancelled: 0, started: 0, crashed: 0 };

  constructor(private readonly opts: PoolOptions) {
    if (!(opts.size >= 1)) throw new RangeError('a worker pool needs at least one thread');
  }

  get stats() {
    const busy = [...this.slots].filter((s) => s.job).length;
    return { threads: this.slots.size, busy, queued: this.queue.length, ...this.counts };
  }

  run(name: string, input: unknown, options: RunOptions = {}): Promise<unknown> {
    if (this.closed) return Promise.reject(new Error('the worker pool is closed'));
    if (options.signal?.aborted) return Promise.reject(new EngineCancelledError());
    const free = [...this.slots].some((s) => !s.job) || this.slots.size < this.opts.size;
    if (!free && this.queue.length >= this.opts.maxQueue) return Promise.reject(new EngineBusyError());
    return new Promise((resolve, reject) => {
      const job: Job = {
        name,
        input,
        timeoutMs: options.timeoutMs ?? this.opts.timeoutMs,
        signal: options.signal,
        resolve,
        reject,
      };
      if (job.signal) {
        job.onAbort = () => this.cancel(job);
        job.signal.addEventListener('abort', job.onAbort, { once: true });
      }
      this.queue.push(job);
      this.dispatch();
    });
  }

  /** Ends every worker; tasks still waiting or running are refused. */
  async close(): Promise<void> {
    this.closed = true;
    for (const job of this.queue.splice(0)) this.settle(job, new Error('the worker pool was closed'));
    await Promise.all(
      [...this.slots].map((slot) => {
        if (slot.job) this.settle(slot.job, new Error('the worker pool was closed'));
        return this.retire(slot);
      }),
    );
  }

  private dispatch(): void {
    while (this.queue.length > 0) {
      let slot = [...this.slots].find((s) => !s.job);
      if (!slot) {
        if (this.slots.size >= this.opts.size) return;
        slot = this.startWorker();
      }
      const job = this.queue.shift()!;
      slot.job = job;
      slot.id = this.nextId++;
      slot.worker.ref();
      this.counts.tasks++;
      const startup = slot.fresh ? (this.opts.startupMs ?? 0) : 0;
      slot.timer = setTimeout(() => {
        this.counts.timedOut++;
        this.abandon(slot, new EngineTimeoutError(job.timeoutMs));
      }, job.timeoutMs + startup);
      const request: TaskRequest = { id: slot.id, name: job.name, input: job.input };
      try {
        slot.worker.postMessage(request);
      } catch (e) {
        // The input could not be copied to the worker (a function, a class instance with private state).
        this.finish(slot);
        this.settle(job, e);
      }
    }
  }

  private startWorker(): Slot {
    const worker = this.opts.spawn();
    this.counts.started++;
    const slot: Slot = { worker, job: null, id: 0, timer: null, fresh: true };
    this.slots.add(slot);
    // An idle worker must not keep a script or a test run alive; `dispatch` refs it while it works.
    worker.unref();
    worker.on('message', (reply: TaskReply) => {
      if (!slot.job || reply.id !== slot.id) return;
      const job = slot.job;
      slot.fresh = false;
      this.finish(slot);
      if (reply.ok) this.settle(job, null, reply.value);
      else this.settle(job, reviveError(reply.error));
      this.dispatch();
    });
    worker.on('error', (error) => {
      this.counts.crashed++;
      this.abandon(slot, error);
    });
    worker.on('exit', () => {
      if (!this.slots.has(slot)) return;
      this.counts.crashed++;
      this.abandon(slot, new Error('the engine worker stopped unexpectedly'));
    });
    return slot;
  }

  /** The slot's task is over (answered): free the worker for the next one. */
  private finish(slot: Slot): void {
    if (slot.timer) clearTimeout(slot.timer);
    slot.timer = null;
    slot.job = null;
    slot.worker.unref();
  }

  /** Gives up on the slot's worker (time out, cancel, crash): refuse its task, end it, carry on. */
  private abandon(slot: Slot, error: unknown): void {
    if (!this.slots.has(slot)) return;
    const job = slot.job;
    if (slot.timer) clearTimeout(slot.timer);
    void this.retire(slot);
    if (job) this.settle(job, error);
    if (!this.closed) this.dispatch();
  }

  private retire(slot: Slot): Promise<unknown> {
    this.slots.delete(slot);
    slot.job = null;
    slot.worker.removeAllListeners('message');
    // Errors while terminating are of no interest any more; a listener keeps them from being thrown.
    slot.worker.removeAllListeners('error');
    slot.worker.on('error', () => {});
    return slot.worker.terminate();
  }

  private cancel(job: Job): void {
    this.counts.cancelled++;
    const queued = this.queue.indexOf(job);
    if (queued >= 0) {
      this.queue.splice(queued, 1);
      this.settle(job, new EngineCancelledError());
      return;
    }
    const slot = [...this.slots].find((s) => s.job === job);
    if (slot) this.abandon(slot, new EngineCancelledError());
  }

  private settle(job: Job, error: unknown, value?: unknown): void {
    if (job.settled) return;
    job.settled = true;
    if (job.onAbort) job.signal?.removeEventListener('abort', job.onAbort);
    if (error) job.reject(error);
    else job.resolve(value);
  }
}
