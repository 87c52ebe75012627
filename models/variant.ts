import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/**
 * One alternative of a design. `designJson` is the design file (validated with the engine's parseDesign
 * before every write); `version` rises by one on every saved change so concurrent edits are caught.
 */
export class Variant extends Model<InferAttributes<Variant>, InferCreationAttributes<Variant>> {
  declare id: CreationOptional<number>;
  declare designId: number;
  declare name: string;
  declare designJson: string;
  declare version: CreationOptional<number>;
  declare createdById: number | null;
  declare updatedById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    Variant.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        designId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        designJson: { type: DataTypes.TEXT('long'), allowNull: false },
        version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
        createdById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        updatedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'variants' },
    );
  }
}
