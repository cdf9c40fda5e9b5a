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

/** An analyst the memo's owner added as co-author: with the owner, they edit, submit and settle threads. */
export class MemoCoAuthor extends Model<InferAttributes<MemoCoAuthor>, InferCreationAttributes<MemoCoAuthor>> {
  declare id: CreationOptional<number>;
  declare memoId: ForeignKey<Memo['id']>;
  declare userId: ForeignKey<User['id']>;
  declare addedBy: ForeignKey<User['id']>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof MemoCoAuthor {
    MemoCoAuthor.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        memoId: { type: DataTypes.INTEGER, allowNull: false, field: 'memo_id' },
        userId: { type: DataTypes.INTEGER, allowNull: false, field: 'user_id' },
        addedBy: { type: DataTypes.INTEGER, allowNull: false, field: 'added_by' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'memo_co_authors', modelName: 'MemoCoAuthor', updatedAt: false },
    );
    return MemoCoAuthor;
  }
}
