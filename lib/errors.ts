/**
 * What a domain module throws when it cannot do what was asked. It says what went wrong (its kind, a
 * machine code, a message for the person, the field at fault) and nothing about the transport: the route
 * pipeline (`errorResponse` in lib/api/errors.ts) alone turns a kind into an HTTP status, and a page turns
 * "not found" into Next's 404 (the `…ForPage` loaders in a domain's access.ts give it null). So the
 * same code serves a route, a page, a background job and a script.
 */
export type DomainErrorKind =
  | 'invalid' // the input is wrong; `field` names it
  | 'not_found' // no such thing, or not one this person may know of
  | 'forbidden' // they may see it but not do this to it
  | 'conflict' // it clashes with what is stored (a duplicate, an edit made meanwhile)
  | 'gone' // it existed but can no longer be used (an invitation taken or withdrawn)
  | 'too_large' // more bytes than accepted
  | 'unsupported' // a kind of file or content that is not accepted
  | 'beyond_limit' // well-formed, but more work than the server will do
  | 'rate_limited' // too many tries; `retryAfterS` says when to try again
  | 'unavailable' // a service it needs is down or busy; `retryAfterS` says when to try again
  | 'cancelled'; // the asker went away

export type FieldIssue = { field: string; message: string };

type Details = { code?: string; field?: string; issues?: FieldIssue[]; retryAfterS?: number };

/**
 * A mark every domain error carries, registered globally: a production build gives each route its own copy
 * of this module, and the engine pool (one per process, shared through globalThis) throws errors made by
 * whichever route's copy started it, so `instanceof` against another copy's class would miss them and a
 * busy or timed-out engine would answer 500 instead of 503.
 */
const BRAND: unique symbol = Symbol.for('baskwell.DomainError');

export class DomainError extends Error {
  static override [Symbol.hasInstance](value: unknown): boolean {
    // For DomainError itself, any copy's domain error counts; a subclass keeps the usual prototype test.
    if (this === DomainError)
      return (
        typeof value === 'object' && value !== null && (value as Record<symbol, unknown>)[BRAND] === true
      );
    return Function.prototype[Symbol.hasInstance].call(this, value);
  }

  readonly [BRAND] = true;
  readonly code: string;
  readonly field?: string;
  readonly issues?: FieldIssue[];
  readonly retryAfterS?: number;

  constructor(
    readonly kind: DomainErrorKind,
    message: string,
    details: Details = {},
  ) {
    super(message);
    this.name = 'DomainError';
    this.code = details.code ?? kind;
    this.field = details.field;
    this.issues = details.issues;
    this.retryAfterS = details.retryAfterS;
  }
}

/** The input is wrong at `field` (undefined: the request as a whole). */
export const invalid = (field: string | undefined, message: string, code = 'invalid') =>
  new DomainError('invalid', message, { code, field, issues: field ? [{ field, message }] : undefined });

/** Not there, or not this person's to know of (another organisation's things are "not found"). */
export const notFound = (what = 'That', field?: string) =>
  new DomainError('not_found', `${what} was not found.`, { field });

export const forbidden = (message = 'You do not have permission to do that.', code = 'forbidden') =>
  new DomainError('forbidden', message, { code });

export const conflict = (message: string, code = 'conflict') =>
  new DomainError('conflict', message, { code });

export const rateLimited = (message: string, retryAfterS: number) =>
  new DomainError('rate_limited', message, { retryAfterS });

export const isDomainError = (e: unknown, ...kinds: DomainErrorKind[]): e is DomainError =>
  e instanceof DomainError && (kinds.length === 0 || kinds.includes(e.kind));

/** For a page: what `load` gives, or null when it throws "not found" (the page then answers its 404). */
export async function nullIfNotFound<T>(load: () => Promise<T>): Promise<T | null> {
  try {
    return await load();
  } catch (e) {
    if (isDomainError(e, 'not_found')) return null;
    throw e;
  }
}
