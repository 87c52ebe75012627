import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A shop, zoo, rescue or household: the unit that owns people, enclosures and catalogues. */
export class Organisation extends Model<
  InferAttributes<Organisation>,
  InferCreationAttributes<Organisation>
> {
  declare id: CreationOptional<number>;
  declare name: string;
  /** Invented example data (the demo): every page and report showing its lamps and readings says so. */
  declare exampleData: CreationOptional<boolean>;
  /** How customers reach the shop (each optional): shown on test slips and in e-mails to customers. */
  declare contactPhone: CreationOptional<string | null>;
  declare contactEmail: CreationOptional<string | null>;
  declare contactAddress: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    Organisation.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        exampleData: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        contactPhone: { type: DataTypes.STRING(40), allowNull: true },
        contactEmail: { type: DataTypes.STRING(254), allowNull: true },
        contactAddress: { type: DataTypes.STRING(200), allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'organisations' },
    );
  }
}
