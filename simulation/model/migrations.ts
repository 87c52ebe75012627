/**
 * Migrations of older design files. Each entry upgrades a document from version `n` to `n + 1`;
 * parseDesign runs them in order before validating against the current schema. Version 1 is the
 * first published version, so the registry is empty today; a later version adds its step here,
 * e.g. `1: (d) => ({ ...d, version: 2, ... })`.
 */
export type Migration = (doc: Record<string, unknown>) => Record<string, unknown>;

export const DESIGN_MIGRATIONS: Readonly<Record<number, Migration>> = {};
