import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** What an e-mailed single-use link does: choose a new password, or confirm a new account's address. */
export const LINK_PURPOSES = ['password-reset', 'confirm-account'] as const;
export type LinkPurpose = (typeof LINK_PURPOSES)[number];

/** An e-mailed single-use link: what it is for, the hash of its token, when it lapses, when it was used. */
export class AccountLink extends Model<InferAttributes<AccountLink>, InferCreationAttributes<AccountLink>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare purpose: LinkPurpose;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    AccountLink.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        purpose: { type: DataTypes.STRING(20), allowNull: false },
        tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        usedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'account_links', updatedAt: false },
    );
  }
}
