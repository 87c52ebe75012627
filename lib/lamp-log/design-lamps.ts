import 'server-only';
import { readStoredDesign } from '@/lib/variants/stored-design';
import { Design, Variant } from '@/models';

/** The lamp objects in an enclosure's designs, by id, for linking a logged lamp to the lamp it is. */
export async function designLampsOf(enclosureId: number): Promise<{ objectId: string; label: string }[]> {
  const designs = await Design.findAll({ where: { enclosureId }, attributes: ['id', 'name'] });
  if (designs.length === 0) return [];
  const variants = await Variant.findAll({
    where: { designId: designs.map((d) => d.id) },
    attributes: ['id', 'designId', 'name', 'designJson'],
    order: [['id', 'ASC']],
  });
  const names = new Map(designs.map((d) => [d.id, d.name]));
  const found = new Map<string, { name: string; where: string[] }>();
  for (const v of variants) {
    for (const o of readStoredDesign(v.designJson).objects) {
      if (o.type !== 'lamp') continue;
      const entry = found.get(o.id) ?? { name: o.name ?? o.tech, where: [] };
      entry.where.push(`${names.get(v.designId) ?? 'design'} / ${v.name}`);
      found.set(o.id, entry);
    }
  }
  return [...found.entries()].map(([objectId, e]) => ({
    objectId,
    label: `${e.name} (${objectId}) — ${e.where.slice(0, 2).join(', ')}${e.where.length > 2 ? ` +${e.where.length - 2}` : ''}`,
  }));
}
