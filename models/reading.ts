import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import {
  READING_THROUGH,
  READING_WARMED_UP,
  type ReadingThrough,
  type ReadingWarmedUp,
} from '@/shared/reading-setup';

export const READING_UNITS = ['uvb', 'uvi'] as const;
/** `uvb`: broadband UVB irradiance, µW/cm². `uvi`: UV Index (a UV Index meter). */
export type ReadingUnit = (typeof READING_UNITS)[number];

/** One meter reading of one lamp: taken directly below it, `distanceCm` away, stored in centimetres. */
export class Reading extends Model<InferAttributes<Reading>, InferCreationAttributes<Reading>> {
  declare id: CreationOptional<number>;
  declare lampId: number;
  declare takenAt: Date;
  declare distanceCm: number;
  declare value: number;
  /** The meter kind: a UV Index meter gives `uvi`, a broadband UVB meter `uvb`. */
  declare unit: ReadingUnit;
  declare through: CreationOptional<ReadingThrough>;
  /** Share of UVB passing what lay between (0–1]; null when nothing, not recorded, or not known (glass). */
  declare throughTransmission: CreationOptional<number | null>;
  declare warmedUp: CreationOptional<ReadingWarmedUp>;
  /** Which meter, in the keeper's own words (free text: its model, whose it is). */
  declare meter: CreationOptional<string | null>;
  declare takenById: number | null;
  declare note: CreationOptional<string | null>;
  /** The CSV upload it came from, if imported. */
  declare uploadId: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    Reading.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        lampId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        takenAt: { type: DataTypes.DATE, allowNull: false },
        distanceCm: { type: DataTypes.DOUBLE, allowNull: false },
        value: { type: DataTypes.DOUBLE, allowNull: false },
        unit: { type: DataTypes.ENUM(...READING_UNITS), allowNull: false },
        through: {
          type: DataTypes.ENUM(...READING_THROUGH),
          allowNull: false,
          defaultValue: 'not-recorded',
        },
        throughTransmission: { type: DataTypes.DOUBLE, allowNull: true },
        warmedUp: {
          type: DataTypes.ENUM(...READING_WARMED_UP),
          allowNull: false,
          defaultValue: 'not-recorded',
        },
        meter: { type: DataTypes.STRING(160), allowNull: true },
        takenById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        note: { type: DataTypes.TEXT, allowNull: true },
        uploadId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'readings' },
    );
  }
}
