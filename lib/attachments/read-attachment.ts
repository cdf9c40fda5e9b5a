import { Attachment, db } from '@/models';
import { notFound } from '@/lib/api/errors';
import type { Actor } from '@/lib/auth/permissions';
import { loadMemoFor } from '@/lib/memos/load-memo';

/** An attachment's bytes, for someone who may view its memo. */
export async function readAttachment(actor: Actor, attachmentId: number): Promise<Attachment> {
  await db();
  const row = await Attachment.findByPk(attachmentId);
  if (!row) throw notFound(`Attachment ${attachmentId}`);
  await loadMemoFor(actor, row.memoId, 'memo.view');
  return row;
}
