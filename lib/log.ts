import 'server-only';
import { randomUUID } from 'node:crypto';
import pino, { type Logger } from 'pino';

/**
 * The one logger of the server, the job runner and the CLI scripts: JSON lines on standard output, one
 * object per event, so a log collector can filter by `requestId` or `jobId`/`runId` without parsing
 * prose. Written synchronously (no transport thread): a process that exits right after an error still
 * leaves the line behind. LOG_LEVEL sets the level (default info; `silent` turns it off, as tests do);
 * LOG_TO_STDERR=1 sends the lines to standard error (command-line scripts keep standard output for
 * their own summary).
 */
type Holder = { logger?: Logger };
const holder = globalThis as unknown as { __baskwellLog?: Holder };

export function logger(): Logger {
  holder.__baskwellLog ??= {};
  holder.__baskwellLog.logger ??= pino(
    {
      level: process.env.LOG_LEVEL ?? (process.env.VITEST ? 'silent' : 'info'),
      base: { app: 'baskwell', pid: process.pid },
      timestamp: pino.stdTimeFunctions.isoTime,
      serializers: { err: errorForLog },
      redact: { paths: ['password', '*.password', 'passwordHash', '*.passwordHash'], remove: true },
    },
    pino.destination({ fd: process.env.LOG_TO_STDERR === '1' ? 2 : 1, sync: true }),
  );
  return holder.__baskwellLog.logger;
}

/**
 * An error as one log field: its kind, code and message (first line, clipped) and the top of its stack.
 * Not the driver's copies of the SQL text: they repeat the statement three times and can carry the
 * values of a row (names, e-mail addresses). Errors never reach a client; this is the server's record.
 */
export function errorForLog(error: unknown): Record<string, unknown> {
  if (!(error instanceof Error)) return { message: String(error).slice(0, 500) };
  const e = error as Error & { code?: unknown; errno?: unknown; parent?: { code?: unknown } };
  return {
    type: e.name,
    message: e.message.split('\n')[0]!.slice(0, 500),
    ...((e.code ?? e.parent?.code) ? { code: e.code ?? e.parent?.code } : {}),
    ...(e.errno ? { errno: e.errno } : {}),
    // Frames only: the stack's first lines repeat the whole message, SQL included.
    stack: e.stack
      ?.split('\n')
      .map((l) => l.trim())
      .filter((l) => l.startsWith('at '))
      .slice(0, 8),
  };
}

/** An id for a request: the caller's `X-Request-Id` when it is a plausible one, else a new one. */
export function requestIdOf(headers: Headers): string {
  const given = headers.get('x-request-id');
  return given && /^[\w.:-]{8,100}$/.test(given) ? given : randomUUID();
}

/** A logger for one request: every line it writes carries the request id. */
export function requestLogger(requestId: string): Logger {
  return logger().child({ requestId });
}

/**
 * The message of anything thrown, for places that record it as text (job runs, failed units, outbox
 * rows, which the owner's jobs page shows): its first line only, so the SQL a database error carries
 * on the following lines is never stored there.
 */
export function errorText(error: unknown): string {
  return (error instanceof Error ? error.message : String(error)).split('\n')[0]!.slice(0, 500);
}
