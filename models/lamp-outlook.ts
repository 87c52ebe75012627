import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { Lamp } from './lamp';

/**
 * A lamp's outlook as last computed (lib/lamp-log/outlook-store.ts writes it): the status, the dates the
 * lamp log filters and sorts by, and the rest as JSON. It is current when `sourceVersion` equals the
 * lamp's `outlookVersion` and `asOf` is today; otherwise pages say the figures are being brought up to
 * date.
 */
export class LampOutlook extends Model<InferAttributes<LampOutlook>, InferCreationAttributes<LampOutlook>> {
  declare lampId: number;
  declare organisationId: number;
  declare label: string;
  declare enclosureName: string;
  declare firstUsedOn: string;
  declare status: string;
  declare statusRank: number;
  declare nextDueOn: string | null;
  declare testDueOn: string | null;
  declare replaceDueOn: string | null;
  declare fallsBelowOn: string | null;
  declare lastReadingAt: Date | null;
  declare remainingFraction: number | null;
  declare outlookJson: string;
  declare asOf: string;
  declare sourceVersion: number;
  declare computedAt: CreationOptional<Date>;
  declare lamp?: NonAttribute<Lamp>;

  static register(sequelize: Sequelize) {
    LampOutlook.init(
      {
        lampId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        label: { type: DataTypes.STRING(120), allowNull: false },
        enclosureName: { type: DataTypes.STRING(120), allowNull: false },
        firstUsedOn: { type: DataTypes.DATEONLY, allowNull: false },
        status: { type: DataTypes.STRING(16), allowNull: false },
        statusRank: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false },
        nextDueOn: { type: DataTypes.DATEONLY, allowNull: true },
        testDueOn: { type: DataTypes.DATEONLY, allowNull: true },
        replaceDueOn: { type: DataTypes.DATEONLY, allowNull: true },
        fallsBelowOn: { type: DataTypes.DATEONLY, allowNull: true },
        lastReadingAt: { type: DataTypes.DATE, allowNull: true },
        remainingFraction: { type: DataTypes.DOUBLE, allowNull: true },
        outlookJson: { type: DataTypes.TEXT('medium'), allowNull: false },
        asOf: { type: DataTypes.DATEONLY, allowNull: false },
        sourceVersion: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        computedAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'lamp_outlooks', timestamps: false },
    );
  }
}
