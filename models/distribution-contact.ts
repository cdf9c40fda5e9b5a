import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
  type ForeignKey,
} from 'sequelize';
import type { Memo } from './memo';
import type { User } from './user';

/** A customer contact on a memo's distribution list. */
export class DistributionContact extends Model<
  InferAttributes<DistributionContact>,
  InferCreationAttributes<DistributionContact>
> {
  declare id: CreationOptional<number>;
  declare memoId: ForeignKey<Memo['id']>;
  declare userId: ForeignKey<User['id']>;
  declare addedBy: ForeignKey<User['id']>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof DistributionContact {
    DistributionContact.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        memoId: { type: DataTypes.INTEGER, allowNull: false, field: 'memo_id' },
        userId: { type: DataTypes.INTEGER, allowNull: false, field: 'user_id' },
        addedBy: { type: DataTypes.INTEGER, allowNull: false, field: 'added_by' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'distribution_contacts', modelName: 'DistributionContact', updatedAt: false },
    );
    return DistributionContact;
  }
}
