import { Op, Transaction } from 'sequelize';
import { db, Memo, MemoReviewer, ReviewDecision, User } from '@/models';
import { badRequest } from '@/lib/api/errors';
import type { Actor, MemoAction } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { loadMemoFor, toMemoDetail } from '@/lib/memos/load-memo';
import type { MemoDetail } from '@/lib/memos/memo-record';
import { freezeMemo } from '@/lib/revisions/freeze-memo';
import { notifyTransition } from '@/lib/notifications/notify-transition';
import { sendNotificationMails } from '@/lib/notifications/send-notification-mails';
import type { RevisionSummary } from '@/lib/revisions/revision-record';
import { transitionInputSchema, type TransitionInput } from './transition-schema';
import { documentIndex } from '@/lib/documents/model/document-index';
import { evaluateDocumentJob } from '@/lib/jobs/evaluate-document-job';
import { requirementWarnings } from '@/lib/requirements/requirement-warnings';

const PERMISSION: Record<TransitionInput['action'], MemoAction> = {
  submit: 'memo.submit',
  approve: 'memo.decide',
  'request-changes': 'memo.decide',
  freeze: 'memo.freeze',
  reopen: 'memo.reopen',
};

/**
 * Moves a memo through Draft → In review → Approved → Frozen (and back to
 * Draft on requested changes or a reopen). The permissions module refuses
 * the wrong role (403) and the wrong state (409, with the reason).
 * Submit and freeze answer `warnings`: each requirement of the memo not met
 * or undecided (the workflow panel shows them before the action as well).
 */
export async function transitionMemo(actor: Actor, memoId: number, input: TransitionInput): Promise<{ memo: MemoDetail; revision?: RevisionSummary; warnings: string[] }> {
  const t = transitionInputSchema.parse(input);
  if (t.action === 'freeze') {
    const { revision, warnings } = await freezeMemo(actor, memoId, t.changeSummary);
    const sequelize = await db();
    // Its own short transaction after the freeze's (which renders the PDF); the mail goes after this one commits.
    // The revision stands either way: a failure to record the notes is logged, never reported as a failed freeze.
    try {
      const queued = await sequelize.transaction(async (transaction) => {
        const frozen = await Memo.findByPk(memoId, { rejectOnEmpty: true, transaction });
        return notifyTransition({ memo: frozen, kind: 'frozen', actorId: actor.id, note: t.changeSummary, revisionLetter: revision.letter, transaction });
      });
      sendNotificationMails(queued);
    } catch (err) {
      console.error(`[nodewright] revision ${revision.letter} of memo ${memoId} is frozen, but its notifications could not be recorded`, err);
    }
    const { memo, facts } = await loadMemoFor(actor, memoId, 'memo.view');
    return { memo: await toMemoDetail(actor, memo, facts), revision, warnings };
  }
  // Requirements are checked before the transaction (the evaluation may run in the worker pool), only for a memo that states some.
  let warnings: string[] = [];
  if (t.action === 'submit') {
    const { memo } = await loadMemoFor(actor, memoId, PERMISSION.submit);
    if (documentIndex(memo.content).requirements.length > 0) warnings = requirementWarnings(memo.content, await evaluateDocumentJob(actor.id, memo.content));
  }
  const sequelize = await db();
  let queued: number[] = [];
  const moved = await sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const { memo } = await loadMemoFor(actor, memoId, PERMISSION[t.action], transaction);
    const audit = (action: Parameters<typeof recordAudit>[0]['action'], details: Record<string, unknown>) =>
      recordAudit({ actor, action, memoId, details: { version: memo.version, ...details } }, transaction);

    switch (t.action) {
      case 'submit': {
        const ids = [...new Set(t.reviewerIds)];
        const reviewers = await User.findAll({ where: { id: { [Op.in]: ids }, role: 'reviewer', active: true }, transaction });
        if (reviewers.length !== ids.length) {
          const missing = ids.filter((id) => !reviewers.some((r) => r.id === id));
          throw badRequest(`Not an active reviewer: ${missing.join(', ')}.`, { reviewerIds: `not an active reviewer: ${missing.join(', ')}` });
        }
        await MemoReviewer.destroy({ where: { memoId }, transaction });
        for (const r of reviewers) await MemoReviewer.create({ memoId, userId: r.id }, { transaction });
        await memo.update({ status: 'in-review', reviewRound: memo.reviewRound + 1, submittedAt: new Date() }, { transaction });
        await audit('memo.submit', { reviewers: reviewers.map((r) => r.name), note: t.note ?? null, ...(warnings.length ? { requirementWarnings: warnings } : {}) });
        queued = await notifyTransition({ memo, kind: 'submitted', actorId: actor.id, note: t.note || null, transaction });
        break;
      }
      case 'approve':
      case 'request-changes': {
        await ReviewDecision.create({ memoId, reviewerId: actor.id, round: memo.reviewRound, decision: t.action, note: t.note ?? null }, { transaction });
        if (t.action === 'request-changes') {
          await memo.update({ status: 'draft' }, { transaction });
          queued = await notifyTransition({ memo, kind: 'changes-requested', actorId: actor.id, note: t.note, transaction });
        } else {
          // Approved once every assigned reviewer's latest decision in this round is an approval.
          const assigned = await MemoReviewer.findAll({ where: { memoId }, transaction });
          const decisions = await ReviewDecision.findAll({ where: { memoId, round: memo.reviewRound }, order: [['id', 'ASC']], transaction });
          const latest = new Map(decisions.map((d) => [d.reviewerId, d.decision]));
          if (assigned.every((a) => latest.get(a.userId) === 'approve')) {
            await memo.update({ status: 'approved' }, { transaction });
            queued = await notifyTransition({ memo, kind: 'approved', actorId: actor.id, note: t.note || null, transaction });
          }
        }
        await audit(t.action === 'approve' ? 'memo.approve' : 'memo.request-changes', { note: t.note ?? null, round: memo.reviewRound });
        break;
      }
      case 'reopen':
        await memo.update({ status: 'draft' }, { transaction });
        await audit('memo.reopen', { note: t.note ?? null });
        break;
    }
    const fresh = await loadMemoFor(actor, memoId, 'memo.view', transaction);
    return { memo: await toMemoDetail(actor, fresh.memo, fresh.facts), warnings };
  });
  sendNotificationMails(queued);
  return moved;
}

/** For messages: the decision history of the current round. */
export async function roundDecisions(memoId: number, round: number) {
  const rows = await ReviewDecision.findAll({ where: { memoId, round }, order: [['id', 'ASC']] });
  if (rows.length === 0) return [];
  const users = await User.findAll({ where: { id: [...new Set(rows.map((r) => r.reviewerId))] } });
  const name = new Map(users.map((u) => [u.id, u.name]));
  return rows.map((r) => ({ reviewer: name.get(r.reviewerId) ?? `user ${r.reviewerId}`, decision: r.decision, note: r.note, at: new Date(r.createdAt).toISOString() }));
}

