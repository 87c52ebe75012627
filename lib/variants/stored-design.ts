import { parseDesign, type Design } from '@/simulation';

export const serializeDesign = (design: Design): string => JSON.stringify(design);

/**
 * Reads a stored document. Everything stored passed validation; older stored versions are migrated on
 * the way out. Should the parser ever refuse a stored document (a newer schema tightened a rule), the
 * raw document is still returned rather than hiding the user's work behind an error.
 */
export function readStoredDesign(json: string): Design {
  const raw: unknown = JSON.parse(json);
  const r = parseDesign(raw);
  if (r.ok) return r.design;
  console.warn(`stored design no longer validates at ${r.error.path}: ${r.error.message}`);
  return raw as Design;
}
