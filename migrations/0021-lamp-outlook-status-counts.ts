import type { QueryInterface } from 'sequelize';

/**
 * The lamp log's summary counts ("12 to replace, 30 to test soon", and how many wait to be recomputed)
 * come from one grouped COUNT of an organisation's stored outlooks by status. With the day each was
 * computed for in the index beside the status, MariaDB answers it from the index alone, reading no
 * table rows. Nothing here holds data a user typed: `down` drops the index.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query(
    'CREATE INDEX lamp_outlooks_org_status_as_of ON lamp_outlooks (organisation_id, status_rank, as_of)',
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query('DROP INDEX lamp_outlooks_org_status_as_of ON lamp_outlooks');
}
