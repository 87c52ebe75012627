import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A real enclosure of a keeper (a customer of the organisation, or the organisation's own animal). */
export class Enclosure extends Model<InferAttributes<Enclosure>, InferCreationAttributes<Enclosure>> {
  declare id: CreationOptional<number>;
  declare organisationId: number;
  declare keeperId: number;
  declare name: string;
  declare widthCm: number;
  declare heightCm: number;
  declare depthCm: number;
  declare speciesName: CreationOptional<string | null>;
  declare animalName: CreationOptional<string | null>;
  declare notes: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    Enclosure.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        keeperId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        widthCm: { type: DataTypes.DOUBLE, allowNull: false },
        heightCm: { type: DataTypes.DOUBLE, allowNull: false },
        depthCm: { type: DataTypes.DOUBLE, allowNull: false },
        speciesName: { type: DataTypes.STRING(160), allowNull: true },
        animalName: { type: DataTypes.STRING(120), allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'enclosures' },
    );
  }
}
