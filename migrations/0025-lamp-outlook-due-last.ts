import type { QueryInterface } from 'sequelize';

/**
 * The lamp log's "due" order puts lamps without a date last in both directions. Descending, MariaDB's own
 * order already does (NULL is the smallest value), so the (organisation, date) indexes read backwards
 * give it; ascending it does not, and the list sorted every lamp of the organisation (or of a status)
 * for each page. `due_last` is the date with a blank read as the last possible day: a virtual column
 * (MariaDB computes it; nothing is stored in the row or kept up to date by the app), indexed for the
 * plain list and beside the status, so an ascending page is read in order and stops at its end.
 *
 * Nothing here holds data a user typed: `down` drops the indexes and the computed column.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q(
    `ALTER TABLE lamp_outlooks ADD COLUMN due_last DATE AS (IFNULL(next_due_on, '9999-12-31')) VIRTUAL`,
  );
  await q('CREATE INDEX lamp_outlooks_org_due_last ON lamp_outlooks (organisation_id, due_last, lamp_id)');
  await q(
    'CREATE INDEX lamp_outlooks_org_status_due_last ON lamp_outlooks (organisation_id, status_rank, due_last, lamp_id)',
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q('DROP INDEX lamp_outlooks_org_status_due_last ON lamp_outlooks');
  await q('DROP INDEX lamp_outlooks_org_due_last ON lamp_outlooks');
  await q('ALTER TABLE lamp_outlooks DROP COLUMN due_last');
}
