import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/**
 * A lamp installed in one enclosure: which catalogue lamp type it is, when it was first switched on and
 * for how many hours a day it runs, so its age in use is known. `designObjectId` links it to the lamp
 * object of that id in the enclosure's designs (for calibration). A retired lamp keeps its readings.
 */
export class Lamp extends Model<InferAttributes<Lamp>, InferCreationAttributes<Lamp>> {
  declare id: CreationOptional<number>;
  declare enclosureId: number;
  declare lampTypeId: number;
  /** What the keeper calls it ("basking tube", "left spot"). */
  declare label: string;
  declare designObjectId: CreationOptional<string | null>;
  /** Date of first use (YYYY-MM-DD). */
  declare firstUsedOn: string;
  declare hoursPerDay: number;
  /** Distance from the lamp to the basking spot, cm; null: use the distance of the latest reading. */
  declare baskingDistanceCm: CreationOptional<number | null>;
  /** Share of UVB passing what lies between lamp and basking spot (a mesh lid ≈ 0.5–0.7); null: nothing. */
  declare baskingTransmission: CreationOptional<number | null>;
  declare retiredOn: CreationOptional<string | null>;
  declare notes: CreationOptional<string | null>;
  declare createdById: number | null;
  /** Counts changes to what the lamp's outlook is computed from (models/outlook-invalidation.ts). */
  declare outlookVersion: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    Lamp.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        enclosureId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        lampTypeId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        label: { type: DataTypes.STRING(120), allowNull: false },
        designObjectId: { type: DataTypes.STRING(100), allowNull: true },
        firstUsedOn: { type: DataTypes.DATEONLY, allowNull: false },
        hoursPerDay: { type: DataTypes.DOUBLE, allowNull: false },
        baskingDistanceCm: { type: DataTypes.DOUBLE, allowNull: true },
        baskingTransmission: { type: DataTypes.DOUBLE, allowNull: true },
        retiredOn: { type: DataTypes.DATEONLY, allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: true },
        createdById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        outlookVersion: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'lamps' },
    );
  }
}
