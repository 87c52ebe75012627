// The scale benchmark's outlooks in bulk: what `refreshOutlooks` stores, computed once per distinct lamp.
//
// A lamp's outlook is a pure function of its facts (type, first day, hours a day, basking distance,
// retirement), its readings, its enclosure's species sheet and the day. The generated organisation
// (scale-org.ts) draws its UV lamps from a bounded set of histories, so tens of thousands of lamps share
// a few hundred distinct inputs: each distinct input goes through the app's own `lampOutlook` once, and
// the lamps that share it get the same outlook with their own reading ids (the only lamp-specific thing
// an outlook holds). The rows are written by the app's own writer. tests/scale-org.test.ts checks that
// every seeded row equals a fresh recompute.
import { Op } from 'sequelize';
import { lampOutlook, type Outlook } from '@/lib/lamp-log/outlook';
import { lampFacts, readingFacts } from '@/lib/lamp-log/facts';
import { loadFor, speciesForEnclosures, writeOutlooks, type Computed } from '@/lib/lamp-log/stored-outlooks';
import { Lamp } from '@/models';

/** Lamps loaded, computed and written per round: a few thousand readings in memory at a time. */
const BATCH = 500;

/** Replaces reading ids (at any depth, under the key `id`) by their counterparts in `ids`. */
function withReadingIds<T>(value: T, ids: Map<number, number>): T {
  if (Array.isArray(value)) return value.map((v) => withReadingIds(v, ids) as unknown) as T;
  if (value && typeof value === 'object' && !(value instanceof Date)) {
    return Object.fromEntries(
      Object.entries(value).map(([k, v]) => [
        k,
        k === 'id' && typeof v === 'number' && ids.has(v) ? ids.get(v) : withReadingIds(v, ids),
      ]),
    ) as T;
  }
  return value;
}

/**
 * Computes and stores the outlooks of these lamps for `today`, one `lampOutlook` per distinct input.
 * Returns how many were stored and how many distinct computations it took.
 */
export async function seedOutlooks(
  lampIds: readonly number[],
  today: string,
): Promise<{ stored: number; computed: number }> {
  const memo = new Map<string, { outlook: Outlook; readingIds: number[] }>();
  let stored = 0;
  for (let i = 0; i < lampIds.length; i += BATCH) {
    const lamps = await Lamp.findAll({
      where: { id: { [Op.in]: lampIds.slice(i, i + BATCH) } },
      order: [['id', 'ASC']],
    });
    const loaded = await loadFor(lamps);
    const species = await speciesForEnclosures([
      ...new Map(loaded.map((l) => [l.enclosure.id, l.enclosure])).values(),
    ]);
    const computed: Computed[] = loaded.map((l) => {
      const match = species.get(l.enclosure.id)!;
      const { id: _id, label: _label, ...facts } = lampFacts(l.lamp, l.type);
      const readings = l.readings.map(readingFacts);
      const key = JSON.stringify([
        facts,
        readings.map(({ id: _r, ...r }) => r),
        match.ok ? [match.sheetId, match.need] : match.missing,
      ]);
      const readingIds = readings.map((r) => r.id!);
      let hit = memo.get(key);
      if (!hit) {
        hit = { outlook: lampOutlook(lampFacts(l.lamp, l.type), readings, match.need, today), readingIds };
        memo.set(key, hit);
      }
      const outlook =
        hit.readingIds === readingIds
          ? hit.outlook
          : withReadingIds(hit.outlook, new Map(hit.readingIds.map((id, k) => [id, readingIds[k]!])));
      return { ...l, species: match, outlook };
    });
    await writeOutlooks(computed, today);
    stored += computed.length;
  }
  return { stored, computed: memo.size };
}
