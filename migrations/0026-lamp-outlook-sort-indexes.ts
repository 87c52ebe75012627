import type { QueryInterface } from 'sequelize';

/**
 * Every order of the lamp log read through an index that starts with the organisation, and one that
 * starts with the organisation and the status for a list filtered by status, so a page stops at its end
 * instead of sorting every lamp of the organisation (or of the status) first:
 *
 * - Lamps without a last reading or a UV output come last in both directions. Descending, MariaDB's own
 *   order already does (NULL is the smallest value), so the plain column's index is read backwards;
 *   ascending reads a virtual column, the value with a blank read as the largest possible one
 *   (MariaDB computes it; nothing is stored in the row or kept up to date by the app).
 * - The enclosure order breaks a tie on the lamp's label, so its index holds the label too.
 * - Age runs against the lamp id (the oldest first use first, ties by id ascending), so the first-use
 *   column is indexed descending and one index gives both directions.
 *
 * Nothing here holds data a user typed: `down` drops the indexes and the computed columns and puts back
 * the indexes the earlier migration made.
 */
const INDEXES: [name: string, columns: string][] = [
  ['lamp_outlooks_org_last_reading_last', 'organisation_id, last_reading_last, lamp_id'],
  ['lamp_outlooks_org_status_last_reading', 'organisation_id, status_rank, last_reading_at, lamp_id'],
  ['lamp_outlooks_org_status_last_reading_last', 'organisation_id, status_rank, last_reading_last, lamp_id'],
  ['lamp_outlooks_org_remaining_last', 'organisation_id, remaining_last, lamp_id'],
  ['lamp_outlooks_org_status_remaining', 'organisation_id, status_rank, remaining_fraction, lamp_id'],
  ['lamp_outlooks_org_status_remaining_last', 'organisation_id, status_rank, remaining_last, lamp_id'],
  ['lamp_outlooks_org_status_label', 'organisation_id, status_rank, label, lamp_id'],
  ['lamp_outlooks_org_enclosure_label', 'organisation_id, enclosure_name, label, lamp_id'],
  [
    'lamp_outlooks_org_status_enclosure_label',
    'organisation_id, status_rank, enclosure_name, label, lamp_id',
  ],
  ['lamp_outlooks_org_first_used_desc', 'organisation_id, first_used_on DESC, lamp_id'],
  ['lamp_outlooks_org_status_first_used_desc', 'organisation_id, status_rank, first_used_on DESC, lamp_id'],
];

/** Replaced by the indexes above that give the same orders and more. */
const REPLACED: [name: string, columns: string][] = [
  ['lamp_outlooks_org_enclosure_name', 'organisation_id, enclosure_name, lamp_id'],
  ['lamp_outlooks_org_first_used_on', 'organisation_id, first_used_on, lamp_id'],
];

export async function up({ context: qi }: { context: QueryInterface }) {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q(
    `ALTER TABLE lamp_outlooks
       ADD COLUMN last_reading_last DATETIME AS (IFNULL(last_reading_at, TIMESTAMP '9999-12-31 23:59:59')) VIRTUAL,
       ADD COLUMN remaining_last DOUBLE AS (IFNULL(remaining_fraction, 1e308)) VIRTUAL`,
  );
  for (const [name, columns] of INDEXES) await q(`CREATE INDEX ${name} ON lamp_outlooks (${columns})`);
  for (const [name] of REPLACED) await q(`DROP INDEX ${name} ON lamp_outlooks`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  const q = (sql: string) => qi.sequelize.query(sql);
  for (const [name, columns] of REPLACED) await q(`CREATE INDEX ${name} ON lamp_outlooks (${columns})`);
  for (const [name] of [...INDEXES].reverse()) await q(`DROP INDEX ${name} ON lamp_outlooks`);
  await q('ALTER TABLE lamp_outlooks DROP COLUMN remaining_last, DROP COLUMN last_reading_last');
}
