import { broadbandForZone } from './consistency';
import type { SpeciesInput, SpeciesSource } from './schema';

/**
 * The species sheets every organisation starts with: a dozen commonly kept reptiles and one amphibian.
 *
 * Provenance, stated honestly on every sheet:
 * - UV zone: the zones themselves are defined by Ferguson et al. 2010 (Zoo Biology 29:317–334). Which
 *   zone each species belongs to is the sheet author's reading of its basking habit, from memory — not
 *   copied from, nor checked against, any published species list.
 *   Species-by-species assignments are published (Baines et al. 2016, J. Zoo Aquar. Res. 4(1):42–63);
 *   the sheets say they were not checked against them.
 * - Temperatures and photoperiod: from memory of general husbandry literature; no source was checked.
 * - Adult length (total length; shell length for chelonians, snout–vent length for the frog) and whether
 *   the animal climbs glass and mesh: from memory, marked so on every sheet.
 * - Broadband UVB hints (µW/cm²): derived from the species' UV zone (the published source) at the
 *   engine's fluorescent ratio of 0.04 UV Index per µW/cm², so the two never contradict each other.
 *   Reading a broadband meter at all is common practice, no published source; the µW/cm² that stand
 *   for a UV Index depend on the lamp's spectrum (and the meter), so the zone is the target. Keepers'
 *   older rule of thumb for desert baskers (25–50 µW/cm²) is about UV Index 1–2 at that ratio — below
 *   zone 4's basking range of 4.5–9.5 — and is not used.
 * Organisations are expected to review and correct their copies; the UI says so on every sheet.
 */

export type StartingSheet = SpeciesInput & { seedKey: string };

const zoneFromMemory = (habit: string): SpeciesSource => ({
  citation:
    'From memory: zone chosen from the species’ basking habit (' +
    habit +
    ') using the zone definitions of Ferguson et al. 2010, Zoo Biology 29:317–334',
  confidence: ZONE_CONFIDENCE,
  covers: ['uvZone'],
});

/**
 * Species-by-species zone assignments are published (Baines et al. 2016, J. Zoo Aquar. Res. 4(1):42–63,
 * for 254 species), but these sheets' zones were not taken from, nor checked against, that table: the
 * confidence note says so and points to where to check.
 */
export const ZONE_CONFIDENCE =
  'from memory; the zone definitions are published, and so are species-by-species zone assignments (Baines et al. 2016, J. Zoo Aquar. Res. 4(1):42–63), but this species’ zone was not checked against them — verify';

/** Adult size and climbing habit: from memory, like the temperatures. */
export const sizeAndHabit = (length: string, climbing: string): SpeciesSource => ({
  citation: `From memory: adult ${length}; ${climbing}`,
  confidence:
    'from memory; no source was checked, and adults vary with sex and line — measure your own animal and correct the sheet',
  covers: ['adultLengthCm', 'climbs'],
});

const TEMPERATURES_FROM_MEMORY: SpeciesSource = {
  citation: 'From memory: general husbandry literature for the species',
  confidence:
    'from memory; no source was checked and published care guides differ — verify with a reptile vet or current husbandry literature',
  covers: ['baskingSurfaceC', 'warmAirC', 'coolAirC', 'nightMinC', 'photoperiodH'],
};

const METER_TARGET: SpeciesSource = {
  citation:
    'Derived from the UV zone (Ferguson et al. 2010, Zoo Biology 29:317–334) at 0.04 UV Index per µW/cm², a typical fluorescent ratio (from memory); using a broadband meter is common practice, no published source',
  confidence:
    'rough guide only; the µW/cm² that stand for a UV Index depend on the lamp’s spectrum and on the meter — the UV zone is the primary target',
  covers: ['uvbTargetUw'],
};

// Zone 4 basking UVI 4.5–9.5 → 115–235 µW/cm²; zone 1 basking UVI 0.6–1.4 → 15–35 µW/cm² (at 0.04).
const DESERT_TARGET = broadbandForZone(4);
const FOREST_TARGET = broadbandForZone(1);

const r = (min: number, max: number) => ({ min, max });

export const STARTING_SHEETS: readonly StartingSheet[] = [
  {
    seedKey: 'pogona-vitticeps',
    commonName: 'Bearded dragon',
    scientificName: 'Pogona vitticeps',
    uvZone: 4,
    uvbTargetUw: DESERT_TARGET,
    baskingSurfaceC: r(40, 45),
    warmAirC: r(30, 35),
    coolAirC: r(22, 28),
    nightMinC: 18,
    photoperiodH: r(12, 14),
    adultLengthCm: 50,
    climbs: false,
    lowMelanin: false,
    notes:
      'Diurnal desert and dry-woodland lizard that basks in full sun for long periods. Give a wide, bright basking area with a gradient to shade.',
    sources: [
      zoneFromMemory('open-country, mid-day sun basker'),
      TEMPERATURES_FROM_MEMORY,
      METER_TARGET,
      sizeAndHabit(
        'total length about 40–60 cm, nose to tail tip',
        'climbs rocks and branches, but does not hang from a mesh lid or climb glass',
      ),
    ],
  },
  {
    seedKey: 'eublepharis-macularius',
    commonName: 'Leopard gecko',
    scientificName: 'Eublepharis macularius',
    uvZone: 1,
    uvbTargetUw: null,
    baskingSurfaceC: r(30, 35),
    warmAirC: r(27, 31),
    coolAirC: r(21, 26),
    nightMinC: 18,
    photoperiodH: r(12, 14),
    adultLengthCm: 22,
    climbs: false,
    lowMelanin: false,
    notes:
      'Crepuscular ground dweller of rocky scrub; rests in hides by day and takes warmth from warm surfaces. Low-level UVB with plenty of shade and hides.',
    sources: [
      zoneFromMemory('crepuscular, shade dweller'),
      TEMPERATURES_FROM_MEMORY,
      sizeAndHabit(
        'total length about 20–25 cm',
        'has no adhesive toe pads: it cannot climb glass or hang from a mesh lid',
      ),
    ],
  },
  {
    seedKey: 'correlophus-ciliatus',
    commonName: 'Crested gecko',
    scientificName: 'Correlophus ciliatus',
    uvZone: 1,
    uvbTargetUw: FOREST_TARGET,
    baskingSurfaceC: r(26, 29),
    warmAirC: r(24, 27),
    coolAirC: r(20, 24),
    nightMinC: 18,
    photoperiodH: r(12, 12),
    adultLengthCm: 20,
    climbs: true,
    lowMelanin: false,
    notes:
      'Arboreal, crepuscular gecko of humid forest. Sensitive to heat: keep air below about 28 °C. Dense planting for shade.',
    sources: [
      zoneFromMemory('crepuscular forest dweller'),
      TEMPERATURES_FROM_MEMORY,
      METER_TARGET,
      sizeAndHabit(
        'total length about 18–22 cm, tail included',
        'adhesive toe pads: it climbs glass and hangs from mesh',
      ),
    ],
  },
  {
    seedKey: 'chamaeleo-calyptratus',
    commonName: 'Veiled chameleon',
    scientificName: 'Chamaeleo calyptratus',
    uvZone: 3,
    uvbTargetUw: null,
    baskingSurfaceC: r(32, 35),
    warmAirC: r(28, 32),
    coolAirC: r(22, 26),
    nightMinC: 15,
    photoperiodH: r(12, 12),
    adultLengthCm: 50,
    climbs: true,
    lowMelanin: false,
    notes:
      'Arboreal; basks on branches in partial sun and moves into foliage to cool. Usually kept in mesh enclosures; a lamp above mesh loses part of its UVB.',
    sources: [
      zoneFromMemory('partial-sun basker in foliage'),
      TEMPERATURES_FROM_MEMORY,
      sizeAndHabit(
        'total length about 45–60 cm for males (females about 25–35 cm)',
        'arboreal: it climbs branches and mesh and hangs under the lid',
      ),
    ],
  },
  {
    seedKey: 'pantherophis-guttatus',
    commonName: 'Corn snake',
    scientificName: 'Pantherophis guttatus',
    uvZone: 1,
    uvbTargetUw: null,
    baskingSurfaceC: r(30, 33),
    warmAirC: r(27, 30),
    coolAirC: r(21, 25),
    nightMinC: 18,
    photoperiodH: r(12, 14),
    adultLengthCm: 140,
    climbs: true,
    lowMelanin: false,
    notes:
      'Crepuscular colubrid; basks occasionally at the edge of cover. Low-level UVB with hides at both ends. Escape-prone: secure lids.',
    sources: [
      zoneFromMemory('crepuscular, occasional basker'),
      TEMPERATURES_FROM_MEMORY,
      sizeAndHabit(
        'total length about 120–150 cm',
        'a good climber of branches that lies along and pushes against the lid',
      ),
    ],
  },
  {
    seedKey: 'python-regius',
    commonName: 'Ball python',
    scientificName: 'Python regius',
    uvZone: 1,
    uvbTargetUw: null,
    baskingSurfaceC: r(32, 35),
    warmAirC: r(29, 32),
    coolAirC: r(24, 27),
    nightMinC: 22,
    photoperiodH: r(12, 12),
    adultLengthCm: 120,
    climbs: false,
    lowMelanin: false,
    notes:
      'Nocturnal and crepuscular; spends the day in burrows. Low-level UVB with secure hides on both sides. Guard heat sources: snakes burn easily on lamps and emitters.',
    sources: [
      zoneFromMemory('nocturnal, shade dweller'),
      TEMPERATURES_FROM_MEMORY,
      sizeAndHabit(
        'total length about 100–150 cm (females larger)',
        'a heavy-bodied ground dweller that climbs little (young animals climb more)',
      ),
    ],
  },
  {
    seedKey: 'iguana-iguana',
    commonName: 'Green iguana',
    scientificName: 'Iguana iguana',
    uvZone: 3,
    uvbTargetUw: null,
    baskingSurfaceC: r(35, 40),
    warmAirC: r(30, 33),
    coolAirC: r(24, 28),
    nightMinC: 22,
    photoperiodH: r(12, 12),
    adultLengthCm: 150,
    climbs: true,
    lowMelanin: false,
    notes:
      'Large arboreal lizard that basks high in the canopy. Needs a very tall enclosure; the basking branch should be within the UV lamp’s reach.',
    sources: [
      zoneFromMemory('open or partial-sun basker in the canopy'),
      TEMPERATURES_FROM_MEMORY,
      sizeAndHabit(
        'total length about 120–180 cm, more than half of it tail',
        'arboreal: it climbs branches and mesh',
      ),
    ],
  },
  {
    seedKey: 'tiliqua-scincoides',
    commonName: 'Blue-tongued skink',
    scientificName: 'Tiliqua scincoides',
    uvZone: 3,
    uvbTargetUw: null,
    baskingSurfaceC: r(35, 40),
    warmAirC: r(29, 32),
    coolAirC: r(22, 26),
    nightMinC: 18,
    photoperiodH: r(12, 14),
    adultLengthCm: 50,
    climbs: false,
    lowMelanin: false,
    notes:
      'Diurnal ground dweller of open woodland and grassland; basks in the morning and forages in the open. Some keepers treat it as a zone 2 species.',
    sources: [
      zoneFromMemory('morning basker in open country'),
      TEMPERATURES_FROM_MEMORY,
      sizeAndHabit('total length about 45–60 cm', 'a short-legged ground dweller'),
    ],
  },
  {
    seedKey: 'uromastyx-ornata',
    commonName: 'Ornate spiny-tailed lizard',
    scientificName: 'Uromastyx ornata',
    uvZone: 4,
    uvbTargetUw: DESERT_TARGET,
    baskingSurfaceC: r(45, 55),
    warmAirC: r(32, 38),
    coolAirC: r(24, 29),
    nightMinC: 18,
    photoperiodH: r(12, 14),
    adultLengthCm: 35,
    climbs: false,
    lowMelanin: false,
    notes:
      'Desert lizard that basks on hot rock in full sun and retreats to burrows. Needs an intense, hot basking spot and a dry enclosure.',
    sources: [
      zoneFromMemory('desert, mid-day sun basker'),
      TEMPERATURES_FROM_MEMORY,
      METER_TARGET,
      sizeAndHabit('total length about 30–38 cm', 'climbs rocks, not glass or mesh'),
    ],
  },
  {
    seedKey: 'trachemys-scripta-elegans',
    commonName: 'Red-eared slider',
    scientificName: 'Trachemys scripta elegans',
    uvZone: 3,
    uvbTargetUw: null,
    baskingSurfaceC: r(32, 35),
    warmAirC: r(28, 32),
    coolAirC: r(23, 27),
    nightMinC: 20,
    photoperiodH: r(12, 14),
    adultLengthCm: 25,
    climbs: false,
    lowMelanin: false,
    notes:
      'Aquatic turtle that hauls out to bask. The basking platform is the basking zone; water temperature (about 24–26 °C, from memory) is not modelled here.',
    sources: [
      zoneFromMemory('aquatic, open basker'),
      TEMPERATURES_FROM_MEMORY,
      sizeAndHabit(
        'shell (carapace) length about 20–28 cm, females larger; the sheet gives the shell length',
        'does not climb walls or mesh',
      ),
    ],
  },
  {
    seedKey: 'testudo-hermanni',
    commonName: 'Hermann’s tortoise',
    scientificName: 'Testudo hermanni',
    uvZone: 3,
    uvbTargetUw: null,
    baskingSurfaceC: r(35, 40),
    warmAirC: r(28, 32),
    coolAirC: r(20, 24),
    nightMinC: 12,
    photoperiodH: r(12, 14),
    adultLengthCm: 18,
    climbs: false,
    lowMelanin: false,
    notes:
      'Mediterranean tortoise of scrub and open woodland; basks in the morning sun. Outdoor time in warm weather is best; brumation is not covered by this sheet.',
    sources: [
      zoneFromMemory('open or partial-sun basker'),
      TEMPERATURES_FROM_MEMORY,
      sizeAndHabit(
        'shell (carapace) length about 15–20 cm; the sheet gives the shell length',
        'does not climb walls or mesh',
      ),
    ],
  },
  {
    seedKey: 'litoria-caerulea',
    commonName: 'White’s tree frog',
    scientificName: 'Litoria caerulea',
    uvZone: 2,
    uvbTargetUw: null,
    baskingSurfaceC: r(28, 31),
    warmAirC: r(26, 29),
    coolAirC: r(22, 25),
    nightMinC: 18,
    photoperiodH: r(12, 12),
    adultLengthCm: 10,
    climbs: true,
    lowMelanin: false,
    notes:
      'Arboreal frog that rests exposed on branches by day. Amphibian skin dries and burns easily: keep heat gentle, keep lamps out of reach, and give shaded, humid refuges.',
    sources: [
      zoneFromMemory('partial-sun, occasional basker'),
      TEMPERATURES_FROM_MEMORY,
      sizeAndHabit(
        'snout–vent length about 7–11 cm (a frog has no tail)',
        'adhesive toe pads: it climbs glass and hangs from mesh',
      ),
    ],
  },
];
