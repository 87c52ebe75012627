import type { QueryInterface } from 'sequelize';

/**
 * The starting species sheets' broadband UVB hints (µW/cm²) are now derived from each sheet's UV zone
 * (lib/species/starting-sheets.ts), so the two no longer contradict each other. Sheets an organisation
 * got before keep the old figures; this brings along only those still exactly as seeded (same seed key,
 * same figures), so a sheet someone corrected by hand is left alone. The values are written out here, not
 * imported: a migration must do the same thing whenever it runs.
 */
const CHANGES = [
  { keys: ['pogona-vitticeps', 'uromastyx-ornata'], from: [25, 50], to: [115, 235] },
  { keys: ['correlophus-ciliatus'], from: [12, 25], to: [15, 35] },
] as const;

const OLD_CITATION = 'Common practice, no published source: keepers’ rule of thumb for broadband UVB meters';
const NEW_CITATION =
  'Derived from the UV zone (Ferguson et al. 2010, Zoo Biology 29:317–334) at 0.04 UV Index per µW/cm², a typical fluorescent ratio (from memory); using a broadband meter is common practice, no published source';

async function move(qi: QueryInterface, direction: 'up' | 'down') {
  for (const c of CHANGES) {
    const [from, to] = direction === 'up' ? [c.from, c.to] : [c.to, c.from];
    const [oldText, newText] =
      direction === 'up' ? [OLD_CITATION, NEW_CITATION] : [NEW_CITATION, OLD_CITATION];
    await qi.sequelize.query(
      `UPDATE species_sheets
          SET uvb_target_min_uw = :toMin, uvb_target_max_uw = :toMax,
              sources_json = REPLACE(sources_json, :oldText, :newText)
        WHERE seed_key IN (:keys) AND uvb_target_min_uw = :fromMin AND uvb_target_max_uw = :fromMax`,
      {
        replacements: {
          keys: [...c.keys],
          fromMin: from[0],
          fromMax: from[1],
          toMin: to[0],
          toMax: to[1],
          oldText,
          newText,
        },
      },
    );
  }
}

export async function up({ context: qi }: { context: QueryInterface }) {
  await move(qi, 'up');
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await move(qi, 'down');
}
