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

/** A reviewer assigned to a memo; assigned reviewers may read and comment on it. */
export class MemoReviewer extends Model<InferAttributes<MemoReviewer>, InferCreationAttributes<MemoReviewer>> {
  declare id: CreationOptional<number>;
  declare memoId: ForeignKey<Memo['id']>;
  declare userId: ForeignKey<User['id']>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof MemoReviewer {
    MemoReviewer.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        memoId: { type: DataTypes.INTEGER, allowNull: false, field: 'memo_id' },
        userId: { type: DataTypes.INTEGER, allowNull: false, field: 'user_id' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'memo_reviewers', modelName: 'MemoReviewer', updatedAt: false },
    );
    return MemoReviewer;
  }
}
