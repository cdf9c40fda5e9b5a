import type { Sequelize } from 'sequelize';
import { connectDatabase, getSequelize } from '@/lib/db/connection';
import { watchSessionTables } from '@/lib/sessions/watch-session-tables';
import { User } from './user';
import { Memo } from './memo';
import { MemoVersion } from './memo-version';
import { MemoReviewer } from './memo-reviewer';
import { MemoCoAuthor } from './memo-co-author';
import { Attachment } from './attachment';
import { Comment } from './comment';
import { Notification } from './notification';
import { NotificationSetting } from './notification-setting';
import { ReviewDecision } from './review-decision';
import { Revision } from './revision';
import { AuditEvent } from './audit-event';
import { DistributionContact } from './distribution-contact';
import { Release } from './release';
import { Delivery } from './delivery';
import { AccessToken } from './access-token';
import { OutboxMessage } from './outbox-message';
import { OutboxAttachment } from './outbox-attachment';
import { RateLimitCounter } from './rate-limit-counter';
import { AuthSession } from './auth-session';
import { AccountMessage } from './account-message';
import { Signature } from './signature';
import { WorkLease } from './work-lease';
import { OrganisationSetting } from './organisation-setting';
import { MemoVersionLabel } from './memo-version-label';

export {
  User,
  Memo,
  MemoVersion,
  MemoReviewer,
  MemoCoAuthor,
  Attachment,
  Comment,
  Notification,
  NotificationSetting,
  ReviewDecision,
  Revision,
  AuditEvent,
  DistributionContact,
  Release,
  Delivery,
  AccessToken,
  OutboxMessage,
  OutboxAttachment,
  RateLimitCounter,
  AuthSession,
  AccountMessage,
  Signature,
};
export { WorkLease };
export { OrganisationSetting };
export { MemoVersionLabel };

let initialisedFor: Sequelize | undefined;

/**
 * Initialises every model and association against the shared Sequelize
 * instance, once per copy of this module (Next may load one copy per route).
 */
export function initModels(sequelize: Sequelize = getSequelize()): Sequelize {
  if (initialisedFor === sequelize) return sequelize;
  User.initModel(sequelize);
  Memo.initModel(sequelize);
  MemoVersion.initModel(sequelize);
  MemoReviewer.initModel(sequelize);
  MemoCoAuthor.initModel(sequelize);
  Attachment.initModel(sequelize);
  Comment.initModel(sequelize);
  Notification.initModel(sequelize);
  NotificationSetting.initModel(sequelize);
  ReviewDecision.initModel(sequelize);
  Revision.initModel(sequelize);
  AuditEvent.initModel(sequelize);
  DistributionContact.initModel(sequelize);
  Release.initModel(sequelize);
  Delivery.initModel(sequelize);
  AccessToken.initModel(sequelize);
  OutboxMessage.initModel(sequelize);
  OutboxAttachment.initModel(sequelize);
  RateLimitCounter.initModel(sequelize);
  AuthSession.initModel(sequelize);
  AccountMessage.initModel(sequelize);
  Signature.initModel(sequelize);
  WorkLease.initModel(sequelize);
  OrganisationSetting.initModel(sequelize);
  MemoVersionLabel.initModel(sequelize);

  Memo.belongsTo(User, { as: 'owner', foreignKey: 'ownerId' });
  User.hasMany(Memo, { as: 'ownedMemos', foreignKey: 'ownerId' });
  MemoVersion.belongsTo(Memo, { foreignKey: 'memoId' });
  Memo.hasMany(MemoVersion, { as: 'versions', foreignKey: 'memoId' });
  MemoVersion.belongsTo(User, { as: 'author', foreignKey: 'authorId' });
  MemoReviewer.belongsTo(Memo, { foreignKey: 'memoId' });
  MemoReviewer.belongsTo(User, { as: 'reviewer', foreignKey: 'userId' });
  Memo.hasMany(MemoReviewer, { as: 'reviewerLinks', foreignKey: 'memoId' });
  MemoCoAuthor.belongsTo(Memo, { foreignKey: 'memoId' });
  Memo.hasMany(MemoCoAuthor, { as: 'coAuthorLinks', foreignKey: 'memoId' });
  Attachment.belongsTo(Memo, { foreignKey: 'memoId' });
  Comment.belongsTo(Memo, { foreignKey: 'memoId' });
  Comment.belongsTo(User, { as: 'author', foreignKey: 'authorId' });
  Comment.hasMany(Comment, { as: 'replies', foreignKey: 'parentId' });
  Notification.belongsTo(Comment, { foreignKey: 'commentId' });

  // Who a session is depends on these two tables: a change to either forgets the sessions the process remembers.
  watchSessionTables([User, AuthSession] as unknown as Parameters<typeof watchSessionTables>[0]);
  initialisedFor = sequelize;
  return sequelize;
}

/** Connected database with models ready: call at the top of every server entry point. */
export async function db(): Promise<Sequelize> {
  const sequelize = await connectDatabase();
  return initModels(sequelize);
}
