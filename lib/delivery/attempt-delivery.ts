import { db, Delivery, Release, Revision, User } from '@/models';
import { recordAudit } from '@/lib/audit/record-audit';
import { sendMail } from '@/lib/mail/send-mail';
import { deliveryConfig, nextAttemptAt } from './delivery-config';
import { composeReleaseMessage } from './compose-release-message';
import { issueToken } from './link-token';
import { claimAttempt } from './claim-attempt';

/**
 * One attempt to hand a delivery's message to the SMTP server: a fresh
 * one-time link for the recipient and revision (voiding the delivery's
 * older unused link), the release notice with the
 * PDF attached when it is small enough, and the outcome stored on the
 * delivery (accepted, or the error and when the next automatic attempt is
 * due, with doubling waits). Both outcomes go to the audit trail. Returns
 * false when another attempt for the same delivery is already running.
 */
export async function attemptDelivery(deliveryId: number, by: { id: number; email: string } | null): Promise<boolean> {
  await db();
  const config = deliveryConfig();
  const started = new Date();
  if (!(await claimAttempt(Delivery, deliveryId, started))) return false;
  const delivery = await Delivery.findByPk(deliveryId, { rejectOnEmpty: true });
  const attempt = delivery.attempts + 1;
  try {
    await sendOnce(delivery, attempt, by);
  } catch (err) {
    // Not an SMTP answer (say, the database was busy): keep the delivery failed and due for a retry, never lost.
    const now = new Date();
    const next = nextAttemptAt(attempt, now, config);
    await delivery.update({
      status: 'failed',
      attempts: attempt,
      lastError: `could not prepare the message: ${err instanceof Error ? err.message : String(err)}`.slice(0, 1000),
      nextAttemptAt: next,
    });
    await recordAudit({
      actor: by,
      memoId: delivery.memoId,
      action: 'delivery.failed',
      details: {
        deliveryId: delivery.id,
        to: delivery.recipientEmail,
        attempt,
        error: 'could not prepare the message',
        nextAttemptAt: next?.toISOString() ?? null,
      },
    });
  }
  return true;
}

async function sendOnce(delivery: Delivery, attempt: number, by: { id: number; email: string } | null): Promise<void> {
  const config = deliveryConfig();
  const [release, revision, recipient] = await Promise.all([
    Release.findByPk(delivery.releaseId, { rejectOnEmpty: true }),
    Revision.findByPk(delivery.revisionId, {
      rejectOnEmpty: true,
      attributes: ['id', 'memoId', 'letter', 'documentNumber', 'title', 'changeSummary', 'pdfData', 'pdfSha256'],
    }),
    User.findByPk(delivery.recipientId, { rejectOnEmpty: true }),
  ]);
  const releasedBy = await User.findByPk(release.releasedBy, { attributes: ['name'] });

  const { token, expiresAt } = await issueToken(
    { purpose: 'delivery', userId: recipient.id, deliveryId: delivery.id, revisionId: revision.id },
    config.linkTtlMs,
  );
  const attach = revision.pdfData.length <= config.attachmentMaxBytes;
  const mail = composeReleaseMessage({
    to: { name: recipient.name, email: delivery.recipientEmail },
    documentNumber: revision.documentNumber,
    title: revision.title,
    letter: revision.letter,
    changeSummary: revision.changeSummary,
    coverNote: release.coverNote,
    releasedBy: releasedBy?.name ?? 'Your configuration manager',
    pdfSha256: revision.pdfSha256,
    pdf: { bytes: revision.pdfData, attach, limitBytes: config.attachmentMaxBytes },
    link: `${config.publicUrl}/delivery/${token}`,
    linkExpiresAt: expiresAt,
  });
  const outcome = await sendMail(mail);
  const finished = new Date();
  const audit = { actor: by, memoId: revision.memoId, revisionLetter: revision.letter };
  if (outcome.ok) {
    await delivery.update({
      status: 'delivered',
      attempts: attempt,
      deliveredAt: finished,
      smtpResponse: outcome.response.slice(0, 1000),
      smtpMessageId: outcome.messageId,
      lastError: null,
      nextAttemptAt: null,
      pdfAttached: attach,
    });
    await recordAudit({
      ...audit,
      action: 'delivery.sent',
      details: {
        deliveryId: delivery.id,
        to: delivery.recipientEmail,
        attempt,
        pdfAttached: attach,
        smtpResponse: outcome.response.slice(0, 200),
      },
    });
  } else {
    const next = nextAttemptAt(attempt, finished, config);
    await delivery.update({
      status: 'failed',
      attempts: attempt,
      lastError: outcome.error,
      nextAttemptAt: next,
      pdfAttached: attach,
    });
    await recordAudit({
      ...audit,
      action: 'delivery.failed',
      details: {
        deliveryId: delivery.id,
        to: delivery.recipientEmail,
        attempt,
        error: outcome.error,
        nextAttemptAt: next?.toISOString() ?? null,
      },
    });
  }
}
