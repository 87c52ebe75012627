import 'server-only';
import type { CurrentUser } from '@/lib/auth/session-user';
import { selectRows } from '@/lib/db';
import { can } from '@/lib/permissions';
import { DESERT_DESIGN_NAME, DESERT_ENCLOSURE_NAME, IMPROVED_VARIANT_NAME } from './designs';

/** The cookie that remembers, per browser, that the first-visit hint was put away. */
export const FIRST_HINT_COOKIE = 'baskwell_hint_done';

type HintRow = {
  enclosureId: number;
  keeperId: number;
  designId: number | null;
  variantId: number | null;
  variantName: string | null;
};

const lowest = <T>(values: T[], id: (v: T) => number) =>
  values.reduce<T | null>((a, v) => (a !== null && id(a) < id(v) ? a : v), null);

/**
 * Where the first-visit hint on the enclosures page points: the demo desert enclosure's example design,
 * when this organisation has it and the person may open it. Null otherwise (a real organisation never
 * sees the hint). Every visit until the hint is put away asks for it, so it is one plain query rather
 * than a model lookup for each step: a real organisation fails on its own row (not example data) before
 * any enclosure is read, and an example organisation's enclosures are read through its index, the name
 * compared there (it has no index of its own). Nothing is ordered in the query: ordered by id, the
 * database may walk the whole table's primary key, every organisation's enclosures; the first enclosure
 * of that name, its first design of the example's name and its variants in order are picked here.
 */
export async function firstDesignHint(
  user: CurrentUser,
  organisationId: number,
): Promise<{ designId: number; compare: { a: number; b: number } | null } | null> {
  const rows = await selectRows<HintRow>(
    `SELECT e.id AS enclosureId, e.keeper_id AS keeperId, d.id AS designId, v.id AS variantId,
            v.name AS variantName
       FROM organisations o
       JOIN enclosures e ON e.organisation_id = o.id AND e.name = :enclosureName
       LEFT JOIN designs d ON d.enclosure_id = e.id AND d.name = :designName
       LEFT JOIN variants v ON v.design_id = d.id
      WHERE o.id = :organisationId AND o.example_data = 1`,
    { organisationId, enclosureName: DESERT_ENCLOSURE_NAME, designName: DESERT_DESIGN_NAME },
  );
  const enclosure = lowest(rows, (r) => r.enclosureId);
  if (!enclosure || !can(user, 'read', { kind: 'enclosure', organisationId, keeperId: enclosure.keeperId })) {
    return null;
  }
  const designs = rows.filter((r) => r.enclosureId === enclosure.enclosureId && r.designId !== null);
  const design = lowest(designs, (r) => r.designId as number);
  if (!design) return null;
  const variants = designs
    .filter((r) => r.designId === design.designId && r.variantId !== null)
    .sort((a, b) => (a.variantId as number) - (b.variantId as number));
  const improved = variants.find((v) => v.variantName === IMPROVED_VARIANT_NAME);
  const other = variants.find((v) => v !== improved);
  return {
    designId: design.designId as number,
    compare: improved && other ? { a: other.variantId as number, b: improved.variantId as number } : null,
  };
}
