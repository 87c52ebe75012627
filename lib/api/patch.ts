import { z } from 'zod';

// No imports beyond zod: the entity forms use the schemas built with it in the browser too.

type WithoutDefault<T> = T extends z.ZodDefault<infer Inner> ? Inner : T;
type Undefaulted<S extends z.ZodRawShape> = { [K in keyof S]: WithoutDefault<S[K]> };

/**
 * A PATCH body built from the fields a create body has: any non-empty subset, each field with its own
 * rule and message. Defaults are dropped, because a field left out of a PATCH stays as it is rather than
 * going back to its default.
 */
export function patchOf<S extends z.ZodRawShape>(fields: S) {
  const shape = Object.fromEntries(
    Object.entries(fields).map(([key, field]) => [
      key,
      field instanceof z.ZodDefault ? field.unwrap() : field,
    ]),
  ) as Undefaulted<S>;
  return z
    .strictObject(shape)
    .partial()
    .refine((p) => Object.keys(p).length > 0, 'Send at least one field to change.');
}
