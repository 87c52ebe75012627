import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/**
 * A species sheet of one organisation: the light and heat a species needs, with where each figure comes
 * from. Ranges are stored as min/max pairs (°C, µW/cm², hours). `sourcesJson` is a JSON array of
 * `{ citation, confidence, covers }` (see lib/species/schema.ts). Owners and staff edit; keepers read.
 */
export class SpeciesSheet extends Model<
  InferAttributes<SpeciesSheet>,
  InferCreationAttributes<SpeciesSheet>
> {
  declare id: CreationOptional<number>;
  declare organisationId: number;
  declare commonName: string;
  declare scientificName: string;
  /** Ferguson et al. 2010 UV zone, 1..4. */
  declare uvZone: number;
  /** Optional basking-spot target for keepers with a broadband UVB meter, µW/cm². */
  declare uvbTargetMinUw: number | null;
  declare uvbTargetMaxUw: number | null;
  declare baskingSurfaceMinC: number;
  declare baskingSurfaceMaxC: number;
  declare warmAirMinC: number;
  declare warmAirMaxC: number;
  declare coolAirMinC: number;
  declare coolAirMaxC: number;
  declare nightMinC: number | null;
  declare photoperiodMinH: number | null;
  declare photoperiodMaxH: number | null;
  /** Adult total length, cm (sizes the shared basking spot). */
  declare adultLengthCm: number | null;
  /** Climbs walls and mesh: mesh undersides are reachable surfaces. */
  declare climbs: CreationOptional<boolean>;
  /** Albino or hypomelanistic: a lower UV target and a caution. */
  declare lowMelanin: CreationOptional<boolean>;
  declare notes: string | null;
  declare sourcesJson: string;
  /** The starting sheet this row was copied from (null: written by the organisation). */
  declare seedKey: string | null;
  declare createdById: number | null;
  declare updatedById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    SpeciesSheet.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        commonName: { type: DataTypes.STRING(120), allowNull: false },
        scientificName: { type: DataTypes.STRING(160), allowNull: false },
        uvZone: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false },
        uvbTargetMinUw: { type: DataTypes.DOUBLE, allowNull: true },
        uvbTargetMaxUw: { type: DataTypes.DOUBLE, allowNull: true },
        baskingSurfaceMinC: { type: DataTypes.DOUBLE, allowNull: false },
        baskingSurfaceMaxC: { type: DataTypes.DOUBLE, allowNull: false },
        warmAirMinC: { type: DataTypes.DOUBLE, allowNull: false },
        warmAirMaxC: { type: DataTypes.DOUBLE, allowNull: false },
        coolAirMinC: { type: DataTypes.DOUBLE, allowNull: false },
        coolAirMaxC: { type: DataTypes.DOUBLE, allowNull: false },
        nightMinC: { type: DataTypes.DOUBLE, allowNull: true },
        photoperiodMinH: { type: DataTypes.DOUBLE, allowNull: true },
        photoperiodMaxH: { type: DataTypes.DOUBLE, allowNull: true },
        adultLengthCm: { type: DataTypes.DOUBLE, allowNull: true },
        climbs: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        lowMelanin: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        notes: { type: DataTypes.TEXT, allowNull: true },
        sourcesJson: { type: DataTypes.TEXT, allowNull: false },
        seedKey: { type: DataTypes.STRING(60), allowNull: true },
        createdById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        updatedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'species_sheets' },
    );
  }
}
