import { DomainError } from '@/lib/errors';
import { designWorkProblem, TOO_COMPLEX, parseDesign, type Design } from '@/simulation';

/** 422: a well-formed design beyond the engine work bound; the message names the limit. */
export const tooComplex = (field: string, message: string) =>
  new DomainError('beyond_limit', `${field}: ${message}`, {
    code: TOO_COMPLEX,
    field,
    issues: [{ field, message }],
  });

/**
 * Before the server computes a stored design: one saved before the work bound existed may be beyond it,
 * and is refused (422 naming the limit) rather than computed. It still opens in the studio.
 */
export function assertComputable(design: Design): void {
  const problem = designWorkProblem(design);
  if (problem) throw tooComplex('design.objects', problem);
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
