import { Op, type Transaction } from 'sequelize';
import { Notification, NotificationSetting, User, type Memo } from '@/models';
import { decideMemo } from '@/lib/auth/permissions';
import { loadMemoFacts } from '@/lib/memos/load-memo';
import type { WorkflowNotificationKind } from './notification-kinds';

type Audience = 'owner' | 'authors' | 'reviewers' | 'config-managers';

/** Who is told of each transition. */
export const AUDIENCE: Record<WorkflowNotificationKind, readonly Audience[]> = {
  submitted: ['reviewers'],
  'changes-requested': ['authors'],
  approved: ['authors', 'config-managers'],
  frozen: ['authors', 'reviewers'],
  released: ['owner'],
};

/**
 * Records, in the transition's own transaction, one notification per person
 * concerned (never the person who acted, only active people who may see the
 * memo as it now stands), with the note. Each is marked for e-mail unless
 * the person switched that kind off. Returns the ids whose e-mail is queued:
 * the caller sends them after the commit (`sendNotificationMails`), never
 * inside the transaction.
 */
export async function notifyTransition(args: {
  memo: Memo;
  kind: WorkflowNotificationKind;
  actorId: number;
  note: string | null;
  revisionLetter?: string;
  transaction: Transaction;
}): Promise<number[]> {
  const { memo, kind, actorId, note, revisionLetter, transaction } = args;
  const facts = await loadMemoFacts(memo, transaction);
  const ids = new Set<number>();
  for (const audience of AUDIENCE[kind]) {
    if (audience === 'owner') ids.add(facts.ownerId);
    if (audience === 'authors') for (const id of [facts.ownerId, ...facts.coAuthorIds]) ids.add(id);
    if (audience === 'reviewers') for (const id of facts.reviewerIds) ids.add(id);
    if (audience === 'config-managers')
      for (const u of await User.findAll({
        where: { role: 'config-manager', active: true },
        attributes: ['id'],
        transaction,
      }))
        ids.add(u.id);
  }
  ids.delete(actorId);
  if (ids.size === 0) return [];
  const people = await User.findAll({ where: { id: { [Op.in]: [...ids] }, active: true }, transaction });
  const recipients = people
    .filter((u) => decideMemo({ id: u.id, role: u.role, name: u.name, email: u.email }, 'memo.view', facts).allowed)
    .map((u) => u.id)
    .sort((a, b) => a - b);
  if (recipients.length === 0) return [];
  const off = new Set(
    (
      await NotificationSetting.findAll({
        where: { userId: { [Op.in]: recipients }, kind, email: false },
        attributes: ['userId'],
        transaction,
      })
    ).map((s) => s.userId),
  );
  const rows = await Notification.bulkCreate(
    recipients.map((userId) => ({
      userId,
      memoId: memo.id,
      commentId: null,
      actorId,
      kind,
      note,
      revisionLetter: revisionLetter ?? null,
      readAt: null,
      mailStatus: off.has(userId) ? null : ('queued' as const),
    })),
    { transaction },
  );
  return rows.filter((r) => r.mailStatus === 'queued').map((r) => r.id);
}
