/** A failed call to our JSON API, carrying the server's typed error for the form to show. */
export class ApiClientError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly field?: string,
  ) {
    super(message);
    this.name = 'ApiClientError';
  }
}

type ErrorBody = { error?: { code?: string; message?: string; field?: string } };

/** Sends JSON to one of our route handlers and returns its JSON, or throws ApiClientError. */
export async function sendJson<T = unknown>(method: string, url: string, body?: unknown): Promise<T> {
  let res: Response;
  try {
    res = await fetch(url, {
      method,
      credentials: 'same-origin',
      cache: 'no-store',
      headers: body === undefined ? undefined : { 'content-type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    throw new ApiClientError(
      0,
      'offline',
      'Baskwell cannot be reached. Check your connection and try again.',
    );
  }
  const data = (await res.json().catch(() => null)) as (T & ErrorBody) | null;
  if (!res.ok) {
    const e = data?.error;
    throw new ApiClientError(
      res.status,
      e?.code ?? 'error',
      e?.message ?? `The request failed (${res.status}).`,
      e?.field,
    );
  }
  return data as T;
}

/** Splits an error into a message for one field (when the server named it) and a general one. */
export function fieldError(error: unknown): { field?: string; message: string } {
  if (error instanceof ApiClientError) return { field: error.field, message: error.message };
  return { message: 'Something went wrong. Try again.' };
}
