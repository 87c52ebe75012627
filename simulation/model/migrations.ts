/**
 * Migrations of older design files. Each entry upgrades a document from version `n` to `n + 1`;
 * parseDesign runs them in order before validating against the current schema.
 */
export type Migration = (doc: Record<string, unknown>) => Record<string, unknown>;

/**
 * Version 1 -> 2 (depth). Version 1 had no depth positions: every lamp and the side view sat at half the
 * enclosure's depth. Version 2's `enclosure.sectionZ` and lamp `z` default to exactly that when absent,
 * so the step writes no new field: an upgraded design computes the same fields as before, keeps every
 * field the user wrote, and its lamps follow the middle if the depth is changed later.
 */
function depthStep(doc: Record<string, unknown>): Record<string, unknown> {
  return { ...doc, version: 2 };
}

export const DESIGN_MIGRATIONS: Readonly<Record<number, Migration>> = { 1: depthStep };
