/**
 * Where to go after sign-in: only a path of this app. The value is resolved against a stand-in origin
 * the way a browser would resolve it (so `/\t/evil.example`, which Chromium reads as `//evil.example`,
 * resolves to another host and is refused), and anything carrying a control character is refused outright.
 */
const BASE = 'http://app.invalid';

/** Tab, newline and the other C0 controls plus DEL: browsers strip some of them, headers refuse others. */
export function hasControlCharacter(value: string): boolean {
  return /[\u0000-\u001f\u007f]/.test(value);
}

export function safeReturnTo(value: string | string[] | null | undefined, fallback = '/enclosures'): string {
  const v = Array.isArray(value) ? value[0] : value;
  if (typeof v !== 'string' || !v.startsWith('/') || hasControlCharacter(v) || v.includes('\\'))
    return fallback;
  let url: URL;
  try {
    url = new URL(v, BASE);
  } catch {
    return fallback;
  }
  if (url.origin !== BASE) return fallback;
  const path = `${url.pathname}${url.search}${url.hash}`;
  // A path that normalises to `//host` would be read as another origin by the next reader.
  return path.startsWith('//') ? fallback : path;
}
