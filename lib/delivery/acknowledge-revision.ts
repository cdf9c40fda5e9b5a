import { Delivery, Memo } from '@/models';
import { assertRevision, notSharedOrMissing, type Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { loadMemoFacts } from '@/lib/memos/load-memo';
import { getRevision } from '@/lib/revisions/list-revisions';
import { listRevisionRecipients } from './list-revision-recipients';

/** The customer confirms receipt of a revision released to them; the first acknowledgement counts, repeats return it. */
export async function acknowledgeRevision(
  actor: Actor,
  memoId: number,
  letter: string,
): Promise<{ letter: string; acknowledgedAt: string }> {
  const rev = await getRevision(actor, memoId, letter);
  const memo = await Memo.findByPk(memoId);
  if (!memo) throw notSharedOrMissing();
  assertRevision(actor, 'revision.acknowledge', {
    memo: await loadMemoFacts(memo),
    releasedToUserIds: (await listRevisionRecipients([rev.id])).get(rev.id) ?? [],
  });
  const now = new Date();
  const [n] = await Delivery.update(
    { acknowledgedAt: now },
    { where: { revisionId: rev.id, recipientId: actor.id, acknowledgedAt: null } },
  );
  if (n > 0)
    await recordAudit({
      actor,
      action: 'delivery.ack',
      memoId,
      revisionLetter: rev.letter,
      details: { pdfSha256: rev.pdfSha256 },
    });
  const first = await Delivery.findOne({
    where: { revisionId: rev.id, recipientId: actor.id },
    order: [['acknowledgedAt', 'ASC']],
    attributes: ['acknowledgedAt'],
  });
  return { letter: rev.letter, acknowledgedAt: new Date(first?.acknowledgedAt ?? now).toISOString() };
}
