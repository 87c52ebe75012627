// A stand-in engine worker for the pool's own tests (plain JavaScript, so it needs no loader):
//   echo {value}       answers the value
//   spin {ms}          keeps its thread busy for ms milliseconds (as a heavy design would), then answers
//   fail {message}     throws; with {kind, code} it throws a domain-style error
//   exit               ends its thread without answering (a crash)
import { parentPort } from 'node:worker_threads';

parentPort.on('message', ({ id, name, input }) => {
  try {
    if (name === 'echo') return parentPort.postMessage({ id, ok: true, value: input.value });
    if (name === 'spin') {
      const end = Date.now() + input.ms;
      while (Date.now() < end);
      return parentPort.postMessage({ id, ok: true, value: input.ms });
    }
    if (name === 'exit') process.exit(3);
    const error = Object.assign(new Error(input.message), { kind: input.kind, code: input.code });
    throw error;
  } catch (e) {
    parentPort.postMessage({
      id,
      ok: false,
      error: { name: e.name, message: e.message, kind: e.kind, code: e.code },
    });
  }
});
