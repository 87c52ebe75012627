// Well-formed request bodies of a few routes, shared by the fuzz tests and the access suite (the
// pipeline parses before it checks access, so the access suite needs bodies that parse).

export const SPECIES_BODY = (organisationId: number, commonName: string) => ({
  organisationId,
  commonName,
  scientificName: 'Fuzzia testa',
  uvZone: 2,
  uvbTargetUw: { min: 20, max: 60 },
  baskingSurfaceC: { min: 35, max: 40 },
  warmAirC: { min: 28, max: 32 },
  coolAirC: { min: 22, max: 26 },
  nightMinC: 18,
  photoperiodH: { min: 10, max: 14 },
  notes: 'Invented for a test.',
  sources: [{ citation: 'Invented test data', confidence: 'none', covers: ['uvZone'] }],
});

export const LAMP_TYPE_BODY = (organisationId: number, name: string) => ({
  organisationId,
  name,
  tech: 't5',
  form: 'tube',
  lengthCm: 55,
  uvbAt30: 50,
  uviPerUvb: 0.04,
  radiantFraction: 0.5,
  beamDeg: 120,
  reflectorGain: 2,
  watts: 24,
  decayPoints: [
    [0, 1],
    [6, 0.8],
  ],
  sources: { uvbAt30: 'invented test value' },
});

export const READING_BODY = (note: string) => ({
  takenAt: new Date(Date.now() - 86_400_000).toISOString(),
  distance: 30,
  distanceUnit: 'cm',
  value: 55,
  unit: 'uvb',
  meter: 'Test meter',
  note,
});
