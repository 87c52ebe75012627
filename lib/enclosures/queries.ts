import 'server-only';
import { z } from 'zod';
import type { EnclosureWithKeeper } from '@/lib/access';
import { notFound } from '@/lib/errors';
import {
  defaultDescending,
  ENCLOSURE_SORT_COLUMNS,
  MAX_ENCLOSURE_SEARCH,
  type EnclosureSortColumn,
} from '@/lib/enclosures/list-view';
import { likeContains } from '@/lib/api/like';
import { sortedListFields, withSort } from '@/lib/api/pagination';
import { idSchema } from '@/lib/api/schemas';
import { selectRows } from '@/lib/db';
import { Enclosure, User } from '@/models';

/**
 * `GET /api/enclosures` query: search, sort and page of one organisation's enclosures.
 *
 * Paging is offset/limit with a total count rather than the id cursor other lists use: this list
 * sorts by any of five columns (text, sizes, dates, the keeper's name on a joined table), and the
 * table shows "page 3 of 8" with a link that reproduces that page. A keyset cursor would have to
 * encode every sort key (with NULL handling and the join) and cannot jump to a page number; an
 * organisation holds hundreds to a few thousand enclosures, where OFFSET over the
 * (organisation_id, keeper_id) index costs little. The order always ends in name then id, so pages
 * never overlap or skip while nothing changes.
 */
export const enclosureListQuery = z
  .object({
    organisationId: idSchema('The organisation id'),
    keeperId: idSchema('The keeper').optional(),
    ...sortedListFields(ENCLOSURE_SORT_COLUMNS, MAX_ENCLOSURE_SEARCH),
  })
  .transform(withSort('updated', defaultDescending));

export type EnclosureListQuery = z.output<typeof enclosureListQuery>;

// Raw SQL only from these constants, never from input; values go in as replacements.
/** What the Animal column shows: the animal's name, then the species. */
const ANIMAL_LABEL = `CONCAT_WS(' ', NULLIF(e.animal_name, ''), NULLIF(e.species_name, ''))`;

/**
 * ORDER BY for a column. Empty text (no animal, a keeper who left) sorts last in both directions:
 * a list of blanks first is of no use to anyone. Ties fall to name, then id, so the order is total.
 */
function enclosureOrder(column: EnclosureSortColumn, descending: boolean): string {
  const d = descending ? 'DESC' : 'ASC';
  // Names with numbers read as people number things: "Tub 5" before "Tub 10". `name_key` is the name with
  // its numbers zero-padded (a virtual column of the table), so the name and update orders read an index.
  const byColumn: Record<EnclosureSortColumn, string[]> = {
    name: [`e.name_key ${d}`],
    animal: [`${ANIMAL_LABEL} = '' ASC`, `${ANIMAL_LABEL} ${d}`],
    keeper: [`COALESCE(k.name, '') = '' ASC`, `k.name ${d}`],
    // Floor area decides which enclosure is bigger; height breaks ties.
    size: [`e.width_cm * e.depth_cm ${d}`, `e.height_cm ${d}`],
    updated: [`e.updated_at ${d}`],
  };
  // Written once, not again as a tie-break: a repeated key would keep the name order off its index.
  return [...byColumn[column], ...(column === 'name' ? [] : ['e.name_key ASC']), 'e.id ASC'].join(', ');
}

/**
 * Every word of the search must appear (anywhere, any order) in the enclosure's name, the animal's
 * name, the species, or the keeper's name or e-mail. The database collation ignores case and accents.
 */
function enclosureSearch(q: string | undefined) {
  const words = (q ?? '').split(/\s+/).filter(Boolean);
  return {
    sql: words.map(
      (_, i) =>
        ` AND (e.name LIKE :w${i} OR e.animal_name LIKE :w${i} OR e.species_name LIKE :w${i}` +
        ` OR k.name LIKE :w${i} OR k.email LIKE :w${i})`,
    ),
    replacements: Object.fromEntries(words.map((word, i) => [`w${i}`, likeContains(word)])),
  };
}

/**
 * One page of an organisation's enclosures. The caller has already decided, with `can()`, whose
 * enclosures this user may see and passes `keeperId` for a keeper: this only fetches.
 *
 * A page is one plain query of the columns its table shows (no notes: they can be long, and the list
 * never shows them; no model instances), and its total counts the organisation's (or keeper's) rows
 * from an index without the keeper join unless a search needs the keeper's name.
 */
export async function listEnclosures(query: Omit<EnclosureListQuery, 'keeperId'> & { keeperId?: number }) {
  const { organisationId, keeperId, q, sort, descending, offset, limit } = query;
  const search = enclosureSearch(q);
  const where = `e.organisation_id = :organisationId${keeperId ? ' AND e.keeper_id = :keeperId' : ''}${search.sql.join('')}`;
  const keeper = 'LEFT JOIN users k ON k.id = e.keeper_id';
  const replacements = {
    organisationId,
    offset,
    limit,
    ...(keeperId ? { keeperId } : {}),
    ...search.replacements,
  };
  const [rows, [counted]] = await Promise.all([
    selectRows<EnclosureRowJson>(
      `SELECT e.id, e.keeper_id AS keeperId, k.name AS keeperName, e.name, e.width_cm AS widthCm,
              e.height_cm AS heightCm, e.depth_cm AS depthCm, e.species_name AS speciesName,
              e.animal_name AS animalName, DATE_FORMAT(e.updated_at, '%Y-%m-%dT%H:%i:%s.000Z') AS updatedAt
         FROM enclosures e ${keeper} WHERE ${where}
        ORDER BY ${enclosureOrder(sort, descending)} LIMIT :limit OFFSET :offset`,
      replacements,
    ),
    selectRows<{ n: number | string }>(
      `SELECT COUNT(*) AS n FROM enclosures e ${search.sql.length ? keeper : ''} WHERE ${where}`,
      replacements,
    ),
  ]);
  return { items: rows, total: Number(counted?.n ?? 0), offset, limit };
}

export type EnclosureListPage = Awaited<ReturnType<typeof listEnclosures>>;

/** A row of the enclosures list: what the table shows, not the whole enclosure. */
export function enclosureRowJson(e: Enclosure & { keeper?: User | null }) {
  return {
    id: e.id,
    keeperId: e.keeperId,
    keeperName: e.keeper?.name ?? null,
    name: e.name,
    widthCm: e.widthCm,
    heightCm: e.heightCm,
    depthCm: e.depthCm,
    speciesName: e.speciesName ?? null,
    animalName: e.animalName ?? null,
    updatedAt: e.updatedAt.toISOString(),
  };
}

export type EnclosureRowJson = ReturnType<typeof enclosureRowJson>;

/** The whole enclosure: its list row plus what only its own page and the API show. */
export function enclosureJson(e: Enclosure & { keeper?: User | null }) {
  return {
    ...enclosureRowJson(e),
    organisationId: e.organisationId,
    notes: e.notes ?? null,
    createdAt: e.createdAt.toISOString(),
  };
}

export type EnclosureJson = ReturnType<typeof enclosureJson>;

export async function enclosureCounts(
  organisationId: number,
  keeperIds: number[],
): Promise<Map<number, number>> {
  if (keeperIds.length === 0) return new Map();
  const rows = await selectRows<{ keeperId: number; n: number | string }>(
    `SELECT e.keeper_id AS keeperId, COUNT(*) AS n FROM enclosures e
      WHERE e.organisation_id = :organisationId AND e.keeper_id IN (:keeperIds) GROUP BY e.keeper_id`,
    { organisationId, keeperIds },
  );
  return new Map(rows.map((r) => [r.keeperId, Number(r.n)]));
}

export type { EnclosureWithKeeper };

/** An enclosure with its keeper's name; 404 when there is none (access is the caller's check). */
export async function enclosureWithKeeper(id: number): Promise<EnclosureWithKeeper> {
  const enclosure = await Enclosure.findByPk(id, {
    include: [{ model: User, as: 'keeper', attributes: ['id', 'name'] }],
  });
  if (!enclosure) throw notFound('That enclosure');
  return enclosure;
}
