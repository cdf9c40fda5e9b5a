import { db, OutboxAttachment, OutboxMessage } from '@/models';
import { assertGlobal, type Actor } from '@/lib/auth/permissions';
import { notFound } from '@/lib/api/errors';
import type { OutboxDetail } from './list-outbox-messages';

/** One received message: envelope, every header line, text and HTML bodies, attachments with SHA-256 (administrators). */
export async function getOutboxMessage(actor: Actor, id: number): Promise<OutboxDetail> {
  assertGlobal(actor, 'outbox.view');
  await db();
  const m = await OutboxMessage.findByPk(id);
  if (!m) throw notFound(`Outbox message ${id}`);
  const attachments = await OutboxAttachment.findAll({
    where: { messageId: id },
    attributes: ['id', 'filename', 'contentType', 'sizeBytes', 'sha256'],
    order: [['id', 'ASC']],
  });
  return {
    id: m.id,
    receivedAt: new Date(m.receivedAt).toISOString(),
    envelopeFrom: m.envelopeFrom,
    envelopeTo: m.envelopeTo,
    subject: m.subject,
    attachments: attachments.length,
    messageId: m.messageId,
    fromText: m.fromText,
    toText: m.toText,
    headers: m.headers,
    text: m.textBody,
    html: m.htmlBody,
    rawBytes: m.raw.length,
    attachmentList: attachments.map((a) => ({
      id: a.id,
      filename: a.filename,
      contentType: a.contentType,
      sizeBytes: a.sizeBytes,
      sha256: a.sha256,
    })),
  };
}
