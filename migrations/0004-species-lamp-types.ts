import { DataTypes, type QueryInterface } from 'sequelize';
import { author, id, ref, stamps } from './columns';

const float = (allowNull: boolean) => ({ type: DataTypes.FLOAT, allowNull });

const LAMP_TECHS = [
  't5',
  't8',
  'compact',
  'mercury-vapour',
  'metal-halide',
  'led-uvb',
  'halogen',
  'incandescent',
  'ceramic',
];

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('species_sheets', {
    id: id(),
    organisation_id: ref('organisations', 'CASCADE'),
    common_name: { type: DataTypes.STRING(120), allowNull: false },
    scientific_name: { type: DataTypes.STRING(160), allowNull: false },
    uv_zone: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false },
    uvb_target_min_uw: float(true),
    uvb_target_max_uw: float(true),
    basking_surface_min_c: float(false),
    basking_surface_max_c: float(false),
    warm_air_min_c: float(false),
    warm_air_max_c: float(false),
    cool_air_min_c: float(false),
    cool_air_max_c: float(false),
    night_min_c: float(true),
    photoperiod_min_h: float(true),
    photoperiod_max_h: float(true),
    notes: { type: DataTypes.TEXT, allowNull: true },
    sources_json: { type: DataTypes.TEXT, allowNull: false },
    seed_key: { type: DataTypes.STRING(60), allowNull: true },
    created_by_id: author(),
    updated_by_id: author(),
    ...stamps(),
  });
  await qi.addIndex('species_sheets', ['organisation_id', 'common_name'], {
    name: 'species_sheets_org_name',
  });
  // One copy of each starting sheet per organisation, so concurrent lazy seeding cannot duplicate it.
  await qi.addIndex('species_sheets', ['organisation_id', 'seed_key'], {
    unique: true,
    name: 'species_sheets_org_seed',
  });

  await qi.createTable('lamp_types', {
    id: id(),
    organisation_id: ref('organisations', 'CASCADE'),
    name: { type: DataTypes.STRING(120), allowNull: false },
    tech: { type: DataTypes.ENUM(...LAMP_TECHS), allowNull: false },
    form: { type: DataTypes.ENUM('tube', 'bulb'), allowNull: false },
    length_cm: float(true),
    uvb_at30: float(false),
    uvi_per_uvb: float(false),
    radiant_fraction: float(false),
    beam_deg: float(false),
    reflector_gain: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 1 },
    watts: float(false),
    half_life_months: float(true),
    decay_json: { type: DataTypes.TEXT, allowNull: true },
    replace_after_months: float(true),
    notes: { type: DataTypes.TEXT, allowNull: true },
    sources_json: { type: DataTypes.TEXT, allowNull: false },
    preset_key: { type: DataTypes.STRING(60), allowNull: true },
    created_by_id: author(),
    updated_by_id: author(),
    ...stamps(),
  });
  // Names are how people pick a lamp type: unique within an organisation.
  await qi.addIndex('lamp_types', ['organisation_id', 'name'], { unique: true, name: 'lamp_types_org_name' });
  await qi.addIndex('lamp_types', ['organisation_id', 'preset_key'], {
    unique: true,
    name: 'lamp_types_org_preset',
  });

  await qi.createTable('catalogue_seedings', {
    organisation_id: { ...ref('organisations', 'CASCADE'), primaryKey: true },
    seeded_at: { type: DataTypes.DATE, allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('catalogue_seedings');
  await qi.dropTable('lamp_types');
  await qi.dropTable('species_sheets');
}
