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
import type { Revision } from './revision';
import type { User } from './user';

/** One release of a frozen revision to some customer contacts, with its cover note. */
export class Release extends Model<InferAttributes<Release>, InferCreationAttributes<Release>> {
  declare id: CreationOptional<number>;
  declare memoId: ForeignKey<Memo['id']>;
  declare revisionId: ForeignKey<Revision['id']>;
  declare coverNote: string;
  declare releasedBy: ForeignKey<User['id']>;
  declare releasedAt: Date;

  static initModel(sequelize: Sequelize): typeof Release {
    Release.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        memoId: { type: DataTypes.INTEGER, allowNull: false, field: 'memo_id' },
        revisionId: { type: DataTypes.INTEGER, allowNull: false, field: 'revision_id' },
        coverNote: { type: DataTypes.TEXT, allowNull: false, field: 'cover_note' },
        releasedBy: { type: DataTypes.INTEGER, allowNull: false, field: 'released_by' },
        releasedAt: { type: DataTypes.DATE, allowNull: false, field: 'released_at' },
      },
      { sequelize, tableName: 'releases', modelName: 'Release', timestamps: false },
    );
    return Release;
  }
}
