import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** The issuing organisation printed in PDF front matter: one row, id 1 (see lib/organisation). */
export class OrganisationSetting extends Model<
  InferAttributes<OrganisationSetting>,
  InferCreationAttributes<OrganisationSetting>
> {
  declare id: number;
  declare name: string;
  declare distributionStatement: string;
  declare updatedBy: number | null;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof OrganisationSetting {
    OrganisationSetting.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true },
        name: { type: DataTypes.STRING(200), allowNull: false },
        distributionStatement: { type: DataTypes.TEXT, allowNull: false, field: 'distribution_statement' },
        updatedBy: { type: DataTypes.INTEGER, allowNull: true, field: 'updated_by' },
        updatedAt: { type: DataTypes.DATE, allowNull: false, field: 'updated_at' },
      },
      {
        sequelize,
        tableName: 'organisation_settings',
        modelName: 'OrganisationSetting',
        timestamps: true,
        createdAt: false,
      },
    );
    return OrganisationSetting;
  }
}
