import { db, OutboxAttachment } from '@/models';
import { assertGlobal, type Actor } from '@/lib/auth/permissions';
import { notFound } from '@/lib/api/errors';

/** The bytes of one attachment as received (administrators). */
export async function readOutboxAttachment(
  actor: Actor,
  messageId: number,
  attachmentId: number,
): Promise<OutboxAttachment> {
  assertGlobal(actor, 'outbox.view');
  await db();
  const a = await OutboxAttachment.findOne({ where: { id: attachmentId, messageId } });
  if (!a) throw notFound(`Attachment ${attachmentId} of outbox message ${messageId}`);
  return a;
}
