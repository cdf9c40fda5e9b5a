import crypto from 'node:crypto';
import { simpleParser } from 'mailparser';
import { db, OutboxAttachment, OutboxMessage } from '@/models';

/**
 * Parses one message as received over SMTP (RFC 5322 text after DATA) with
 * mailparser and keeps it in the outbox tables: envelope, every header line,
 * text and HTML bodies, attachments with their SHA-256, and the raw bytes.
 * Returns the outbox id.
 */
export async function storeReceivedMessage(
  raw: Buffer,
  envelope: { from: string | null; to: string[] },
): Promise<number> {
  const sequelize = await db();
  const parsed = await simpleParser(raw, { skipImageLinks: true, skipTextToHtml: true });
  const headers: [string, string][] = parsed.headerLines.map(({ line }) => {
    const i = line.indexOf(':');
    return i < 0 ? [line, ''] : [line.slice(0, i).trim(), line.slice(i + 1).trim()];
  });
  const addressText = (a: typeof parsed.to): string | null =>
    a === undefined ? null : (Array.isArray(a) ? a : [a]).map((x) => x.text).join(', ');
  return sequelize.transaction(async (transaction) => {
    const message = await OutboxMessage.create(
      {
        receivedAt: new Date(),
        envelopeFrom: envelope.from,
        envelopeTo: envelope.to,
        messageId: parsed.messageId ?? null,
        subject: parsed.subject ?? null,
        fromText: parsed.from?.text ?? null,
        toText: addressText(parsed.to),
        headers,
        textBody: parsed.text ?? null,
        htmlBody: typeof parsed.html === 'string' ? parsed.html : null,
        raw,
      },
      { transaction },
    );
    for (const a of parsed.attachments) {
      await OutboxAttachment.create(
        {
          messageId: message.id,
          filename: a.filename ?? null,
          contentType: a.contentType,
          sizeBytes: a.content.length,
          sha256: crypto.createHash('sha256').update(a.content).digest('hex'),
          content: a.content,
        },
        { transaction },
      );
    }
    return message.id;
  });
}
