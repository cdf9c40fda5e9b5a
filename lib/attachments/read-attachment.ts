import { Attachment, db } from '@/models';
import { notSharedOrMissing, type Actor } from '@/lib/auth/permissions';
import { loadMemoFor } from '@/lib/memos/load-memo';

/** An attachment's bytes, for someone who may view its memo (an unknown id and a hidden memo's attachment answer the same 404). */
export async function readAttachment(actor: Actor, attachmentId: number): Promise<Attachment> {
  await db();
  const row = await Attachment.findByPk(attachmentId);
  if (!row) throw notSharedOrMissing();
  await loadMemoFor(actor, row.memoId, 'memo.view');
  return row;
}
