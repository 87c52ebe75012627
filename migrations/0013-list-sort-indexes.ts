import type { QueryInterface } from 'sequelize';

/**
 * Indexes that let the busiest lists read one page in order instead of sorting a whole organisation.
 *
 * The enclosures table sorts names as people count ("Tub 5" before "Tub 10"): `name_key` is the name with
 * every run of digits zero-padded to ten places, so the name order can come from an index. It is a virtual
 * column (MariaDB computes it; nothing is stored in the row or kept up to date by the app). MariaDB's own
 * NATURAL_SORT_KEY is refused in a generated column, hence the two regular expressions: pad every run
 * with ten zeros, then keep its last ten digits. Longer numbers keep all their digits; the column is wide
 * enough for a 120-character name of single digits. The table opens newest first with ties by name then id, and MariaDB reads an index
 * backwards only with every part reversed, so each direction of the update order has its own index.
 * The keepers list reads one organisation's keepers in membership order.
 *
 * Nothing here holds data a user typed: `down` drops the indexes and the computed column.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q(
    `ALTER TABLE enclosures ADD COLUMN name_key VARCHAR(700) AS
       (REGEXP_REPLACE(REGEXP_REPLACE(name, '[0-9]+', '0000000000\\\\0'), '0*([0-9]{10})(?![0-9])', '\\\\1'))
       VIRTUAL`,
  );
  await q('CREATE INDEX enclosures_org_name ON enclosures (organisation_id, name_key, id)');
  await q('CREATE INDEX enclosures_org_name_desc ON enclosures (organisation_id, name_key DESC, id)');
  await q(
    'CREATE INDEX enclosures_org_updated_desc ON enclosures (organisation_id, updated_at DESC, name_key, id)',
  );
  await q('CREATE INDEX enclosures_org_updated ON enclosures (organisation_id, updated_at, name_key, id)');
  await q('CREATE INDEX memberships_org_role ON memberships (organisation_id, role, id)');
}

export async function down({ context: qi }: { context: QueryInterface }) {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q('DROP INDEX memberships_org_role ON memberships');
  await q('DROP INDEX enclosures_org_updated ON enclosures');
  await q('DROP INDEX enclosures_org_updated_desc ON enclosures');
  await q('DROP INDEX enclosures_org_name_desc ON enclosures');
  await q('DROP INDEX enclosures_org_name ON enclosures');
  await q('ALTER TABLE enclosures DROP COLUMN name_key');
}
