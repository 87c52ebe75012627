import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A session that was signed out: its cookie is refused until it would have expired anyway. */
export class EndedSession extends Model<
  InferAttributes<EndedSession>,
  InferCreationAttributes<EndedSession>
> {
  declare sid: string;
  declare userId: number;
  declare expiresAt: Date;
  declare createdAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    EndedSession.init(
      {
        sid: { type: DataTypes.STRING(64), allowNull: false, primaryKey: true },
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'ended_sessions', updatedAt: false },
    );
  }
}
