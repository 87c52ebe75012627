import type { z } from 'zod';
import { computableDesignSchema, DESIGN_FORMAT, DESIGN_VERSION, designSchema, type Design } from './schema';
import { DESIGN_MIGRATIONS, type Migration } from './migrations';

export interface ParseError {
  path: string;
  message: string;
  /** Set for a rule with its own meaning, e.g. TOO_COMPLEX for a design beyond the work bound. */
  code?: string;
}
export type ParseResult<T> = { ok: true; design: T } | { ok: false; error: ParseError };

/** "objects[2].uvbAt30" from a zod path. */
export function formatPath(path: readonly PropertyKey[]): string {
  let out = '';
  for (const p of path) {
    if (typeof p === 'number') out += `[${p}]`;
    else out += out ? `.${String(p)}` : String(p);
  }
  return out;
}

/** First zod issue as a path and a short message; an unknown field's path names the field itself. */
export function firstIssue(error: z.ZodError): ParseError {
  const issue = error.issues[0];
  if (!issue) return { path: '', message: 'invalid input' };
  if (issue.code === 'unrecognized_keys') {
    const key = issue.keys[0] ?? '';
    return { path: formatPath([...issue.path, key]), message: 'unknown field' };
  }
  const message = issue.message.replace(/^Invalid input: /, '');
  const code = issue.code === 'custom' ? (issue.params as { code?: unknown } | undefined)?.code : undefined;
  return { path: formatPath(issue.path), message, ...(typeof code === 'string' ? { code } : {}) };
}

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** Upgrade an older document step by step; leaves current and unknown shapes to the schema. */
export function migrateDesign(
  input: unknown,
  migrations: Readonly<Record<number, Migration>> = DESIGN_MIGRATIONS,
): { ok: true; doc: unknown } | { ok: false; error: ParseError } {
  if (!isRecord(input) || input.format !== DESIGN_FORMAT || typeof input.version !== 'number') {
    return { ok: true, doc: input };
  }
  let doc: Record<string, unknown> = input;
  let version = input.version;
  if (version > DESIGN_VERSION) {
    return {
      ok: false,
      error: {
        path: 'version',
        message: `version ${version} is newer than this app reads (${DESIGN_VERSION})`,
      },
    };
  }
  while (version < DESIGN_VERSION) {
    const step = migrations[version];
    if (!step)
      return { ok: false, error: { path: 'version', message: `cannot upgrade from version ${version}` } };
    doc = step(doc);
    if (doc.version !== version + 1) {
      return { ok: false, error: { path: 'version', message: `upgrade from version ${version} failed` } };
    }
    version += 1;
  }
  return { ok: true, doc };
}

/**
 * Validate a design file (any version this app knows), migrating older versions first. `computable`
 * also applies the work bound (computableDesignSchema): the server's rule for what it saves and computes.
 */
export function parseDesign(
  input: unknown,
  migrations: Readonly<Record<number, Migration>> = DESIGN_MIGRATIONS,
  opts: { computable?: boolean } = {},
): ParseResult<Design> {
  const migrated = migrateDesign(input, migrations);
  if (!migrated.ok) return migrated;
  const r = (opts.computable ? computableDesignSchema : designSchema).safeParse(migrated.doc);
  if (!r.success) return { ok: false, error: firstIssue(r.error) };
  return { ok: true, design: r.data };
}
