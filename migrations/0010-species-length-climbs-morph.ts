import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Species sheets gain the adult total length (sizes the shared basking spot), whether the animal climbs
 * walls and mesh, and whether the sheet is for an albino or hypomelanistic morph. Existing sheets keep
 * everything they had: no length, not climbing, not a pale morph.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('species_sheets', 'adult_length_cm', { type: DataTypes.FLOAT, allowNull: true });
  await qi.addColumn('species_sheets', 'climbs', {
    type: DataTypes.BOOLEAN,
    allowNull: false,
    defaultValue: false,
  });
  await qi.addColumn('species_sheets', 'low_melanin', {
    type: DataTypes.BOOLEAN,
    allowNull: false,
    defaultValue: false,
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('species_sheets', 'low_melanin');
  await qi.removeColumn('species_sheets', 'climbs');
  await qi.removeColumn('species_sheets', 'adult_length_cm');
}
