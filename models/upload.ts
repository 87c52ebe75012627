import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export const UPLOAD_KINDS = ['backdrop', 'readings-csv'] as const;
export type UploadKind = (typeof UPLOAD_KINDS)[number];

/**
 * A file someone uploaded, kept in the object store under `storageKey` (never under public/).
 * `contentType` is what the bytes are (detected from their content), not what the browser claimed.
 */
export class Upload extends Model<InferAttributes<Upload>, InferCreationAttributes<Upload>> {
  declare id: CreationOptional<number>;
  declare kind: UploadKind;
  declare ownerId: number;
  declare organisationId: number;
  declare enclosureId: number | null;
  declare storageKey: string;
  declare contentType: string;
  declare sizeBytes: number;
  declare sha256: string;
  declare originalName: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    Upload.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        kind: { type: DataTypes.ENUM(...UPLOAD_KINDS), allowNull: false },
        ownerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        enclosureId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        storageKey: { type: DataTypes.STRING(200), allowNull: false },
        contentType: { type: DataTypes.STRING(60), allowNull: false },
        sizeBytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        sha256: { type: DataTypes.CHAR(64), allowNull: false },
        originalName: { type: DataTypes.STRING(200), allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'uploads' },
    );
  }
}
