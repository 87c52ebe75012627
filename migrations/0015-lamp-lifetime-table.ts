import type { QueryInterface } from 'sequelize';

/**
 * One lamp lifetime table (the engine's simulation/model/lifetime.ts) now gives every UV technology's
 * half-life and usual replacement interval; the catalogue entries an organisation was seeded with carried
 * older figures that disagreed with it (a T8 tube halving in 12 months but replaced at 6, a mercury vapour
 * lamp halving in 13). This brings along the seeded entries still exactly as seeded (same preset, same
 * half-life and replacement interval), with their source notes; an entry someone edited is left alone.
 * Every lamp's outlook is marked out of date, so the lamp log and reminders recompute with the new figures.
 * The values are written out here, not imported: a migration must do the same thing whenever it runs.
 */
// Notes the seeded UV tubes and bulbs carried before: a general one on decay, and one on replacement.
const OLD_DECAY_NOTE =
  'decay: UVB output falls to about half within months — compact lamps at 6–8 months, linear tubes about 12, mercury vapour 12–14, metal halide 24 or more (common practice, no published source)';
const OLD_REPLACE_SOURCE =
  'typical replacement interval: common practice, no published source — meter readings in the lamp log decide better';

type Figures = { half: number; replace: number | null; halfSource: string; replaceSource: string };
type Change = { key: string; from: Figures; to: Figures };

// The four T5 tube strengths were seeded with the same figures and notes, and move to the same ones.
const T5: Omit<Change, 'key'> = {
  from: {
    half: 12,
    replace: 12,
    halfSource: `T5 fluorescent tube defaults: ${OLD_DECAY_NOTE}`,
    replaceSource: OLD_REPLACE_SOURCE,
  },
  to: {
    half: 12,
    replace: 12,
    halfSource:
      'T5 fluorescent tube: half-life 12 months of ordinary use (from memory); T5 UVB tubes are usually replaced after about a year, by which time their UVB is about half of new.',
    replaceSource:
      'T5 fluorescent tube: typical replacement interval 12 months (common practice, no published source) — meter readings in the lamp log decide better',
  },
};
const CHANGES: Change[] = [
  { key: 't5-low', ...T5 },
  { key: 't5-medium', ...T5 },
  { key: 't5-high', ...T5 },
  { key: 't5-very-high', ...T5 },
  {
    key: 't8-medium',
    from: {
      half: 12,
      replace: 6,
      halfSource: `T8 fluorescent tube defaults: ${OLD_DECAY_NOTE}`,
      replaceSource: OLD_REPLACE_SOURCE,
    },
    to: {
      half: 6,
      replace: 6,
      halfSource:
        'T8 fluorescent tube: half-life 6 months of ordinary use (from memory); T8 UVB tubes fade faster than T5 and are usually replaced every 6 months.',
      replaceSource:
        'T8 fluorescent tube: typical replacement interval 6 months (common practice, no published source) — meter readings in the lamp log decide better',
    },
  },
  {
    key: 'compact',
    from: {
      half: 7,
      replace: 6,
      halfSource: `Compact fluorescent UVB lamp defaults: half-life 7 months: compact lamps fail at 6–8 months ${OLD_DECAY_NOTE}`,
      replaceSource: OLD_REPLACE_SOURCE,
    },
    to: {
      half: 6,
      replace: 6,
      halfSource:
        'Compact fluorescent UVB lamp: half-life 6 months of ordinary use (from memory); Compact UVB lamps often lose half their UVB within 6–8 months; the shorter end is taken.',
      replaceSource:
        'Compact fluorescent UVB lamp: typical replacement interval 6 months (common practice, no published source) — meter readings in the lamp log decide better',
    },
  },
  {
    key: 'mercury-vapour-160',
    from: {
      half: 13,
      replace: 12,
      halfSource: `Self-ballasted mercury vapour lamp defaults: half-life 13 months: ${OLD_DECAY_NOTE}`,
      replaceSource: OLD_REPLACE_SOURCE,
    },
    to: {
      half: 6,
      replace: 6,
      halfSource:
        'Self-ballasted mercury vapour lamp: half-life 6 months of ordinary use (from memory); Self-ballasted mercury vapour lamps vary widely from lamp to lamp and many lose much of their UVB within months; the trade says replace every 6–12 months, so the shorter end is taken, and they are measured more often than tubes.',
      replaceSource:
        'Self-ballasted mercury vapour lamp: typical replacement interval 6 months (common practice, no published source) — meter readings in the lamp log decide better',
    },
  },
  {
    key: 'metal-halide-70',
    from: {
      half: 24,
      replace: 12,
      halfSource: `Metal halide UVB lamp defaults: half-life 24 months: ${OLD_DECAY_NOTE}`,
      replaceSource: OLD_REPLACE_SOURCE,
    },
    to: {
      half: 12,
      replace: 12,
      halfSource:
        'Metal halide UVB lamp: half-life 12 months of ordinary use (from memory); Metal halide UVB lamps are usually replaced after about a year.',
      replaceSource:
        'Metal halide UVB lamp: typical replacement interval 12 months (common practice, no published source) — meter readings in the lamp log decide better',
    },
  },
  {
    key: 'led-uvb',
    from: {
      half: 24,
      replace: null,
      halfSource:
        'UVB LED panel defaults: all values from memory; LED UVB sources are new and vary widely — calibrate with a meter',
      replaceSource:
        'no established replacement interval for UVB LEDs (common practice, no published source) — follow meter readings',
    },
    to: {
      half: 24,
      replace: null,
      halfSource:
        'UVB LED panel: half-life 24 months of ordinary use (from memory); UVB LEDs are new and vary widely: there is no established replacement interval, so meter readings decide when to replace one.',
      replaceSource:
        'UVB LED panel: no established replacement interval (common practice, no published source) — follow meter readings',
    },
  },
];

async function move(qi: QueryInterface, direction: 'up' | 'down') {
  for (const c of CHANGES) {
    const [from, to] = direction === 'up' ? [c.from, c.to] : [c.to, c.from];
    await qi.sequelize.query(
      `UPDATE lamp_types
          SET half_life_months = :toHalf, replace_after_months = :toReplace,
              sources_json = JSON_SET(sources_json, '$.halfLifeMonths', :halfSource,
                                      '$.replaceAfterMonths', :replaceSource)
        WHERE preset_key = :key AND decay_json IS NULL AND half_life_months = :fromHalf
          AND replace_after_months <=> :fromReplace`,
      {
        replacements: {
          key: c.key,
          toHalf: to.half,
          toReplace: to.replace,
          fromHalf: from.half,
          fromReplace: from.replace,
          halfSource: to.halfSource,
          replaceSource: to.replaceSource,
        },
      },
    );
  }
  await qi.sequelize.query('UPDATE lamps SET outlook_version = outlook_version + 1');
}

export async function up({ context: qi }: { context: QueryInterface }) {
  await move(qi, 'up');
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await move(qi, 'down');
}
