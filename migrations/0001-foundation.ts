import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const stamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const ref = (table: string, onDelete: 'CASCADE' | 'RESTRICT' = 'CASCADE') => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull: false,
  references: { model: table, key: 'id' },
  onDelete,
});

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('organisations', {
    id,
    name: { type: DataTypes.STRING(120), allowNull: false },
    ...stamps,
  });
  await qi.createTable('users', {
    id,
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: false },
    session_version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
    ...stamps,
  });
  await qi.createTable('memberships', {
    id,
    organisation_id: ref('organisations'),
    user_id: ref('users'),
    role: { type: DataTypes.ENUM('owner', 'staff', 'keeper'), allowNull: false },
    ...stamps,
  });
  await qi.addIndex('memberships', ['organisation_id', 'user_id'], {
    unique: true,
    name: 'memberships_org_user',
  });
  await qi.createTable('invitations', {
    id,
    organisation_id: ref('organisations'),
    email: { type: DataTypes.STRING(254), allowNull: false },
    role: { type: DataTypes.ENUM('owner', 'staff', 'keeper'), allowNull: false },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    invited_by_id: ref('users'),
    expires_at: { type: DataTypes.DATE, allowNull: false },
    accepted_at: { type: DataTypes.DATE, allowNull: true },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    ...stamps,
  });
  await qi.createTable('enclosures', {
    id,
    organisation_id: ref('organisations'),
    keeper_id: ref('users', 'RESTRICT'),
    name: { type: DataTypes.STRING(120), allowNull: false },
    width_cm: { type: DataTypes.FLOAT, allowNull: false },
    height_cm: { type: DataTypes.FLOAT, allowNull: false },
    depth_cm: { type: DataTypes.FLOAT, allowNull: false },
    species_name: { type: DataTypes.STRING(160), allowNull: true },
    animal_name: { type: DataTypes.STRING(120), allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    ...stamps,
  });
  await qi.addIndex('enclosures', ['organisation_id', 'keeper_id'], { name: 'enclosures_org_keeper' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('enclosures');
  await qi.dropTable('invitations');
  await qi.dropTable('memberships');
  await qi.dropTable('users');
  await qi.dropTable('organisations');
}
