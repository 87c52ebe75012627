import 'server-only';
import { Op, type WhereOptions } from 'sequelize';
import { z } from 'zod';
import { SORT_DIRECTIONS, type SortDirection } from '@/lib/list-view';
import { textSchema } from './schemas';

/** `?cursor=&limit=`: the cursor is the id of the last item of the previous page (lists are in id order). */
export const pageQuery = {
  cursor: z.coerce.number({ error: 'The cursor must be a number.' }).int().positive().optional(),
  limit: z.coerce
    .number({ error: 'The limit must be a number.' })
    .int()
    .min(1, 'The limit must be at least 1.')
    .max(100, 'The limit can be at most 100.')
    .default(50),
};

/** `?offset=`: where a page of an offset-paged list (a table with page numbers and a total) starts. */
export const offsetQuery = z.coerce
  .number({ error: 'The offset must be a number.' })
  .int('The offset must be a whole number.')
  .min(0, 'The offset cannot be negative.')
  .max(1_000_000, 'The offset can be at most 1000000.')
  .default(0);

export function afterCursor(cursor: number | undefined): WhereOptions {
  return cursor ? { id: { [Op.gt]: cursor } } : {};
}

/** Fetch `limit + 1` rows and pass them here: the extra row only tells whether another page exists. */
export function page<T extends { id: number }, R>(rows: T[], limit: number, map: (row: T) => R) {
  const items = rows.slice(0, limit);
  const last = items[items.length - 1];
  return { items: items.map(map), nextCursor: rows.length > limit && last ? String(last.id) : null };
}

/**
 * `?q=&sort=&dir=&offset=&limit=` of an offset-paged list that is searched and sorted on the server (a
 * table with page numbers and a total). `withSort` then settles the column and its direction.
 */
export const sortedListFields = <C extends string>(columns: readonly [C, ...C[]], maxSearch: number) => ({
  q: textSchema('The search must be text.')
    .trim()
    .max(maxSearch, `Keep the search to ${maxSearch} characters.`)
    .optional(),
  sort: z.enum(columns, { error: `Sort by one of: ${columns.join(', ')}.` }).optional(),
  dir: z.enum(SORT_DIRECTIONS, { error: 'The direction must be asc or desc.' }).optional(),
  offset: offsetQuery,
  limit: pageQuery.limit,
});

/** The sort's column (or the list's default) and its direction (or the column's natural one). */
export const withSort =
  <C extends string>(fallback: NoInfer<C>, defaultDescending: (column: C) => boolean) =>
  <R extends { sort?: C; dir?: SortDirection }>({ sort, dir, ...rest }: R) => {
    const column = sort ?? fallback;
    return { ...rest, sort: column, descending: dir ? dir === 'desc' : defaultDescending(column) };
  };
