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

/** A name given to a saved version; insert-only, the newest row of a version is its name. */
export class MemoVersionLabel extends Model<
  InferAttributes<MemoVersionLabel>,
  InferCreationAttributes<MemoVersionLabel>
> {
  declare id: CreationOptional<number>;
  declare memoId: ForeignKey<Memo['id']>;
  declare versionNumber: number;
  declare label: string;
  declare authorId: ForeignKey<User['id']>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof MemoVersionLabel {
    MemoVersionLabel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        memoId: { type: DataTypes.INTEGER, allowNull: false, field: 'memo_id' },
        versionNumber: { type: DataTypes.INTEGER, allowNull: false, field: 'version_number' },
        label: { type: DataTypes.STRING(80), allowNull: false },
        authorId: { type: DataTypes.INTEGER, allowNull: false, field: 'author_id' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'memo_version_labels', modelName: 'MemoVersionLabel', updatedAt: false },
    );
    return MemoVersionLabel;
  }
}
