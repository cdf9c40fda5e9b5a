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
import { DEFAULT_MEANING } from '@/lib/signatures/signature-meaning';
import { recordSignature } from '@/lib/signatures/record-signature';
import { verifySigningPassword } from '@/lib/signatures/verify-signing-password';
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

/** Where the request came from: the client address the password throttle counts against. */
export interface TransitionContext {
  clientAddress: string;
}

/**
 * Moves a memo through Draft → In review → Approved → Frozen (and back to
 * Draft on requested changes or a reopen). The permissions module refuses
 * the wrong role (403) and the wrong state (409, with the reason).
 * Submit and freeze answer `warnings`: each requirement of the memo not met
 * or undecided (the workflow panel shows them before the action as well).
 *
 * Approve, request changes and freeze are electronic signatures: after the
 * permission check and before anything is written, the signer's password is
 * checked again (401 when missing or wrong, counted by the sign-in throttle;
 * 429 while throttled), and the signature — printed name, role, meaning,
 * UTC time — is stored in the transaction of the transition it signs.
 */
export async function transitionMemo(
  actor: Actor,
  memoId: number,
  input: TransitionInput,
  context: TransitionContext,
): Promise<{ memo: MemoDetail; revision?: RevisionSummary; warnings: string[] }> {
  const t = transitionInputSchema.parse(input);
  if (t.action === 'approve' || t.action === 'request-changes' || t.action === 'freeze') {
    // Refusals of role and state come first, so that a password is never asked for (or counted) for an action that cannot happen.
    await loadMemoFor(actor, memoId, PERMISSION[t.action]);
    await verifySigningPassword(actor, t.password, context.clientAddress, memoId);
  }
  if (t.action === 'freeze') {
    const { revision, warnings } = await freezeMemo(
      actor,
      memoId,
      t.changeSummary,
      t.meaning ?? DEFAULT_MEANING.freeze,
    );
    const sequelize = await db();
    // Its own short transaction after the freeze's (which renders the PDF); the mail goes after this one commits.
    // The revision stands either way: a failure to record the notes is logged, never reported as a failed freeze.
    try {
      const queued = await sequelize.transaction(async (transaction) => {
        const frozen = await Memo.findByPk(memoId, { rejectOnEmpty: true, transaction });
        return notifyTransition({
          memo: frozen,
          kind: 'frozen',
          actorId: actor.id,
          note: t.changeSummary,
          revisionLetter: revision.letter,
          transaction,
        });
      });
      sendNotificationMails(queued);
    } catch (err) {
      console.error(
        `[nodewright] revision ${revision.letter} of memo ${memoId} is frozen, but its notifications could not be recorded`,
        err,
      );
    }
    const { memo, facts } = await loadMemoFor(actor, memoId, 'memo.view');
    return { memo: await toMemoDetail(actor, memo, facts), revision, warnings };
  }
  // Requirements are checked before the transaction (the evaluation may run in the worker pool), only for a memo that states some.
  let warnings: string[] = [];
  if (t.action === 'submit') {
    const { memo } = await loadMemoFor(actor, memoId, PERMISSION.submit);
    if (documentIndex(memo.content).requirements.length > 0)
      warnings = requirementWarnings(memo.content, await evaluateDocumentJob(actor.id, memo.content));
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
        const reviewers = await User.findAll({
          where: { id: { [Op.in]: ids }, role: 'reviewer', active: true },
          transaction,
        });
        if (reviewers.length !== ids.length) {
          const missing = ids.filter((id) => !reviewers.some((r) => r.id === id));
          throw badRequest(`Not an active reviewer: ${missing.join(', ')}.`, {
            reviewerIds: `not an active reviewer: ${missing.join(', ')}`,
          });
        }
        await MemoReviewer.destroy({ where: { memoId }, transaction });
        for (const r of reviewers) await MemoReviewer.create({ memoId, userId: r.id }, { transaction });
        await memo.update(
          { status: 'in-review', reviewRound: memo.reviewRound + 1, submittedAt: new Date() },
          { transaction },
        );
        await audit('memo.submit', {
          reviewers: reviewers.map((r) => r.name),
          note: t.note ?? null,
          ...(warnings.length ? { requirementWarnings: warnings } : {}),
        });
        queued = await notifyTransition({
          memo,
          kind: 'submitted',
          actorId: actor.id,
          note: t.note || null,
          transaction,
        });
        break;
      }
      case 'approve':
      case 'request-changes': {
        await ReviewDecision.create(
          { memoId, reviewerId: actor.id, round: memo.reviewRound, decision: t.action, note: t.note ?? null },
          { transaction },
        );
        const meaning = t.meaning ?? DEFAULT_MEANING[t.action];
        await recordSignature(
          { actor, memoId, action: t.action, meaning, memoVersion: memo.version, reviewRound: memo.reviewRound },
          transaction,
        );
        if (t.action === 'request-changes') {
          await memo.update({ status: 'draft' }, { transaction });
          queued = await notifyTransition({
            memo,
            kind: 'changes-requested',
            actorId: actor.id,
            note: t.note,
            transaction,
          });
        } else {
          // Approved once every assigned reviewer's latest decision in this round is an approval.
          const assigned = await MemoReviewer.findAll({ where: { memoId }, transaction });
          const decisions = await ReviewDecision.findAll({
            where: { memoId, round: memo.reviewRound },
            order: [['id', 'ASC']],
            transaction,
          });
          const latest = new Map(decisions.map((d) => [d.reviewerId, d.decision]));
          if (assigned.every((a) => latest.get(a.userId) === 'approve')) {
            await memo.update({ status: 'approved' }, { transaction });
            queued = await notifyTransition({
              memo,
              kind: 'approved',
              actorId: actor.id,
              note: t.note || null,
              transaction,
            });
          }
        }
        await audit(t.action === 'approve' ? 'memo.approve' : 'memo.request-changes', {
          note: t.note ?? null,
          round: memo.reviewRound,
          meaning,
        });
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
  return rows.map((r) => ({
    reviewer: name.get(r.reviewerId) ?? `user ${r.reviewerId}`,
    decision: r.decision,
    note: r.note,
    at: new Date(r.createdAt).toISOString(),
  }));
}
