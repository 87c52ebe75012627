/**
 * Runs the engine off the server's event loop: `await runEngineTask('fieldPng', input)` sends the task to
 * one of a few worker threads (see `pool.ts` for the queue, the time limit and the cancel, `tasks.ts`
 * for the tasks). Everything on the server that simulates a design goes through here — exports, the
 * share page, the guided start — so a heavy design costs one thread, never the health check or anyone
 * else's page.
 *
 * One pool per process, on `globalThis`: a production build gives every route its own copy of this
 * module, and they must share the threads.
 *
 * The worker file is TypeScript. Under Next (`next dev`, `next build`/`next start`) the bundler sees the
 * literal `new Worker(new URL('./worker.ts', import.meta.url))` and bundles the worker with everything
 * it imports. Anywhere else (vitest, tsx scripts) there is no bundler: the worker registers tsx's loader
 * first and imports the same file as source.
 */
import 'server-only';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { availableParallelism } from 'node:os';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { Worker } from 'node:worker_threads';
import { config, type ServerConfig } from '@/lib/config';
import { WorkerPool, type RunOptions } from './pool';
import type { EngineTasks } from './tasks';

export {
  EngineBusyError,
  EngineCancelledError,
  EngineTimeoutError,
  WorkerPool,
  type PoolOptions,
  type RunOptions,
} from './pool';
export type { EngineTasks, FieldPicture, SharedView } from './tasks';

export type EngineTaskName = keyof EngineTasks;
export type EngineTaskInput<K extends EngineTaskName> = Parameters<EngineTasks[K]>[0];
export type EngineTaskResult<K extends EngineTaskName> = Awaited<ReturnType<EngineTasks[K]>>;

const WORKER_NAME = 'baskwell-engine';
// Built at run time so no bundler tries to pull tsx (a development tool) into the server build.
const TSX_PACKAGE = ['tsx', 'package.json'].join('/');
type TsxPackage = { exports: Record<'./esm/api', { import: { default: string } }> };

/** Starts one engine worker: bundled under Next, TypeScript source through tsx elsewhere. */
export function spawnEngineWorker(): Worker {
  if (process.env.NEXT_RUNTIME) {
    return new Worker(new URL('./worker.ts', import.meta.url), { name: WORKER_NAME });
  }
  const here = path.dirname(fileURLToPath(import.meta.url));
  const entry = pathToFileURL(path.join(here, 'worker.ts')).href;
  const root = path.resolve(here, '..', '..');
  // tsx's ES-module API (its CommonJS twin cannot register the loader in a worker), found through its
  // package's exports from this project rather than from the current directory; the project's tsconfig
  // makes `@/` imports resolve. The loader is registered before the worker file is imported.
  const tsxPackage = createRequire(path.join(root, 'package.json')).resolve(TSX_PACKAGE);
  const exportsMap = (JSON.parse(readFileSync(tsxPackage, 'utf8')) as TsxPackage).exports['./esm/api'];
  const tsx = path.join(path.dirname(tsxPackage), exportsMap.import.default);
  // Server modules start with `import 'server-only'`; outside Next it resolves to nothing (the same hook
  // as the server scripts', scripts/lib/server-only.mjs).
  const serverOnly = pathToFileURL(path.join(root, 'scripts', 'lib', 'server-only.mjs')).href;
  const boot = [
    `import(${JSON.stringify(pathToFileURL(tsx).href)})`,
    `.then(({ register }) => register({ tsconfig: ${JSON.stringify(path.join(root, 'tsconfig.json'))} }))`,
    `.then(() => import(${JSON.stringify(serverOnly)}))`,
    `.then(() => import(${JSON.stringify(entry)}))`,
  ].join('');
  return new Worker(boot, { eval: true, name: WORKER_NAME });
}

/**
 * Threads: ENGINE_THREADS, or the cores but one shared among the machine's web server processes
 * (WEB_PROCESSES, which `npm start` sets for each; at least 1 a process, at most 4): with a server process
 * a core, a thread each, not cores − 1 each.
 */
export function defaultThreads(
  cores = availableParallelism(),
  { ENGINE_THREADS, WEB_PROCESSES }: Pick<ServerConfig, 'ENGINE_THREADS' | 'WEB_PROCESSES'> = config(),
): number {
  return ENGINE_THREADS ?? Math.min(4, Math.max(1, Math.floor((cores - 1) / WEB_PROCESSES)));
}

const KEY = Symbol.for('baskwell.engine-pool');
const holder = globalThis as typeof globalThis & { [KEY]?: WorkerPool };

/** The process's engine pool, started on first use. */
export function enginePool(): WorkerPool {
  if (!holder[KEY]) {
    const c = config();
    holder[KEY] = new WorkerPool({
      size: defaultThreads(),
      maxQueue: c.ENGINE_QUEUE,
      timeoutMs: c.ENGINE_TIMEOUT_MS,
      // A fresh worker loads the engine first (seconds under tsx, or on a machine that is very busy).
      startupMs: 60_000,
      spawn: spawnEngineWorker,
    });
  }
  return holder[KEY];
}

/** Ends the process's pool (tests; a script that wants to exit at once). The next task starts a new one. */
export async function closeEnginePool(): Promise<void> {
  const pool = holder[KEY];
  delete holder[KEY];
  await pool?.close();
}

/**
 * Runs one engine task on a worker thread. Rejects with EngineBusyError (503) when every thread is busy
 * and the queue is full, EngineTimeoutError (503) past the time limit, EngineCancelledError when
 * `signal` aborts (pass the request's signal, so a closed browser tab stops its work), or the task's own
 * error (a domain error keeps its kind, so the pipeline answers its status).
 */
export function runEngineTask<K extends EngineTaskName>(
  name: K,
  input: EngineTaskInput<K>,
  options?: RunOptions,
): Promise<EngineTaskResult<K>> {
  return enginePool().run(name, input, options) as Promise<EngineTaskResult<K>>;
}
