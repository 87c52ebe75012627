import type { QueryInterface } from 'sequelize';

/**
 * The starting lamp catalogue no longer states a distance per output class: how far below a lamp each UV
 * zone lies is computed by the engine on the catalogue page. Entries seeded before keep the old wording
 * in their note ("Useful reach about 30 cm: …") and in the source of their output figure ("from the useful
 * reach of the class …, 30 cm"). This rewrites exactly those texts, only in entries made from a preset,
 * and leaves anything else — an edited note, an edited source — as the organisation wrote it.
 *
 * `down` leaves the new wording: the old texts were the app's, not a user's, and stated figures the app
 * no longer stands by.
 */

const OLD_NOTE =
  /^Useful reach about [0-9.]+ cm: the distance below a new, bare lamp at which the UV Index falls to 1 \(the lower bound of the zone 3 mean of Ferguson et al\. 2010\)\. An estimate — verify with a meter\.$/;
const OUTPUT = 'uvbAt30: a typical new lamp of the class (from memory; calibrate with a meter)';
const OLD_SOURCES: [RegExp, string][] = [
  [/uvbAt30 from the useful reach of the class \(common practice, no published source\), [^;]*/g, OUTPUT],
  [
    /uvbAt30 and watts from memory \(reach about 27 cm\); no trade reach figure for the class/g,
    `${OUTPUT}; watts from memory`,
  ],
];

type Row = { id: number; notes: string | null; sources_json: string };

/** The source texts with the old wording replaced; the same object when nothing matched. */
export function rewriteSources(sources: Record<string, string>): Record<string, string> {
  let changed = false;
  const out: Record<string, string> = {};
  for (const [k, v] of Object.entries(sources)) {
    let next = v;
    if (typeof v === 'string') for (const [re, to] of OLD_SOURCES) next = next.replace(re, to);
    if (next !== v) changed = true;
    out[k] = next;
  }
  return changed ? out : sources;
}

export async function up({ context: qi }: { context: QueryInterface }) {
  const [rows] = (await qi.sequelize.query(
    'SELECT id, notes, sources_json FROM lamp_types WHERE preset_key IS NOT NULL',
  )) as [Row[], unknown];
  for (const row of rows) {
    const notes = row.notes !== null && OLD_NOTE.test(row.notes) ? null : row.notes;
    let sourcesJson = row.sources_json;
    try {
      const parsed = JSON.parse(row.sources_json) as Record<string, string>;
      const next = rewriteSources(parsed);
      if (next !== parsed) sourcesJson = JSON.stringify(next);
    } catch {
      // A source text that is not JSON is left as it is.
    }
    if (notes === row.notes && sourcesJson === row.sources_json) continue;
    await qi.sequelize.query('UPDATE lamp_types SET notes = ?, sources_json = ? WHERE id = ?', {
      replacements: [notes, sourcesJson, row.id],
    });
  }
}

export async function down() {
  // The new wording stays (see above).
}
