import 'server-only';
import type { CurrentUser } from '@/lib/auth/session-user';
import { can } from '@/lib/permissions';
import { Design, Enclosure, Variant } from '@/models';
import { isExampleData } from '@/lib/organisations/queries';
import { DESERT_DESIGN_NAME, DESERT_ENCLOSURE_NAME, IMPROVED_VARIANT_NAME } from './designs';

/** The cookie that remembers, per browser, that the first-visit hint was put away. */
export const FIRST_HINT_COOKIE = 'baskwell_hint_done';

/**
 * Where the first-visit hint on the enclosures page points: the demo desert enclosure's example design,
 * when this organisation has it and the person may open it. Null otherwise (a real organisation never
 * sees the hint). Only an organisation of example data is searched for it: the enclosure's name has no
 * index, and a real organisation's enclosures page must not read through all its enclosures for a hint.
 */
export async function firstDesignHint(
  user: CurrentUser,
  organisationId: number,
): Promise<{ designId: number; compare: { a: number; b: number } | null } | null> {
  if (!(await isExampleData(organisationId))) return null;
  // The first made of that name. Read through the organisation's index and picked here: ordered by id in
  // the query, the database may walk the whole table's primary key, every organisation's enclosures.
  const named = await Enclosure.findAll({
    where: { organisationId, name: DESERT_ENCLOSURE_NAME },
    attributes: ['id', 'keeperId'],
  });
  const enclosure = named.reduce<(typeof named)[number] | null>((a, e) => (a && a.id < e.id ? a : e), null);
  if (!enclosure || !can(user, 'read', { kind: 'enclosure', organisationId, keeperId: enclosure.keeperId })) {
    return null;
  }
  const design = await Design.findOne({ where: { enclosureId: enclosure.id, name: DESERT_DESIGN_NAME } });
  if (!design) return null;
  const variants = await Variant.findAll({
    where: { designId: design.id },
    attributes: ['id', 'name'],
    order: [['id', 'ASC']],
  });
  const improved = variants.find((v) => v.name === IMPROVED_VARIANT_NAME);
  const other = variants.find((v) => v !== improved);
  return { designId: design.id, compare: improved && other ? { a: other.id, b: improved.id } : null };
}
