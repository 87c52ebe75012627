import { DataTypes, type QueryInterface } from 'sequelize';
import { ref } from './columns';

/**
 * The lamp outlook (fit, status, dates and figures) stored with each lamp instead of computed on every
 * page view. `lamps.outlook_version` counts changes to what an outlook is computed from (the lamp's
 * settings and readings, its lamp type, its enclosure's species and sheet); a stored outlook is current
 * when it was computed from that version for today (`as_of`). Rows are filled by the app (a new table
 * starts empty and every lamp reads as "not computed yet" until the start-up pass has run); dropping the
 * table loses nothing a user typed.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('lamps', 'outlook_version', {
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull: false,
    defaultValue: 1,
  });
  await qi.createTable('lamp_outlooks', {
    lamp_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      primaryKey: true,
      references: { model: 'lamps', key: 'id' },
      onDelete: 'CASCADE',
    },
    // Copied from the lamp's enclosure (an enclosure never changes organisation), so the lamp log's
    // filter and sort run on one index of this table.
    organisation_id: ref('organisations', 'CASCADE'),
    // Sort keys copied from the lamp and its enclosure (kept current like the rest of the row: a change
    // to either marks the outlook out of date). Pages show the live values, never these.
    label: { type: DataTypes.STRING(120), allowNull: false },
    enclosure_name: { type: DataTypes.STRING(120), allowNull: false },
    first_used_on: { type: DataTypes.DATEONLY, allowNull: false },
    status: { type: DataTypes.STRING(16), allowNull: false },
    /** 0 replace, 1 test soon, 2 fine, 3 no UV, 4 retired: "most urgent first" is ascending. */
    status_rank: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false },
    /** The earlier of the test and replacement dates; null for retired and heat-only lamps. */
    next_due_on: { type: DataTypes.DATEONLY, allowNull: true },
    test_due_on: { type: DataTypes.DATEONLY, allowNull: true },
    replace_due_on: { type: DataTypes.DATEONLY, allowNull: true },
    falls_below_on: { type: DataTypes.DATEONLY, allowNull: true },
    last_reading_at: { type: DataTypes.DATE, allowNull: true },
    remaining_fraction: { type: DataTypes.FLOAT, allowNull: true },
    /** Everything else the lamp log shows (fit, basking figures, reasons), as JSON. */
    outlook_json: { type: DataTypes.TEXT('medium'), allowNull: false },
    as_of: { type: DataTypes.DATEONLY, allowNull: false },
    source_version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    computed_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('lamp_outlooks', ['organisation_id', 'status_rank', 'next_due_on', 'lamp_id'], {
    name: 'lamp_outlooks_org_urgency',
  });
  await qi.addIndex('lamp_outlooks', ['organisation_id', 'next_due_on', 'lamp_id'], {
    name: 'lamp_outlooks_org_due',
  });
  await qi.addIndex('lamp_outlooks', ['organisation_id', 'last_reading_at', 'lamp_id'], {
    name: 'lamp_outlooks_org_last_reading',
  });
  await qi.addIndex('lamp_outlooks', ['organisation_id', 'remaining_fraction', 'lamp_id'], {
    name: 'lamp_outlooks_org_remaining',
  });
  for (const column of ['label', 'enclosure_name', 'first_used_on']) {
    await qi.addIndex('lamp_outlooks', ['organisation_id', column, 'lamp_id'], {
      name: `lamp_outlooks_org_${column}`,
    });
  }
  // The daily pass looks for rows computed before today.
  await qi.addIndex('lamp_outlooks', ['as_of'], { name: 'lamp_outlooks_as_of' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('lamp_outlooks');
  await qi.removeColumn('lamps', 'outlook_version');
}
