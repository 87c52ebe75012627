import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/**
 * A read-only public link to one variant. Only the SHA-256 of the token is stored, so a leaked
 * database does not leak working links; the token itself is shown once, when the link is created.
 */
export class ShareLink extends Model<InferAttributes<ShareLink>, InferCreationAttributes<ShareLink>> {
  declare id: CreationOptional<number>;
  declare variantId: number;
  declare tokenHash: string;
  declare expiresAt: Date | null;
  declare revokedAt: CreationOptional<Date | null>;
  declare createdById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    ShareLink.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        variantId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
        expiresAt: { type: DataTypes.DATE, allowNull: true },
        revokedAt: { type: DataTypes.DATE, allowNull: true },
        createdById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'share_links' },
    );
  }
}
