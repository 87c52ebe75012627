import { DataTypes, type QueryInterface } from 'sequelize';
import { author, id, ref, stamps } from './columns';

/**
 * A shop's customers and the lamps it tests for them at the counter. Counter lamps live apart from the
 * lamp log's enclosure lamps: they hang in no enclosure of the organisation, and the lamp log's outlooks
 * and reminders are about enclosures. A counter lamp outlives its customer: deleting the customer removes
 * the person and keeps the lamp and its readings without them (`customer_id` set to null).
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('customers', {
    id: id(),
    organisation_id: ref('organisations', 'CASCADE'),
    name: { type: DataTypes.STRING(120), allowNull: false },
    email: { type: DataTypes.STRING(254), allowNull: true },
    phone: { type: DataTypes.STRING(40), allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    // When the customer agreed to reminder e-mails; null: no consent (never given, or withdrawn).
    reminder_consent_at: { type: DataTypes.DATE, allowNull: true },
    reminder_consent_withdrawn_at: { type: DataTypes.DATE, allowNull: true },
    created_by_id: author(),
    ...stamps(),
  });
  await qi.addIndex('customers', ['organisation_id', 'name'], { name: 'customers_organisation_name' });

  await qi.createTable('counter_lamps', {
    id: id(),
    organisation_id: ref('organisations', 'CASCADE'),
    customer_id: ref('customers', 'SET NULL', true),
    // A lamp type with counter tests cannot be deleted: the tests depend on its technology and shape.
    lamp_type_id: ref('lamp_types', 'RESTRICT'),
    label: { type: DataTypes.STRING(120), allowNull: true },
    first_used_on: { type: DataTypes.DATEONLY, allowNull: false },
    // The customer gave an age in months rather than a date: the date is worked out and approximate.
    first_used_estimated: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    hours_per_day: { type: DataTypes.DOUBLE, allowNull: false },
    species_sheet_id: ref('species_sheets', 'SET NULL', true),
    basking_distance_cm: { type: DataTypes.DOUBLE, allowNull: true },
    basking_transmission: { type: DataTypes.DOUBLE, allowNull: true },
    created_by_id: author(),
    ...stamps(),
  });
  await qi.addIndex('counter_lamps', ['customer_id', 'id'], { name: 'counter_lamps_customer' });
  await qi.addIndex('counter_lamps', ['organisation_id', 'lamp_type_id'], { name: 'counter_lamps_type' });

  await qi.createTable('counter_readings', {
    id: id(),
    counter_lamp_id: ref('counter_lamps', 'CASCADE'),
    taken_at: { type: DataTypes.DATE, allowNull: false },
    distance_cm: { type: DataTypes.DOUBLE, allowNull: false },
    value: { type: DataTypes.DOUBLE, allowNull: false },
    unit: { type: DataTypes.ENUM('uvb', 'uvi'), allowNull: false },
    through: {
      type: DataTypes.ENUM('not-recorded', 'nothing', 'lid', 'screen', 'glass'),
      allowNull: false,
      defaultValue: 'not-recorded',
    },
    through_transmission: { type: DataTypes.DOUBLE, allowNull: true },
    warmed_up: {
      type: DataTypes.ENUM('not-recorded', 'yes', 'no'),
      allowNull: false,
      defaultValue: 'not-recorded',
    },
    meter: { type: DataTypes.STRING(160), allowNull: true },
    // The verdict given at the counter that day, as the customer was told it (kept for the test slip).
    verdict: { type: DataTypes.ENUM('keep', 'test-again', 'replace', 'no-verdict'), allowNull: false },
    test_again_on: { type: DataTypes.DATEONLY, allowNull: true },
    taken_by_id: author(),
    ...stamps(),
  });
  await qi.addIndex('counter_readings', ['counter_lamp_id', 'taken_at'], { name: 'counter_readings_lamp' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('counter_readings');
  await qi.dropTable('counter_lamps');
  await qi.dropTable('customers');
}
