import 'server-only';
import type { CurrentUser } from '@/lib/auth/session-user';
import { can } from '@/lib/permissions';
import { Design, Enclosure, Variant } from '@/models';
import { DESERT_DESIGN_NAME, DESERT_ENCLOSURE_NAME, IMPROVED_VARIANT_NAME } from './designs';

/** The cookie that remembers, per browser, that the first-visit hint was put away. */
export const FIRST_HINT_COOKIE = 'baskwell_hint_done';

/**
 * Where the first-visit hint on the enclosures page points: the demo desert enclosure's example design,
 * when this organisation has it and the person may open it. Null otherwise (a real organisation never
 * sees the hint).
 */
export async function firstDesignHint(
  user: CurrentUser,
  organisationId: number,
): Promise<{ designId: number; compare: { a: number; b: number } | null } | null> {
  const enclosure = await Enclosure.findOne({
    where: { organisationId, name: DESERT_ENCLOSURE_NAME },
    order: [['id', 'ASC']],
  });
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
