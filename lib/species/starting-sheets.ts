import { broadbandForZone } from './consistency';
import type { SpeciesInput, SpeciesSource } from './schema';

/**
 * The species sheets every organisation starts with: a dozen commonly kept reptiles and one amphibian.
 *
 * Provenance, stated honestly on every sheet:
 * - UV zone: the zones themselves are defined by Ferguson et al. 2010 (Zoo Biology 29:317–334). Which
 *   zone each species belongs to is the sheet author's reading of its basking habit, from memory — not
 *   copied from, nor checked against, any published species list.
 * - Temperatures and photoperiod: from memory of general husbandry literature; no source was checked.
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
  confidence: 'from memory; the zone definitions are published, this species’ zone was not checked — verify',
  covers: ['uvZone'],
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
    adultLengthCm: null,
    climbs: false,
    lowMelanin: false,
    notes:
      'Diurnal desert and dry-woodland lizard that basks in full sun for long periods. Give a wide, bright basking area with a gradient to shade.',
    sources: [zoneFromMemory('open-country, mid-day sun basker'), TEMPERATURES_FROM_MEMORY, METER_TARGET],
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
    adultLengthCm: null,
    climbs: false,
    lowMelanin: false,
    notes:
      'Crepuscular ground dweller of rocky scrub; rests in hides by day and takes warmth from warm surfaces. Low-level UVB with plenty of shade and hides.',
    sources: [zoneFromMemory('crepuscular, shade dweller'), TEMPERATURES_FROM_MEMORY],
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
    adultLengthCm: null,
    climbs: false,
    lowMelanin: false,
    notes:
      'Arboreal, crepuscular gecko of humid forest. Sensitive to heat: keep air below about 28 °C. Dense planting for shade.',
    sources: [zoneFromMemory('crepuscular forest dweller'), TEMPERATURES_FROM_MEMORY, METER_TARGET],
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
    adultLengthCm: null,
    climbs: false,
    lowMelanin: false,
    notes:
      'Arboreal; basks on branches in partial sun and moves into foliage to cool. Usually kept in mesh enclosures; a lamp above mesh loses part of its UVB.',
    sources: [zoneFromMemory('partial-sun basker in foliage'), TEMPERATURES_FROM_MEMORY],
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
    adultLengthCm: null,
    climbs: false,
    lowMelanin: false,
    notes:
      'Crepuscular colubrid; basks occasionally at the edge of cover. Low-level UVB with hides at both ends. Escape-prone: secure lids.',
    sources: [zoneFromMemory('crepuscular, occasional basker'), TEMPERATURES_FROM_MEMORY],
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
    adultLengthCm: null,
    climbs: false,
    lowMelanin: false,
    notes:
      'Nocturnal and crepuscular; spends the day in burrows. Low-level UVB with secure hides on both sides. Guard heat sources: snakes burn easily on lamps and emitters.',
    sources: [zoneFromMemory('nocturnal, shade dweller'), TEMPERATURES_FROM_MEMORY],
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
    adultLengthCm: null,
    climbs: false,
    lowMelanin: false,
    notes:
      'Large arboreal lizard that basks high in the canopy. Needs a very tall enclosure; the basking branch should be within the UV lamp’s reach.',
    sources: [zoneFromMemory('open or partial-sun basker in the canopy'), TEMPERATURES_FROM_MEMORY],
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
    adultLengthCm: null,
    climbs: false,
    lowMelanin: false,
    notes:
      'Diurnal ground dweller of open woodland and grassland; basks in the morning and forages in the open. Some keepers treat it as a zone 2 species.',
    sources: [zoneFromMemory('morning basker in open country'), TEMPERATURES_FROM_MEMORY],
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
    adultLengthCm: null,
    climbs: false,
    lowMelanin: false,
    notes:
      'Desert lizard that basks on hot rock in full sun and retreats to burrows. Needs an intense, hot basking spot and a dry enclosure.',
    sources: [zoneFromMemory('desert, mid-day sun basker'), TEMPERATURES_FROM_MEMORY, METER_TARGET],
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
    adultLengthCm: null,
    climbs: false,
    lowMelanin: false,
    notes:
      'Aquatic turtle that hauls out to bask. The basking platform is the basking zone; water temperature (about 24–26 °C, from memory) is not modelled here.',
    sources: [zoneFromMemory('aquatic, open basker'), TEMPERATURES_FROM_MEMORY],
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
    adultLengthCm: null,
    climbs: false,
    lowMelanin: false,
    notes:
      'Mediterranean tortoise of scrub and open woodland; basks in the morning sun. Outdoor time in warm weather is best; brumation is not covered by this sheet.',
    sources: [zoneFromMemory('open or partial-sun basker'), TEMPERATURES_FROM_MEMORY],
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
    adultLengthCm: null,
    climbs: false,
    lowMelanin: false,
    notes:
      'Arboreal frog that rests exposed on branches by day. Amphibian skin dries and burns easily: keep heat gentle, keep lamps out of reach, and give shaded, humid refuges.',
    sources: [zoneFromMemory('partial-sun, occasional basker'), TEMPERATURES_FROM_MEMORY],
  },
];
