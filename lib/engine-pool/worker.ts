/**
 * Entry of one engine worker thread: answers each `TaskRequest` from the pool with the named task's
 * result, or with the error it threw (a domain error keeps its kind, code and field).
 */
import { parentPort } from 'node:worker_threads';
import { DomainError } from '@/lib/errors';
import type { SerialisedError, TaskReply, TaskRequest } from './pool';
import { engineTasks } from './tasks';

function serialise(error: unknown): SerialisedError {
  if (!(error instanceof Error)) return { name: 'Error', message: String(error) };
  if (!(error instanceof DomainError)) return { name: error.name, message: error.message };
  const e = error;
  return {
    name: e.name,
    message: e.message,
    kind: e.kind,
    code: e.code,
    ...(e.field ? { field: e.field } : {}),
    ...(e.issues ? { issues: e.issues } : {}),
  };
}

const port = parentPort;
if (!port) throw new Error('lib/engine-pool/worker.ts runs only as a worker thread');

port.on('message', async (request: TaskRequest) => {
  let reply: TaskReply;
  try {
    const task = (engineTasks as Record<string, (input: unknown) => unknown>)[request.name];
    if (!task || !Object.hasOwn(engineTasks, request.name)) {
      throw new Error(`no engine task is called "${request.name}"`);
    }
    reply = { id: request.id, ok: true, value: await task(request.input) };
  } catch (error) {
    if (!(error instanceof DomainError)) console.error(`engine task ${request.name} failed`, error);
    reply = { id: request.id, ok: false, error: serialise(error) };
  }
  port.postMessage(reply);
});
