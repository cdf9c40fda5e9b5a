import { db, Memo, Revision } from '@/models';
import { notFound, badRequest } from '@/lib/api/errors';
import { assertRevision, decideRevision, notSharedOrMissing, type Actor } from '@/lib/auth/permissions';
import { loadMemoFacts, loadMemoFor, peopleById } from '@/lib/memos/load-memo';
import { listRevisionRecipients } from '@/lib/delivery/list-revision-recipients';
import type { PersonRef } from '@/lib/memos/memo-record';
import { isRevisionLetter } from './revision-letter';
import type { RevisionSummary } from './revision-record';

const SUMMARY_ATTRIBUTES = [
  'id',
  'memoId',
  'letter',
  'memoVersion',
  'title',
  'changeSummary',
  'frozenAt',
  'frozenBy',
  'engineVersion',
  'pdfSha256',
  'opmSha256',
  'oemSha256',
] as const;

export function toRevisionSummary(r: Revision, people: Map<number, PersonRef>, pdfBytes?: number): RevisionSummary {
  return {
    letter: r.letter,
    memoVersion: r.memoVersion,
    title: r.title,
    changeSummary: r.changeSummary,
    frozenAt: new Date(r.frozenAt).toISOString(),
    frozenBy: people.get(r.frozenBy) ?? { id: r.frozenBy, name: `user ${r.frozenBy}` },
    engineVersion: r.engineVersion,
    pdfSha256: r.pdfSha256,
    pdfBytes: pdfBytes ?? (r.pdfData ? r.pdfData.length : 0),
    opmSha256: r.opmSha256 ?? null,
    oemSha256: r.oemSha256 ?? null,
  };
}

/** Every frozen revision of a memo the actor may see (a customer: those released to them), newest first. */
export async function listRevisions(actor: Actor, memoId: number): Promise<RevisionSummary[]> {
  const { facts } = await loadMemoFor(actor, memoId, 'memo.view');
  const all = await Revision.findAll({
    where: { memoId },
    order: [['id', 'DESC']],
    attributes: [...SUMMARY_ATTRIBUTES],
  });
  const recipients = await listRevisionRecipients(all.map((r) => r.id));
  const rows = all.filter(
    (r) =>
      decideRevision(actor, 'revision.view', { memo: facts, releasedToUserIds: recipients.get(r.id) ?? [] }).allowed,
  );
  const people = await peopleById(rows.map((r) => r.frozenBy));
  return rows.map((r) => toRevisionSummary(r, people));
}

/**
 * One revision in full (content, blocks, approval, PDF bytes), if the actor
 * may see it: staff who may see the memo; a customer it was released to.
 * An unknown memo, a hidden one, and (for a customer) a revision not
 * released to them all answer the same 404.
 */
export async function getRevision(actor: Actor, memoId: number, letter: string): Promise<Revision> {
  if (!isRevisionLetter(letter))
    throw badRequest(`“${letter}” is not a revision letter (A, B, … AA).`, { letter: 'not a revision letter' });
  await db();
  const memo = await Memo.findByPk(memoId);
  if (!memo) throw notSharedOrMissing();
  const row = await Revision.findOne({ where: { memoId, letter } });
  const releasedToUserIds = row ? ((await listRevisionRecipients([row.id])).get(row.id) ?? []) : [];
  assertRevision(actor, 'revision.view', { memo: await loadMemoFacts(memo), releasedToUserIds });
  if (!row) throw notFound(`Revision ${letter} of memo ${memoId}`);
  return row;
}
