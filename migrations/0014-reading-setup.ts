import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Readings say how they were taken: what lay between lamp and meter (and the share of UVB it passes),
 * and whether the lamp had warmed up. Readings logged before this say "not recorded" for both, which the
 * outlook reads as a bare lamp and says so. Organisations gain a mark for invented example data (the
 * demo), shown wherever their lamps and readings appear. Every stored lamp outlook is marked out of date,
 * since the outlook now brings readings to a bare lamp before fitting.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('readings', 'through', {
    type: DataTypes.ENUM('not-recorded', 'nothing', 'lid', 'screen', 'glass'),
    allowNull: false,
    defaultValue: 'not-recorded',
  });
  await qi.addColumn('readings', 'through_transmission', { type: DataTypes.DOUBLE, allowNull: true });
  await qi.addColumn('readings', 'warmed_up', {
    type: DataTypes.ENUM('not-recorded', 'yes', 'no'),
    allowNull: false,
    defaultValue: 'not-recorded',
  });
  await qi.addColumn('organisations', 'example_data', {
    type: DataTypes.BOOLEAN,
    allowNull: false,
    defaultValue: false,
  });
  await qi.sequelize.query('UPDATE lamps SET outlook_version = outlook_version + 1');
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('organisations', 'example_data');
  await qi.removeColumn('readings', 'warmed_up');
  await qi.removeColumn('readings', 'through_transmission');
  await qi.removeColumn('readings', 'through');
  await qi.sequelize.query('UPDATE lamps SET outlook_version = outlook_version + 1');
}
