import { DataTypes, type QueryInterface } from 'sequelize';
import { author, id, ref, stamps } from './columns';

/**
 * A shop may adopt the decay curve it measured for one of its lamp types (learned from all its readings of
 * that type) in place of the catalogue's curve. `lamp_curve_adoptions` keeps every adoption with who made
 * it, when, and the fitted parameters as they were then (frozen: later readings move the measured curve,
 * not the adopted one), and who withdrew it and when — going back to the catalogue keeps the record.
 * `lamp_types.adopted_curve_json` holds the one in force, so every reader of the catalogue (the lamp
 * log's outlooks, the counter, the guided start) takes it up with the entry, and the lamp type's update
 * hook marks the outlooks of its lamps out of date. No existing row changes.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('lamp_types', 'adopted_curve_json', { type: DataTypes.TEXT, allowNull: true });
  await qi.createTable('lamp_curve_adoptions', {
    id: id(),
    organisation_id: ref('organisations', 'CASCADE'),
    lamp_type_id: ref('lamp_types', 'CASCADE'),
    lamps: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    readings: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    // The fit as adopted: its kind and parameters, the start and half-life, and the decay table used.
    fit_json: { type: DataTypes.TEXT, allowNull: false },
    adopted_by_id: author(),
    adopted_at: { type: DataTypes.DATE, allowNull: false },
    withdrawn_by_id: author(),
    withdrawn_at: { type: DataTypes.DATE, allowNull: true },
    ...stamps(),
  });
  await qi.addIndex('lamp_curve_adoptions', ['lamp_type_id', 'adopted_at'], {
    name: 'lamp_curve_adoptions_type',
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('lamp_curve_adoptions');
  await qi.removeColumn('lamp_types', 'adopted_curve_json');
}
