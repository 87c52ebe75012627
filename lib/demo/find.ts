import 'server-only';
import type { Transaction } from 'sequelize';
import { Enclosure, Organisation } from '@/models';

/**
 * A demo enclosure found again as the seed finds what it made: by its organisation's name and its own
 * (the first of that name), with its organisation. Null when a person renamed or deleted either, so the
 * seed then leaves it alone.
 */
export async function findDemoEnclosure(
  organisationName: string,
  enclosureName: string,
  transaction: Transaction,
): Promise<{ organisation: Organisation; enclosure: Enclosure } | null> {
  const organisation = await Organisation.findOne({ where: { name: organisationName }, transaction });
  if (!organisation) return null;
  const enclosure = await Enclosure.findOne({
    where: { organisationId: organisation.id, name: enclosureName },
    order: [['id', 'ASC']],
    transaction,
  });
  return enclosure && { organisation, enclosure };
}
