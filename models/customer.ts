import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/**
 * A person whose lamps the shop tests at its counter. Personal data (name, e-mail, phone, notes) are the
 * organisation's alone; keepers never see them. Consent to reminder e-mails is kept with its date, and
 * when it was withdrawn.
 */
export class Customer extends Model<InferAttributes<Customer>, InferCreationAttributes<Customer>> {
  declare id: CreationOptional<number>;
  declare organisationId: number;
  declare name: string;
  declare email: CreationOptional<string | null>;
  declare phone: CreationOptional<string | null>;
  declare notes: CreationOptional<string | null>;
  declare reminderConsentAt: CreationOptional<Date | null>;
  declare reminderConsentWithdrawnAt: CreationOptional<Date | null>;
  /** The keeper account this customer became (a member with the keeper role), if linked. */
  declare keeperUserId: CreationOptional<number | null>;
  declare createdById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    Customer.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        email: { type: DataTypes.STRING(254), allowNull: true },
        phone: { type: DataTypes.STRING(40), allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: true },
        reminderConsentAt: { type: DataTypes.DATE, allowNull: true },
        reminderConsentWithdrawnAt: { type: DataTypes.DATE, allowNull: true },
        keeperUserId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        createdById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'customers' },
    );
  }
}
