// Validation of inspector edits against the engine's zod schema (the single source of truth),
// with messages written for people and limits shown in the unit they are typing in.
import type { z } from 'zod';
import { backdropSchema, designObjectSchema, enclosureSchema } from '@/simulation';
import { formatLength, formatNumber, formatTemp, type DisplayUnits } from '@/shared/units';
import type { Backdrop, DesignObject, Enclosure } from '../state/types';

export type FieldKind = 'length' | 'temp' | 'percent' | 'plain';

export type { DisplayUnits };

function limit(v: number, kind: FieldKind, u: DisplayUnits): string {
  if (kind === 'length') return formatLength(v, u.length, 2);
  if (kind === 'temp') return formatTemp(v, u.temp);
  if (kind === 'percent') return `${formatNumber(v * 100, 0)} %`;
  return formatNumber(v, 4);
}

export function issueMessage(issue: z.core.$ZodIssue, kind: FieldKind, u: DisplayUnits): string {
  if (issue.code === 'too_small') {
    const min = Number(issue.minimum);
    return issue.inclusive
      ? `Must be at least ${limit(min, kind, u)}.`
      : `Must be more than ${limit(min, kind, u)}.`;
  }
  if (issue.code === 'too_big') {
    const max = Number(issue.maximum);
    return issue.inclusive
      ? `Must be at most ${limit(max, kind, u)}.`
      : `Must be less than ${limit(max, kind, u)}.`;
  }
  if (issue.code === 'invalid_type') return 'Enter a number.';
  const m = issue.message.replace(/^Invalid input: /, '');
  return m.charAt(0).toUpperCase() + m.slice(1) + (m.endsWith('.') ? '' : '.');
}

export type Check<T> = { ok: true; value: T } | { ok: false; message: string };

/** Sets `key` on `base` (undefined takes it away) and parses the result: the edited thing, or `describe`'s message. */
function checkEdit<T>(
  schema: z.ZodType<T>,
  base: object,
  key: string,
  value: unknown,
  describe: (issues: z.core.$ZodIssue[]) => string,
): Check<T> {
  const candidate: Record<string, unknown> = { ...base, [key]: value };
  if (value === undefined) delete candidate[key];
  const r = schema.safeParse(candidate);
  return r.success ? { ok: true, value: r.data } : { ok: false, message: describe(r.error.issues) };
}

/** Validates an object after setting `key`; returns the first problem with that field, or with the object. */
export function checkObjectEdit(
  object: DesignObject,
  key: string,
  value: unknown,
  kind: FieldKind,
  u: DisplayUnits,
): Check<DesignObject> {
  return checkEdit(designObjectSchema, object, key, value, (issues) => {
    const issue = issues.find((i) => i.path[0] === key) ?? issues[0];
    return issue ? issueMessage(issue, issue.path[0] === key ? kind : 'plain', u) : 'Not valid.';
  });
}

export function checkEnclosureEdit(
  enclosure: Enclosure,
  key: keyof Enclosure,
  value: number | undefined,
  kind: FieldKind,
  u: DisplayUnits,
): Check<Enclosure> {
  return checkEdit(enclosureSchema, enclosure, key, value, ([issue]) =>
    issue ? issueMessage(issue, kind, u) : 'Not valid.',
  );
}

export function checkBackdropEdit(
  backdrop: Backdrop,
  key: 'x' | 'y' | 'width' | 'height',
  value: number | undefined,
  u: DisplayUnits,
): Check<Backdrop> {
  if (value === undefined) return { ok: false, message: 'Enter a number.' };
  const r = backdropSchema.safeParse({ ...backdrop, [key]: value });
  if (r.success) return { ok: true, value: r.data };
  const issue = r.error.issues[0];
  return { ok: false, message: issue ? issueMessage(issue, 'length', u) : 'Not valid.' };
}

/**
 * A depth (cm from the front) must lie inside the enclosure's depth: a rule of the whole design that the
 * per-object schema cannot see. Null when it does (or is left to the default, half the depth).
 */
export function checkWithinDepth(
  value: number | undefined,
  depth: number,
  u: DisplayUnits,
): { ok: false; message: string } | null {
  if (value === undefined || !(value > depth)) return null;
  return { ok: false, message: `Must be at most ${limit(depth, 'length', u)}, the enclosure's depth.` };
}

/** Parses what the user typed (accepting a decimal comma); null for empty, NaN for nonsense. */
export function parseTyped(text: string): number | null {
  const t = text.trim().replace(',', '.');
  if (t === '') return null;
  if (!/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t)) return Number.NaN;
  return Number(t);
}
