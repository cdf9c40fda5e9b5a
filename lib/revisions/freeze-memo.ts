import crypto from 'node:crypto';
import { Transaction } from 'sequelize';
import { db, Memo, MemoReviewer, ReviewDecision, Revision } from '@/models';
import { conflict } from '@/lib/api/errors';
import type { Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { engineVersion, listConstants } from '@/lib/calc';
import { blockName } from '@/lib/documents/calc-nodes';
import { documentIndex } from '@/lib/documents/model/document-index';
import { buildFigureSpec } from '@/lib/figures/build-figure-spec';
import { loadMemoFor, peopleById } from '@/lib/memos/load-memo';
import { checkMemoContent } from '@/lib/memos/check-memo-content';
import { renderMemoPdfJob } from '@/lib/jobs/render-memo-pdf-job';
import { requirementWarnings } from '@/lib/requirements/requirement-warnings';
import { getOrganisation } from '@/lib/organisation/get-organisation';
import { listRoundSignatures } from '@/lib/signatures/list-round-signatures';
import { recordSignature } from '@/lib/signatures/record-signature';
import type { SignatureRecord } from '@/lib/signatures/signature-record';
import { revisionLetter } from './revision-letter';
import { revisionRecordRow, toApprovalSignature } from './approval-for-pdf';
import { buildRevisionOrbitMessages } from './build-revision-orbit-messages';
import { toRevisionSummary } from './list-revisions';
import type { FrozenApproval, FrozenBlock, RevisionSummary } from './revision-record';

/**
 * Freezes an approved memo as its next revision: every calc block is
 * recomputed with the current engine, and the content, each block's inputs
 * and outputs, the engine version and constants, figure data, the approval
 * record and the rendered PDF (with its SHA-256) are stored as an immutable
 * Revision; the memo becomes Frozen. A memo whose blocks do not all compute
 * is not frozen (409 naming them). Requirements not met are returned as
 * warnings and recorded in the audit event; they do not stop the freeze (the
 * revision states them, with their verdicts, in its compliance table).
 *
 * The freeze is the configuration manager's electronic signature (the
 * password was checked by the caller, lib/workflow/transition-memo.ts): it is
 * stored in the freeze's transaction with the time of the freeze, and the
 * revision's approval record — and so its PDF and SHA-256 — holds it beside
 * the reviewers' signatures of the approving round.
 *
 * The recomputation and the PDF run in the worker pool before the write
 * transaction, which then only checks that nothing moved meanwhile (same
 * memo version, review round and revision count, still approved; else 409)
 * and writes: a render of seconds, or a wait for a busy pool, never holds
 * the database's write lock.
 */
export async function freezeMemo(
  actor: Actor,
  memoId: number,
  changeSummary: string,
  meaning: string,
): Promise<{ revision: RevisionSummary; warnings: string[] }> {
  const { memo } = await loadMemoFor(actor, memoId, 'memo.freeze');
  // A row stored before saves were checked is refused here (409 naming the problem), never rendered.
  await checkMemoContent(memoId, memo.content, 'render');
  const previous = await Revision.findAll({
    where: { memoId },
    order: [['id', 'ASC']],
    attributes: ['letter', 'frozenAt', 'changeSummary', 'frozenBy', 'approval'],
  });
  const letter = revisionLetter(previous.length);
  const frozenAt = new Date();

  const links = await MemoReviewer.findAll({ where: { memoId } });
  const decisions = await ReviewDecision.findAll({
    where: { memoId, round: memo.reviewRound },
    order: [['id', 'ASC']],
  });
  const people = await peopleById([
    memo.ownerId,
    actor.id,
    ...links.map((l) => l.userId),
    ...previous.map((p) => p.frozenBy),
  ]);
  const latest = new Map(decisions.map((d) => [d.reviewerId, d]));
  const assigned = new Set(links.map((l) => l.userId));
  // The latest signature of each assigned reviewer in this round (the one their standing decision carries), oldest first.
  const reviewerSignatures = [
    ...new Map(
      (await listRoundSignatures(memoId, memo.reviewRound))
        .filter((sig) => assigned.has(sig.userId))
        .map((sig) => [sig.userId, sig]),
    ).values(),
  ].sort((a, b) => a.signedAt.localeCompare(b.signedAt));
  const releaseSignature: SignatureRecord = {
    userId: actor.id,
    printedName: actor.name,
    role: actor.role,
    action: 'freeze',
    meaning,
    signedAt: frozenAt.toISOString(),
    memoVersion: memo.version,
    reviewRound: memo.reviewRound,
    revisionLetter: letter,
  };
  const signatures = [...reviewerSignatures, releaseSignature];
  const approval: FrozenApproval = {
    author: {
      id: memo.ownerId,
      name: people.get(memo.ownerId)?.name ?? '',
      submittedAt: memo.submittedAt ? new Date(memo.submittedAt).toISOString() : null,
    },
    reviewers: links
      .map((l) => latest.get(l.userId))
      .filter((d): d is ReviewDecision => Boolean(d))
      .map((d) => ({
        id: d.reviewerId,
        name: people.get(d.reviewerId)?.name ?? '',
        decision: d.decision,
        note: d.note,
        decidedAt: new Date(d.createdAt).toISOString(),
      })),
    configurationManager: { id: actor.id, name: actor.name, frozenAt: frozenAt.toISOString() },
    signatures,
  };

  // Printed into the stored PDF: a later change of the setting never reaches this revision.
  const organisation = await getOrganisation();
  // Recomputed and laid out in the worker pool; stops before layout when a block has no result.
  const { evaluations, pdf } = await renderMemoPdfJob(actor.id, memoId, {
    requireAllResults: true,
    memo: {
      documentNumber: memo.documentNumber,
      title: memo.title,
      version: memo.version,
      owner: { id: memo.ownerId, name: approval.author.name },
      reviewers: approval.reviewers.map((r) => ({ id: r.id, name: r.name })),
      content: memo.content,
      updatedAt: frozenAt.toISOString(),
    },
    paper: 'a4',
    revision: letter,
    draft: false,
    organisation: organisation.name,
    distribution: organisation.distributionStatement,
    approvals: {
      author: { name: approval.author.name, date: approval.author.submittedAt ?? undefined },
      reviewer: approval.reviewers.length
        ? { name: approval.reviewers.map((r) => r.name).join(', '), date: approval.reviewers.at(-1)?.decidedAt }
        : undefined,
      configurationManager: { name: actor.name, date: frozenAt.toISOString() },
      signatures: signatures.map(toApprovalSignature),
    },
    revisionRecord: [
      ...previous.map((p) =>
        revisionRecordRow(p.letter, p.frozenAt, p.changeSummary, p.approval, people.get(p.frozenBy)?.name),
      ),
      revisionRecordRow(letter, frozenAt, changeSummary, approval, actor.name),
    ],
  });
  const failed = [...evaluations.values()].filter((e) => e.status === 'error');
  if (failed.length > 0 || !pdf) {
    throw conflict(
      `Cannot freeze: ${failed.length} calc block${failed.length === 1 ? ' has' : 's have'} no result — ${failed.map((e) => `${blockName(e.block)}: ${e.status === 'error' ? e.error : ''}`).join('; ')}`,
    );
  }
  const blocks: FrozenBlock[] = [...evaluations.values()].flatMap((e) =>
    e.status === 'ok'
      ? [
          {
            blockId: e.blockId,
            kind: e.block.kind,
            label: e.block.label,
            storedInputs: e.block.inputs,
            inputs: e.result.inputs,
            outputs: e.result.outputs,
            warnings: e.result.warnings,
            engineVersion: e.result.engineVersion,
          },
        ]
      : [],
  );
  const figures = documentIndex(memo.content).figures.map((f) => ({
    ...f,
    outcome: buildFigureSpec(f.figureKind, evaluations.get(f.blockId)),
  }));
  const pdfSha256 = crypto.createHash('sha256').update(pdf).digest('hex');
  // The design orbit's OPM and one-day OEM (a few milliseconds of propagation), stored and hashed with the PDF.
  const { designBlock, ...orbitMessages } = buildRevisionOrbitMessages(
    memo,
    letter,
    blocks,
    organisation.name,
    frozenAt,
  );
  const warnings = requirementWarnings(memo.content, evaluations);

  const sequelize = await db();
  return sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const { memo: now } = await loadMemoFor(actor, memoId, 'memo.freeze', transaction);
    const revisionsNow = await Revision.count({ where: { memoId }, transaction });
    if (now.version !== memo.version || now.reviewRound !== memo.reviewRound || revisionsNow !== previous.length) {
      throw conflict('The memo changed while it was being frozen; nothing was frozen. Freeze it again.');
    }
    const revision = await Revision.create(
      {
        memoId,
        letter,
        memoVersion: memo.version,
        documentNumber: memo.documentNumber,
        title: memo.title,
        content: memo.content,
        blocks,
        engineVersion,
        constants: listConstants(),
        figures,
        approval,
        changeSummary,
        pdfData: pdf,
        pdfSha256,
        ...orbitMessages,
        frozenBy: actor.id,
        frozenAt,
      },
      { transaction },
    );
    const [updated] = await Memo.update(
      { status: 'frozen' },
      { where: { id: memoId, version: memo.version, status: 'approved' }, transaction },
    );
    if (updated !== 1) throw conflict('The memo changed while it was being frozen; nothing was frozen.');
    await recordSignature(
      {
        actor,
        memoId,
        action: 'freeze',
        meaning,
        memoVersion: memo.version,
        reviewRound: memo.reviewRound,
        revisionLetter: letter,
        signedAt: frozenAt,
      },
      transaction,
    );
    await recordAudit(
      {
        actor,
        action: 'memo.freeze',
        memoId,
        revisionLetter: letter,
        details: {
          memoVersion: memo.version,
          pdfSha256,
          engineVersion,
          changeSummary,
          opmSha256: orbitMessages.opmSha256,
          oemSha256: orbitMessages.oemSha256,
          designBlock,
          meaning,
          ...(warnings.length ? { requirementWarnings: warnings } : {}),
        },
      },
      transaction,
    );
    return { revision: toRevisionSummary(revision, people), warnings };
  });
}
