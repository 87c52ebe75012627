import { DataTypes, type QueryInterface } from 'sequelize';
import { author, id, ref, stamps } from './columns';

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('lamps', {
    id: id(),
    enclosure_id: ref('enclosures', 'CASCADE'),
    // A lamp type in use cannot be deleted: the lamp's history depends on its technology.
    lamp_type_id: ref('lamp_types', 'RESTRICT'),
    label: { type: DataTypes.STRING(120), allowNull: false },
    design_object_id: { type: DataTypes.STRING(100), allowNull: true },
    first_used_on: { type: DataTypes.DATEONLY, allowNull: false },
    hours_per_day: { type: DataTypes.FLOAT, allowNull: false },
    basking_distance_cm: { type: DataTypes.FLOAT, allowNull: true },
    basking_transmission: { type: DataTypes.FLOAT, allowNull: true },
    retired_on: { type: DataTypes.DATEONLY, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    created_by_id: author(),
    ...stamps(),
  });
  await qi.addIndex('lamps', ['enclosure_id', 'id'], { name: 'lamps_enclosure' });

  await qi.createTable('uploads', {
    id: id(),
    kind: { type: DataTypes.ENUM('backdrop', 'readings-csv'), allowNull: false },
    owner_id: ref('users', 'CASCADE'),
    organisation_id: ref('organisations', 'CASCADE'),
    enclosure_id: ref('enclosures', 'CASCADE', true),
    storage_key: { type: DataTypes.STRING(200), allowNull: false, unique: true },
    content_type: { type: DataTypes.STRING(60), allowNull: false },
    size_bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    sha256: { type: DataTypes.CHAR(64), allowNull: false },
    original_name: { type: DataTypes.STRING(200), allowNull: true },
    ...stamps(),
  });
  await qi.addIndex('uploads', ['enclosure_id', 'kind'], { name: 'uploads_enclosure_kind' });

  await qi.createTable('readings', {
    id: id(),
    lamp_id: ref('lamps', 'CASCADE'),
    taken_at: { type: DataTypes.DATE, allowNull: false },
    distance_cm: { type: DataTypes.FLOAT, allowNull: false },
    value: { type: DataTypes.FLOAT, allowNull: false },
    unit: { type: DataTypes.ENUM('uvb', 'uvi'), allowNull: false },
    meter: { type: DataTypes.STRING(160), allowNull: true },
    taken_by_id: author(),
    note: { type: DataTypes.TEXT, allowNull: true },
    upload_id: ref('uploads', 'SET NULL', true),
    ...stamps(),
  });
  await qi.addIndex('readings', ['lamp_id', 'taken_at'], { name: 'readings_lamp_taken' });

  await qi.createTable('mail_messages', {
    id: id(),
    kind: { type: DataTypes.STRING(40), allowNull: false },
    to_email: { type: DataTypes.STRING(254), allowNull: false },
    to_user_id: ref('users', 'SET NULL', true),
    subject: { type: DataTypes.STRING(250), allowNull: false },
    body: { type: DataTypes.TEXT, allowNull: false },
    // 191 characters × 4 bytes stays within InnoDB's index key limit under utf8mb4.
    dedupe_key: { type: DataTypes.STRING(191), allowNull: false, unique: true },
    status: { type: DataTypes.ENUM('queued', 'sent', 'failed'), allowNull: false, defaultValue: 'queued' },
    attempts: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    last_error: { type: DataTypes.TEXT, allowNull: true },
    sent_at: { type: DataTypes.DATE, allowNull: true },
    ...stamps(),
  });
  await qi.addIndex('mail_messages', ['status', 'id'], { name: 'mail_messages_status' });

  await qi.createTable('lamp_reminders', {
    id: id(),
    lamp_id: ref('lamps', 'CASCADE'),
    kind: { type: DataTypes.ENUM('test', 'replace'), allowNull: false },
    due_on: { type: DataTypes.DATEONLY, allowNull: false },
    dedupe_key: { type: DataTypes.STRING(191), allowNull: false, unique: true },
    mail_message_id: ref('mail_messages', 'CASCADE'),
    ...stamps(),
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('lamp_reminders');
  await qi.dropTable('mail_messages');
  await qi.dropTable('readings');
  await qi.dropTable('uploads');
  await qi.dropTable('lamps');
}
