type HeaderSource = Headers | Record<string, string | string[] | undefined> | undefined;

function header(headers: HeaderSource, name: string): string | undefined {
  if (!headers) return undefined;
  if (headers instanceof Headers) return headers.get(name) ?? undefined;
  const v = headers[name] ?? headers[name.toLowerCase()];
  return Array.isArray(v) ? v[0] : v;
}

/**
 * The client's address as reported by the reverse proxy in front of the app (first hop of
 * X-Forwarded-For, else X-Real-IP). Deploy behind a proxy that overwrites these headers.
 */
export function clientAddress(headers: HeaderSource): string {
  const forwarded = header(headers, 'x-forwarded-for')?.split(',')[0]?.trim();
  if (forwarded) return forwarded;
  const real = header(headers, 'x-real-ip')?.trim();
  return real || 'unknown';
}
