/** Only same-site paths are followed after sign-in, so a crafted link cannot send people elsewhere. */
export function safeReturnTo(value: string | string[] | null | undefined, fallback = '/enclosures'): string {
  const v = Array.isArray(value) ? value[0] : value;
  if (typeof v !== 'string' || !v.startsWith('/') || v.startsWith('//') || v.startsWith('/\\'))
    return fallback;
  return v;
}
