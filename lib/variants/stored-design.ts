import { parseDesign, type Design } from '@/simulation';
import { ApiError } from '@/lib/api';

/**
 * The design file as the API receives it: validated (and migrated from older versions) by the engine's
 * own parser, so the database only ever holds documents the studio and the engine can read. A failure
 * answers 400 naming the field, e.g. `design.objects[2].uvbAt30`.
 */
export function validateDesign(input: unknown, fieldPrefix = 'design'): Design {
  const r = parseDesign(input);
  if (r.ok) return r.design;
  const field = r.error.path ? `${fieldPrefix}.${r.error.path}` : fieldPrefix;
  const message = `${field}: ${r.error.message}`;
  throw new ApiError(400, 'invalid', message, field, [{ field, message: r.error.message }]);
}

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
