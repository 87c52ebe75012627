import 'server-only';
import { Op, type WhereOptions } from 'sequelize';
import type { CurrentUser } from '@/lib/auth/session-user';
import { Design, Enclosure, Variant } from '@/models';

export type VariantOption = {
  id: number;
  name: string;
  designId: number;
  designName: string;
  enclosureId: number;
  enclosureName: string;
};

/** The most variants a picker lists; beyond it, the user narrows with the enclosure page. */
export const MAX_OPTIONS = 500;

/**
 * Every variant this user may read, for pickers: all of an organisation's enclosures for its owners
 * and staff, only their own enclosures for keepers — the same rule as `can`, written as a query.
 */
export async function visibleVariants(user: CurrentUser): Promise<VariantOption[]> {
  const wide = user.memberships.filter((m) => m.role !== 'keeper').map((m) => m.organisationId);
  const own = user.memberships.filter((m) => m.role === 'keeper').map((m) => m.organisationId);
  const scopes: WhereOptions[] = [];
  if (wide.length) scopes.push({ organisationId: wide });
  if (own.length) scopes.push({ organisationId: own, keeperId: user.id });
  if (scopes.length === 0) return [];
  const rows = (await Variant.findAll({
    attributes: ['id', 'name', 'designId'],
    include: [
      {
        model: Design,
        as: 'design',
        required: true,
        attributes: ['id', 'name', 'enclosureId'],
        include: [
          {
            model: Enclosure,
            as: 'enclosure',
            required: true,
            attributes: ['id', 'name'],
            where: { [Op.or]: scopes },
          },
        ],
      },
    ],
    order: [
      [{ model: Design, as: 'design' }, { model: Enclosure, as: 'enclosure' }, 'name', 'ASC'],
      [{ model: Design, as: 'design' }, 'name', 'ASC'],
      ['id', 'ASC'],
    ],
    limit: MAX_OPTIONS,
  })) as (Variant & { design: Design & { enclosure: Enclosure } })[];
  return rows.map((v) => ({
    id: v.id,
    name: v.name,
    designId: v.design.id,
    designName: v.design.name,
    enclosureId: v.design.enclosure.id,
    enclosureName: v.design.enclosure.name,
  }));
}
