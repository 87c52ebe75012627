import type { z } from 'zod';

// No imports beyond zod's types: the entity forms run these checks in the browser too.

/** A rule across fields: when `fails` holds, the value is refused with `message` beside `path`. */
export type CrossCheck<T> = { path: (string | number)[]; message: string; fails: (value: T) => boolean };

/**
 * The checks a whole entry must pass besides each field's own, as one `superRefine` function: every
 * rule that fails adds its issue, so a form shows all of them at once, each beside its field.
 */
export function crossChecks<T>(rules: CrossCheck<T>[]) {
  return (value: T, ctx: z.RefinementCtx) => {
    for (const rule of rules)
      if (rule.fails(value)) ctx.addIssue({ code: 'custom', path: rule.path, message: rule.message });
  };
}
