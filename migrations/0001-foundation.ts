import { DataTypes, type QueryInterface } from 'sequelize';
import { id, ref, stamps } from './columns';

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('organisations', {
    id: id(),
    name: { type: DataTypes.STRING(120), allowNull: false },
    ...stamps(),
  });
  await qi.createTable('users', {
    id: id(),
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: false },
    session_version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
    ...stamps(),
  });
  await qi.createTable('memberships', {
    id: id(),
    organisation_id: ref('organisations', 'CASCADE'),
    user_id: ref('users', 'CASCADE'),
    role: { type: DataTypes.ENUM('owner', 'staff', 'keeper'), allowNull: false },
    ...stamps(),
  });
  await qi.addIndex('memberships', ['organisation_id', 'user_id'], {
    unique: true,
    name: 'memberships_org_user',
  });
  await qi.createTable('invitations', {
    id: id(),
    organisation_id: ref('organisations', 'CASCADE'),
    email: { type: DataTypes.STRING(254), allowNull: false },
    role: { type: DataTypes.ENUM('owner', 'staff', 'keeper'), allowNull: false },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    invited_by_id: ref('users', 'CASCADE'),
    expires_at: { type: DataTypes.DATE, allowNull: false },
    accepted_at: { type: DataTypes.DATE, allowNull: true },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    ...stamps(),
  });
  await qi.createTable('enclosures', {
    id: id(),
    organisation_id: ref('organisations', 'CASCADE'),
    keeper_id: ref('users', 'RESTRICT'),
    name: { type: DataTypes.STRING(120), allowNull: false },
    width_cm: { type: DataTypes.FLOAT, allowNull: false },
    height_cm: { type: DataTypes.FLOAT, allowNull: false },
    depth_cm: { type: DataTypes.FLOAT, allowNull: false },
    species_name: { type: DataTypes.STRING(160), allowNull: true },
    animal_name: { type: DataTypes.STRING(120), allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    ...stamps(),
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
