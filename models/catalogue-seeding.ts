import {
  DataTypes,
  Model,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/**
 * Marks that an organisation received the starting species sheets and lamp types, so entries it deleted
 * on purpose are not brought back by lazy seeding.
 */
export class CatalogueSeeding extends Model<
  InferAttributes<CatalogueSeeding>,
  InferCreationAttributes<CatalogueSeeding>
> {
  declare organisationId: number;
  declare seededAt: Date;

  static register(sequelize: Sequelize) {
    CatalogueSeeding.init(
      {
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
        seededAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, tableName: 'catalogue_seedings', timestamps: false },
    );
  }
}
