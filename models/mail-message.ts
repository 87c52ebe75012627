import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export const MAIL_STATUSES = ['queued', 'sent', 'failed'] as const;
export type MailStatus = (typeof MAIL_STATUSES)[number];

/**
 * The outbox: every e-mail the product sends is first written here (in the same transaction as the
 * decision to send it), then delivered. `dedupeKey` is unique, so the same message can never be queued
 * twice; a failed delivery keeps its attempts and last error and is retried on the next run.
 */
export class MailMessage extends Model<InferAttributes<MailMessage>, InferCreationAttributes<MailMessage>> {
  declare id: CreationOptional<number>;
  declare kind: string;
  declare toEmail: string;
  declare toUserId: number | null;
  /** The organisation the message concerns (its owner sees undelivered ones); null for sign-up mail. */
  declare organisationId: CreationOptional<number | null>;
  declare subject: string;
  declare body: string;
  declare dedupeKey: string;
  declare status: CreationOptional<MailStatus>;
  declare attempts: CreationOptional<number>;
  declare lastError: CreationOptional<string | null>;
  declare sentAt: CreationOptional<Date | null>;
  /** A failed delivery is not retried before this (back-off); null: as soon as possible. */
  declare nextAttemptAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    MailMessage.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        kind: { type: DataTypes.STRING(40), allowNull: false },
        toEmail: { type: DataTypes.STRING(254), allowNull: false },
        toUserId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        subject: { type: DataTypes.STRING(250), allowNull: false },
        // MEDIUMTEXT: room for any message the composers write (theirs are bounded far below it).
        body: { type: DataTypes.TEXT('medium'), allowNull: false },
        dedupeKey: { type: DataTypes.STRING(191), allowNull: false, unique: true },
        status: { type: DataTypes.ENUM(...MAIL_STATUSES), allowNull: false, defaultValue: 'queued' },
        attempts: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        lastError: { type: DataTypes.TEXT, allowNull: true },
        sentAt: { type: DataTypes.DATE, allowNull: true },
        nextAttemptAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'mail_messages' },
    );
  }
}
