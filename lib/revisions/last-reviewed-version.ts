import { Op } from 'sequelize';
import { AuditEvent, Comment, MemoVersion } from '@/models';

/** The version a person last reviewed, and what says so. */
export interface LastReviewed {
  versionNumber: number;
  /** What marks it: their verdict on it, or a comment written while it was the current version. */
  basis: 'decision' | 'comment';
  at: string;
}

const DECISION_ACTIONS = ['memo.approve', 'memo.request-changes'];

/**
 * The memo version a person last reviewed: the version their latest verdict
 * was given on (the audit trail records the version with every approve and
 * request-changes), or the version that was current when they last wrote a
 * comment or reply, whichever is later. Null when they have done neither
 * on this memo. The comparison view starts from it, so that a reviewer
 * sees what changed since they last looked.
 */
export async function lastReviewedVersion(userId: number, memoId: number): Promise<LastReviewed | null> {
  const [decision, comment] = await Promise.all([
    AuditEvent.findOne({
      where: { memoId, actorId: userId, action: { [Op.in]: DECISION_ACTIONS } },
      order: [['id', 'DESC']],
    }),
    Comment.findOne({
      where: { memoId, authorId: userId },
      order: [
        ['createdAt', 'DESC'],
        ['id', 'DESC'],
      ],
    }),
  ]);
  const decidedVersion = decision?.details?.version;
  const decided =
    decision && typeof decidedVersion === 'number'
      ? { versionNumber: decidedVersion, basis: 'decision' as const, at: new Date(decision.at) }
      : null;
  let commented: { versionNumber: number; basis: 'comment'; at: Date } | null = null;
  if (comment) {
    const at = new Date(comment.createdAt);
    const seen = await MemoVersion.findOne({
      where: { memoId, createdAt: { [Op.lte]: at } },
      order: [['versionNumber', 'DESC']],
      attributes: ['versionNumber'],
    });
    if (seen) commented = { versionNumber: seen.versionNumber, basis: 'comment', at };
  }
  const latest = decided && commented ? (decided.at >= commented.at ? decided : commented) : (decided ?? commented);
  return latest ? { versionNumber: latest.versionNumber, basis: latest.basis, at: latest.at.toISOString() } : null;
}
