import { db, OutboxAttachment, OutboxMessage } from '@/models';
import { assertGlobal, type Actor } from '@/lib/auth/permissions';

export interface OutboxSummary {
  id: number;
  receivedAt: string;
  envelopeFrom: string | null;
  envelopeTo: string[];
  subject: string | null;
  attachments: number;
}

export interface OutboxDetail extends OutboxSummary {
  messageId: string | null;
  fromText: string | null;
  toText: string | null;
  headers: [string, string][];
  text: string | null;
  html: string | null;
  rawBytes: number;
  attachmentList: { id: number; filename: string | null; contentType: string; sizeBytes: number; sha256: string }[];
}

/** What the local SMTP server received, newest first (administrators); `to` filters by envelope recipient. */
export async function listOutboxMessages(
  actor: Actor,
  query: { to?: string; limit?: number } = {},
): Promise<OutboxSummary[]> {
  assertGlobal(actor, 'outbox.view');
  await db();
  const limit = query.limit ?? 200;
  const needle = query.to?.toLowerCase();
  // The envelope is a JSON list: filter it here rather than with dialect-specific JSON SQL.
  const recent = await OutboxMessage.findAll({
    order: [['id', 'DESC']],
    limit: needle ? 5000 : limit,
    attributes: ['id', 'receivedAt', 'envelopeFrom', 'envelopeTo', 'subject'],
  });
  const rows = (
    needle ? recent.filter((r) => r.envelopeTo.some((a) => a.toLowerCase().includes(needle))) : recent
  ).slice(0, limit);
  const counts = new Map<number, number>();
  for (const a of await OutboxAttachment.findAll({
    where: { messageId: rows.map((r) => r.id) },
    attributes: ['messageId'],
  }))
    counts.set(a.messageId, (counts.get(a.messageId) ?? 0) + 1);
  return rows.map((r) => ({
    id: r.id,
    receivedAt: new Date(r.receivedAt).toISOString(),
    envelopeFrom: r.envelopeFrom,
    envelopeTo: r.envelopeTo,
    subject: r.subject,
    attachments: counts.get(r.id) ?? 0,
  }));
}
