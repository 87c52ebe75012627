import { QueryTypes, type QueryInterface } from 'sequelize';

/**
 * The starting species sheets now give the adult length (which sizes the shared basking spot) and whether
 * the animal climbs glass and mesh, each with its "from memory" source, and the UV-zone source points to
 * the published species-by-species zone assignments while saying this sheet's zone was not checked
 * against them. Organisations seeded before get the same on the sheets they never edited (no one has
 * saved them: `updated_by_id` is still empty, and no length is set); a sheet someone edited keeps
 * everything as they left it. The values are written out here, not imported: a migration must do the
 * same thing whenever it runs.
 */

type Fill = { length: number; climbs: boolean; lengthNote: string; climbNote: string };

const FILLS: Record<string, Fill> = {
  'pogona-vitticeps': {
    length: 50,
    climbs: false,
    lengthNote: 'total length about 40–60 cm, nose to tail tip',
    climbNote: 'climbs rocks and branches, but does not hang from a mesh lid or climb glass',
  },
  'eublepharis-macularius': {
    length: 22,
    climbs: false,
    lengthNote: 'total length about 20–25 cm',
    climbNote: 'has no adhesive toe pads: it cannot climb glass or hang from a mesh lid',
  },
  'correlophus-ciliatus': {
    length: 20,
    climbs: true,
    lengthNote: 'total length about 18–22 cm, tail included',
    climbNote: 'adhesive toe pads: it climbs glass and hangs from mesh',
  },
  'chamaeleo-calyptratus': {
    length: 50,
    climbs: true,
    lengthNote: 'total length about 45–60 cm for males (females about 25–35 cm)',
    climbNote: 'arboreal: it climbs branches and mesh and hangs under the lid',
  },
  'pantherophis-guttatus': {
    length: 140,
    climbs: true,
    lengthNote: 'total length about 120–150 cm',
    climbNote: 'a good climber of branches that lies along and pushes against the lid',
  },
  'python-regius': {
    length: 120,
    climbs: false,
    lengthNote: 'total length about 100–150 cm (females larger)',
    climbNote: 'a heavy-bodied ground dweller that climbs little (young animals climb more)',
  },
  'iguana-iguana': {
    length: 150,
    climbs: true,
    lengthNote: 'total length about 120–180 cm, more than half of it tail',
    climbNote: 'arboreal: it climbs branches and mesh',
  },
  'tiliqua-scincoides': {
    length: 50,
    climbs: false,
    lengthNote: 'total length about 45–60 cm',
    climbNote: 'a short-legged ground dweller',
  },
  'uromastyx-ornata': {
    length: 35,
    climbs: false,
    lengthNote: 'total length about 30–38 cm',
    climbNote: 'climbs rocks, not glass or mesh',
  },
  'trachemys-scripta-elegans': {
    length: 25,
    climbs: false,
    lengthNote: 'shell (carapace) length about 20–28 cm, females larger; the sheet gives the shell length',
    climbNote: 'does not climb walls or mesh',
  },
  'testudo-hermanni': {
    length: 18,
    climbs: false,
    lengthNote: 'shell (carapace) length about 15–20 cm; the sheet gives the shell length',
    climbNote: 'does not climb walls or mesh',
  },
  'litoria-caerulea': {
    length: 10,
    climbs: true,
    lengthNote: 'snout–vent length about 7–11 cm (a frog has no tail)',
    climbNote: 'adhesive toe pads: it climbs glass and hangs from mesh',
  },
};

const OLD_ZONE_CONFIDENCE =
  'from memory; the zone definitions are published, this species’ zone was not checked — verify';
const NEW_ZONE_CONFIDENCE =
  'from memory; the zone definitions are published, and so are species-by-species zone assignments (Baines et al. 2016, J. Zoo Aquar. Res. 4(1):42–63), but this species’ zone was not checked against them — verify';
const SIZE_CONFIDENCE =
  'from memory; no source was checked, and adults vary with sex and line — measure your own animal and correct the sheet';

type Source = { citation: string; confidence: string; covers: string[] };

export const sizeSource = (f: Fill): Source => ({
  citation: `From memory: adult ${f.lengthNote}; ${f.climbNote}`,
  confidence: SIZE_CONFIDENCE,
  covers: ['adultLengthCm', 'climbs'],
});

type Row = { id: number; seed_key: string; sources_json: string };

function parse(json: string): Source[] | null {
  try {
    const v: unknown = JSON.parse(json);
    return Array.isArray(v) ? (v as Source[]) : null;
  } catch {
    return null;
  }
}

export async function up({ context: qi }: { context: QueryInterface }) {
  const rows = await qi.sequelize.query<Row>(
    `SELECT id, seed_key, sources_json FROM species_sheets
      WHERE seed_key IN (:keys) AND updated_by_id IS NULL AND adult_length_cm IS NULL AND climbs = 0`,
    { replacements: { keys: Object.keys(FILLS) }, type: QueryTypes.SELECT },
  );
  for (const row of rows) {
    const fill = FILLS[row.seed_key]!;
    const sources = parse(row.sources_json);
    if (!sources) continue;
    const next = [
      ...sources.map((s) =>
        s.confidence === OLD_ZONE_CONFIDENCE ? { ...s, confidence: NEW_ZONE_CONFIDENCE } : s,
      ),
      sizeSource(fill),
    ];
    await qi.sequelize.query(
      `UPDATE species_sheets SET adult_length_cm = :length, climbs = :climbs, sources_json = :json
        WHERE id = :id AND updated_by_id IS NULL`,
      {
        replacements: {
          id: row.id,
          length: fill.length,
          climbs: fill.climbs,
          json: JSON.stringify(next),
        },
      },
    );
  }
}

export async function down({ context: qi }: { context: QueryInterface }) {
  const rows = await qi.sequelize.query<Row>(
    `SELECT id, seed_key, sources_json FROM species_sheets
      WHERE seed_key IN (:keys) AND updated_by_id IS NULL AND adult_length_cm IS NOT NULL`,
    { replacements: { keys: Object.keys(FILLS) }, type: QueryTypes.SELECT },
  );
  for (const row of rows) {
    const sources = parse(row.sources_json);
    if (!sources) continue;
    const added = sizeSource(FILLS[row.seed_key]!).citation;
    const back = sources
      .filter((s) => s.citation !== added)
      .map((s) => (s.confidence === NEW_ZONE_CONFIDENCE ? { ...s, confidence: OLD_ZONE_CONFIDENCE } : s));
    await qi.sequelize.query(
      `UPDATE species_sheets SET adult_length_cm = NULL, climbs = 0, sources_json = :json WHERE id = :id`,
      { replacements: { id: row.id, json: JSON.stringify(back) } },
    );
  }
}
