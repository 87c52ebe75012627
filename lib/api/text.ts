import { z } from 'zod';

// No imports beyond zod: the species and lamp-type forms use these schemas in the browser too.

/**
 * A lone UTF-16 surrogate (half of an emoji, say, cut by a bad copy or a script) cannot be written as
 * UTF-8: the database would store U+FFFD in its place without a word. Refuse it instead, naming the field.
 */
export const BROKEN_CHARACTER_MESSAGE =
  'Contains a broken character (half of an emoji or symbol, an unpaired UTF-16 surrogate). Retype it or paste it again.';

const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

export const isWellFormedText = (s: string): boolean => !LONE_SURROGATE.test(s);

/**
 * Every free-text input goes through this instead of `z.string()`: the same string schema (chain
 * `.trim()`, `.min()`, `.max()` as usual), refusing unpaired surrogates. `error` is the message for a
 * value that is not text at all.
 */
export const textSchema = (error?: string) =>
  z.string(error ? { error } : undefined).refine(isWellFormedText, { message: BROKEN_CHARACTER_MESSAGE });
