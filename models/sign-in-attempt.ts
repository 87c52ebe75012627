import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A counter of failed sign-ins for one account or one client address within a time window. */
export class SignInAttempt extends Model<
  InferAttributes<SignInAttempt>,
  InferCreationAttributes<SignInAttempt>
> {
  declare id: CreationOptional<number>;
  declare key: string;
  declare windowStart: Date;
  declare count: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    SignInAttempt.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        key: { type: DataTypes.STRING(100), allowNull: false, unique: true },
        windowStart: { type: DataTypes.DATE, allowNull: false },
        count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'sign_in_attempts' },
    );
  }
}
