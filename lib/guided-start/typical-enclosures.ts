import type { EnclosureInput, Lid } from './layout';

/**
 * A usual enclosure for each starting species (inside width × height × depth, cm, its walls and lid),
 * used to suggest a size in the guided start and to check the search in tests. Common practice, no
 * published source: adult sizes and materials as shops commonly sell them (wooden or PVC vivariums for
 * desert lizards and snakes, glass terrariums for small forest species, mesh cages for chameleons); the
 * keeper's own enclosure always wins.
 */
export const TYPICAL_ENCLOSURES: Record<string, { enclosure: EnclosureInput; lid: Lid }> = {
  'pogona-vitticeps': {
    enclosure: { width: 120, height: 60, depth: 60, roomTempC: 22, walls: 'wood' },
    lid: 'mesh',
  },
  'eublepharis-macularius': {
    enclosure: { width: 90, height: 45, depth: 45, roomTempC: 22, walls: 'glass' },
    lid: 'mesh',
  },
  'correlophus-ciliatus': {
    enclosure: { width: 45, height: 60, depth: 45, roomTempC: 22, walls: 'glass' },
    lid: 'mesh',
  },
  'chamaeleo-calyptratus': {
    enclosure: { width: 60, height: 120, depth: 60, roomTempC: 22, walls: 'mesh' },
    lid: 'mesh',
  },
  'pantherophis-guttatus': {
    enclosure: { width: 120, height: 60, depth: 60, roomTempC: 22, walls: 'wood' },
    lid: 'mesh',
  },
  'python-regius': {
    enclosure: { width: 120, height: 60, depth: 60, roomTempC: 25, walls: 'pvc' },
    lid: 'mesh',
  },
  'iguana-iguana': {
    enclosure: { width: 180, height: 180, depth: 90, roomTempC: 25, walls: 'wood' },
    lid: 'mesh',
  },
  'tiliqua-scincoides': {
    enclosure: { width: 120, height: 60, depth: 60, roomTempC: 22, walls: 'wood' },
    lid: 'mesh',
  },
  'uromastyx-ornata': {
    enclosure: { width: 120, height: 60, depth: 60, roomTempC: 24, walls: 'wood' },
    lid: 'mesh',
  },
  'trachemys-scripta-elegans': {
    enclosure: { width: 120, height: 50, depth: 50, roomTempC: 24, walls: 'glass' },
    lid: 'open',
  },
  'testudo-hermanni': {
    enclosure: { width: 120, height: 40, depth: 60, roomTempC: 20, walls: 'wood' },
    lid: 'open',
  },
  'litoria-caerulea': {
    enclosure: { width: 45, height: 60, depth: 45, roomTempC: 22, walls: 'glass' },
    lid: 'mesh',
  },
};
