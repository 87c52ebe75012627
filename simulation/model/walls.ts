/**
 * Enclosure walls and how much heat they let through: the overall coefficient U (W/m²K) of the air
 * model (fields/heat.ts). A lower U holds the lamps' heat in, so the air under the lid warms more.
 *
 * - glass: 5 — typical of single glazing (from memory);
 * - wood: 2.5 — 12–18 mm board with still air films either side (from memory);
 * - PVC or melamine-faced board: 2.5 — foamed PVC and melamine chipboard insulate about like wood (from memory);
 * - mesh: 15 — warm air leaves through the openings, so the enclosure holds little heat (from memory).
 * Wooden and PVC enclosures therefore hold about twice the air-temperature rise of glass ones, as keepers
 * report (common practice, no published source).
 */
export const WALL_MATERIALS = ['glass', 'wood', 'pvc', 'mesh'] as const;
export type WallMaterial = (typeof WALL_MATERIALS)[number];

export const WALLS: Record<WallMaterial, { label: string; uWm2K: number; mark: string }> = {
  glass: { label: 'Glass', uWm2K: 5, mark: 'from memory' },
  wood: { label: 'Wood', uWm2K: 2.5, mark: 'from memory' },
  pvc: { label: 'PVC or melamine board', uWm2K: 2.5, mark: 'from memory' },
  mesh: { label: 'Mesh', uWm2K: 15, mark: 'from memory' },
};

export const DEFAULT_WALLS: WallMaterial = 'glass';
