import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export const REMINDER_KINDS = ['test', 'replace'] as const;
export type ReminderKind = (typeof REMINDER_KINDS)[number];

/**
 * "This lamp's due date was announced": one row per (lamp, kind, due date), unique, written in the same
 * transaction as the outbox message that announces it. One e-mail groups a keeper's due lamps, so the
 * per-lamp "never twice for the same due date" lives here rather than in the message's own key.
 */
export class LampReminder extends Model<
  InferAttributes<LampReminder>,
  InferCreationAttributes<LampReminder>
> {
  declare id: CreationOptional<number>;
  declare lampId: number;
  declare kind: ReminderKind;
  declare dueOn: string;
  /** `lamp:<id>:due:<date>:<kind>` — the same key shown in the message, for tracing. */
  declare dedupeKey: string;
  declare mailMessageId: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    LampReminder.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        lampId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        kind: { type: DataTypes.ENUM(...REMINDER_KINDS), allowNull: false },
        dueOn: { type: DataTypes.DATEONLY, allowNull: false },
        dedupeKey: { type: DataTypes.STRING(191), allowNull: false, unique: true },
        mailMessageId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'lamp_reminders' },
    );
  }
}
