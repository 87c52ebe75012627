/** A failed call to our JSON API, carrying the server's typed error (code, message, field) for the UI. */
export class ApiClientError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly field?: string,
    readonly body?: unknown,
  ) {
    super(message);
    this.name = 'ApiClientError';
  }
}

type ErrorBody = { error?: { code?: string; message?: string; field?: string } };

/**
 * The one way the browser calls our route handlers: `json` is sent as the JSON body; the answer's JSON
 * comes back, or an ApiClientError (status 0 when the server cannot be reached).
 */
export async function apiFetch<T>(url: string, init: RequestInit & { json?: unknown } = {}): Promise<T> {
  const { json, ...rest } = init;
  let res: Response;
  try {
    res = await fetch(url, {
      credentials: 'same-origin',
      cache: 'no-store',
      ...rest,
      headers: { ...(json !== undefined ? { 'content-type': 'application/json' } : {}), ...rest.headers },
      body: json !== undefined ? JSON.stringify(json) : rest.body,
    });
  } catch {
    throw new ApiClientError(
      0,
      'offline',
      'Baskwell cannot be reached. Check your connection and try again.',
    );
  }
  const body = (await res.json().catch(() => null)) as (T & ErrorBody) | null;
  if (!res.ok) {
    const e = body?.error;
    throw new ApiClientError(
      res.status,
      e?.code ?? 'error',
      e?.message ?? `The request failed (${res.status}).`,
      e?.field,
      body,
    );
  }
  return body as T;
}

/** Sends JSON to one of our route handlers and returns its JSON, or throws ApiClientError. */
export function sendJson<T = unknown>(method: string, url: string, body?: unknown): Promise<T> {
  return apiFetch<T>(url, { method, json: body });
}

/** Splits an error into a message for one field (when the server named it) and a general one. */
export function fieldError(error: unknown): { field?: string; message: string } {
  if (error instanceof ApiClientError) return { field: error.field, message: error.message };
  return { message: 'Something went wrong. Try again.' };
}
