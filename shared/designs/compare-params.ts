import { z } from 'zod';
import type { FieldName } from '@/simulation';

/**
 * The compare page's choices, all in its URL: `?a=&b=&field=uvi&months=0&species=`. Without `species`
 * the page assesses against the species of variant A's enclosure; `species=none` asks for no species.
 */
export const MONTH_CHOICES = [0, 3, 6, 12, 18, 24] as const;

const id = z.coerce.number().int().positive().optional().catch(undefined);

export const compareParamsSchema = z.object({
  a: id,
  b: id,
  field: z.enum(['uvi', 'uvb', 'tempC']).catch('uvi'),
  months: z.coerce.number().int().min(0).max(120).catch(0),
  species: z
    .union([z.literal('none'), z.coerce.number().int().positive()])
    .optional()
    .catch(undefined),
});

export type CompareParams = {
  a?: number;
  b?: number;
  field: FieldName;
  months: number;
  /** A species sheet id; 'none' for no species; undefined for "the enclosure's species". */
  species?: number | 'none';
};

/** Reads the URL's search parameters; anything malformed falls back to its default. */
export function parseCompareParams(search: Record<string, string | string[] | undefined>): CompareParams {
  const first = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);
  const raw = Object.fromEntries(Object.entries(search).map(([k, v]) => [k, first(v)]));
  const p = compareParamsSchema.parse({ field: undefined, months: undefined, ...raw });
  return { a: p.a, b: p.b, field: p.field, months: p.months, species: p.species };
}

export function compareQuery(p: CompareParams): string {
  const q = new URLSearchParams();
  if (p.a) q.set('a', String(p.a));
  if (p.b) q.set('b', String(p.b));
  q.set('field', p.field);
  q.set('months', String(p.months));
  if (p.species) q.set('species', String(p.species));
  return q.toString();
}
