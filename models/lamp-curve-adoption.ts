import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/**
 * One adoption of a shop's measured decay curve for one of its lamp types, with who adopted it and when,
 * the fit as it was then (`fitJson`, frozen), and who withdrew it and when (null while in force).
 */
export class LampCurveAdoption extends Model<
  InferAttributes<LampCurveAdoption>,
  InferCreationAttributes<LampCurveAdoption>
> {
  declare id: CreationOptional<number>;
  declare organisationId: number;
  declare lampTypeId: number;
  declare lamps: number;
  declare readings: number;
  declare fitJson: string;
  declare adoptedById: number | null;
  declare adoptedAt: Date;
  declare withdrawnById: CreationOptional<number | null>;
  declare withdrawnAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    LampCurveAdoption.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        lampTypeId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        lamps: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        readings: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        fitJson: { type: DataTypes.TEXT, allowNull: false },
        adoptedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        adoptedAt: { type: DataTypes.DATE, allowNull: false },
        withdrawnById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        withdrawnAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'lamp_curve_adoptions' },
    );
  }
}
