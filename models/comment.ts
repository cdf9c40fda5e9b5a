import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
  type ForeignKey,
} from 'sequelize';
import { THREAD_STATUSES, type ThreadStatus } from '@/lib/comments/comment-status';
import type { CommentAnchor } from '@/lib/comments/comment-schema';
import type { Memo } from './memo';
import type { User } from './user';

/**
 * A review comment. A thread root has an anchor (the quoted text and its
 * context) and a status; a reply has a parent (the root) and neither.
 */
export class Comment extends Model<InferAttributes<Comment>, InferCreationAttributes<Comment>> {
  declare id: CreationOptional<number>;
  declare memoId: ForeignKey<Memo['id']>;
  declare parentId: ForeignKey<Comment['id']> | null;
  declare authorId: ForeignKey<User['id']>;
  declare body: string;
  declare anchor: CommentAnchor | null;
  declare status: ThreadStatus | null;
  declare resolvedBy: ForeignKey<User['id']> | null;
  declare resolvedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof Comment {
    Comment.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        memoId: { type: DataTypes.INTEGER, allowNull: false, field: 'memo_id' },
        parentId: { type: DataTypes.INTEGER, allowNull: true, field: 'parent_id' },
        authorId: { type: DataTypes.INTEGER, allowNull: false, field: 'author_id' },
        body: { type: DataTypes.TEXT, allowNull: false },
        anchor: { type: DataTypes.JSON, allowNull: true, field: 'anchor_json' },
        status: {
          type: DataTypes.STRING(20),
          allowNull: true,
          validate: { isIn: [THREAD_STATUSES as unknown as string[]] },
        },
        resolvedBy: { type: DataTypes.INTEGER, allowNull: true, field: 'resolved_by' },
        resolvedAt: { type: DataTypes.DATE, allowNull: true, field: 'resolved_at' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
        updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
      },
      { sequelize, tableName: 'comments', modelName: 'Comment' },
    );
    return Comment;
  }
}
