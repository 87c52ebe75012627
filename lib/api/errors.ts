import 'server-only';
import { ConnectionError, TimeoutError, UniqueConstraintError } from 'sequelize';
import type { Logger } from 'pino';
import { ZodError } from 'zod';
import { DomainError, type DomainErrorKind } from '@/lib/errors';
import { logger } from '@/lib/log';

/**
 * Every failure a route handler answers with. The body is always
 * `{ error: { code, message, field?, issues? } }`; internals (stack traces, SQL) never leave the server.
 */
export type ErrorCode =
  | 'invalid'
  | 'invalid_json'
  | 'unauthenticated'
  | 'forbidden'
  | 'cross_site'
  | 'not_found'
  | 'method_not_allowed'
  | 'conflict'
  | 'payload_too_large'
  | 'unsupported_media_type'
  | 'rate_limited'
  | 'unavailable'
  | 'internal';

export type Issue = { field: string; message: string };

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode | (string & {}),
    message: string,
    readonly field?: string,
    readonly issues?: Issue[],
    readonly headers?: Record<string, string>,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

export const badRequest = (field: string | undefined, message: string) =>
  new ApiError(400, 'invalid', message, field, field ? [{ field, message }] : undefined);
export const unauthenticated = () => new ApiError(401, 'unauthenticated', 'Sign in to continue.');
export const forbidden = (message = 'You do not have permission to do that.') =>
  new ApiError(403, 'forbidden', message);
export const notFound = (what = 'That') => new ApiError(404, 'not_found', `${what} was not found.`);
export const conflict = (message: string, code = 'conflict') => new ApiError(409, code, message);
export const payloadTooLarge = (limitBytes: number) =>
  new ApiError(413, 'payload_too_large', `The request is larger than ${Math.round(limitBytes / 1024)} KB.`);
export const unavailable = (retryAfterS = 5) =>
  new ApiError(
    503,
    'unavailable',
    // Not "nothing was changed": a save whose commit reached the disk just before the connection broke
    // is stored though its answer was lost (tests/reliability/crash-saves.test.ts); the next save says so.
    'The database cannot be reached right now; try again in a few seconds.',
    undefined,
    undefined,
    { 'Retry-After': String(retryAfterS) },
  );

export function fromZod(error: ZodError, prefix?: string): ApiError {
  const issues = error.issues.map((i) => ({
    field: [prefix, ...i.path.map(String)].filter(Boolean).join('.'),
    message: i.message,
  }));
  const first = issues[0];
  return new ApiError(400, 'invalid', first?.message ?? 'Invalid input.', first?.field || undefined, issues);
}

// Driver error codes meaning "the connection to MariaDB is gone or cannot be made".
const CONNECTION_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ETIMEDOUT',
  'EHOSTUNREACH',
  'ENOTFOUND',
  'EPIPE',
  'ER_GET_CONNECTION_TIMEOUT',
  'ER_CONNECTION_ALREADY_CLOSED',
  'ER_SOCKET_UNEXPECTED_CLOSE',
  'ER_CONNECTION_TIMEOUT',
  'ER_POOL_ALREADY_CLOSED',
  'ER_CLOSING_POOL',
  'ER_SERVER_SHUTDOWN',
]);

export function isDatabaseUnavailable(error: unknown): boolean {
  if (error instanceof ConnectionError || error instanceof TimeoutError) return true;
  let e: unknown = error;
  for (let depth = 0; e && typeof e === 'object' && depth < 4; depth++) {
    const { code, fatal } = e as { code?: unknown; fatal?: unknown };
    if (typeof code === 'string' && CONNECTION_CODES.has(code)) return true;
    if (fatal === true) return true;
    e =
      (e as { parent?: unknown; original?: unknown; cause?: unknown }).parent ??
      (e as { cause?: unknown }).cause;
  }
  return false;
}

/** The HTTP status of each kind of domain error: the one place a domain failure meets HTTP. */
const STATUS_OF: Record<DomainErrorKind, number> = {
  invalid: 400,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  gone: 410,
  too_large: 413,
  unsupported: 415,
  beyond_limit: 422,
  rate_limited: 429,
  cancelled: 499,
  unavailable: 503,
};

export function fromDomain(e: DomainError): ApiError {
  return new ApiError(
    STATUS_OF[e.kind],
    e.code,
    e.message,
    e.field,
    e.issues,
    e.retryAfterS === undefined ? undefined : { 'Retry-After': String(e.retryAfterS) },
  );
}

/** Turns anything thrown into a safe JSON response, logging what the client must not see. */
export function errorResponse(error: unknown, context = 'request', log: Logger = logger()): Response {
  let apiError: ApiError;
  if (error instanceof ApiError) apiError = error;
  else if (error instanceof DomainError) apiError = fromDomain(error);
  else if (error instanceof ZodError) apiError = fromZod(error);
  else if (isDatabaseUnavailable(error)) {
    log.error({ context, err: error }, 'database unavailable');
    apiError = unavailable();
  } else if (error instanceof UniqueConstraintError) {
    apiError = conflict('That already exists.');
  } else {
    log.error({ context, err: error }, 'unexpected error');
    apiError = new ApiError(
      500,
      'internal',
      'Something went wrong on our side. Nothing more is known; try again.',
    );
  }
  const body = {
    error: {
      code: apiError.code,
      message: apiError.message,
      ...(apiError.field ? { field: apiError.field } : {}),
      ...(apiError.issues ? { issues: apiError.issues } : {}),
    },
  };
  return Response.json(body, {
    status: apiError.status,
    headers: { 'Cache-Control': 'no-store', ...apiError.headers },
  });
}
