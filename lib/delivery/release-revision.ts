import { Transaction } from 'sequelize';
import { db, Delivery, DistributionContact, Release, Revision, User } from '@/models';
import { badRequest, notFound } from '@/lib/api/errors';
import type { Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { loadMemoFor } from '@/lib/memos/load-memo';
import { isRevisionLetter } from '@/lib/revisions/revision-letter';
import { attemptDelivery } from './attempt-delivery';
import { notifyTransition } from '@/lib/notifications/notify-transition';
import { sendNotificationMails } from '@/lib/notifications/send-notification-mails';
import type { ReleaseInput } from './delivery-schema';
import { getRelease } from './list-memo-deliveries';
import type { ReleaseRecord } from './delivery-record';

/**
 * Releases a frozen revision to some or all contacts of the memo's
 * distribution list with a cover note. The release and one delivery per
 * recipient are recorded in one transaction first; then each message is
 * handed to the SMTP server. A refused or unreachable server leaves the
 * release in place and the delivery failed, due for an automatic retry.
 */
export async function releaseRevision(
  actor: Actor,
  memoId: number,
  letter: string,
  input: ReleaseInput,
): Promise<ReleaseRecord> {
  if (!isRevisionLetter(letter))
    throw badRequest(`“${letter}” is not a revision letter (A, B, … AA).`, { letter: 'not a revision letter' });
  const sequelize = await db();
  let queued: number[] = [];
  const release = await sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const { memo } = await loadMemoFor(actor, memoId, 'memo.release', transaction);
    const revision = await Revision.findOne({ where: { memoId, letter }, attributes: ['id', 'letter'], transaction });
    if (!revision) throw notFound(`Revision ${letter} of memo ${memoId}`);
    const contacts = await DistributionContact.findAll({ where: { memoId }, attributes: ['userId'], transaction });
    const listed = new Set(contacts.map((c) => c.userId));
    const wanted = input.recipientIds === 'all' ? [...listed] : [...new Set(input.recipientIds)];
    if (wanted.length === 0)
      throw badRequest('The distribution list is empty; add a customer contact first.', {
        recipientIds: 'the distribution list is empty',
      });
    const stray = wanted.filter((id) => !listed.has(id));
    if (stray.length > 0)
      throw badRequest(`Not on this memo's distribution list: ${stray.join(', ')}.`, {
        recipientIds: `not on the distribution list: ${stray.join(', ')}`,
      });
    const users = await User.findAll({ where: { id: wanted }, transaction });
    const created = await Release.create(
      { memoId, revisionId: revision.id, coverNote: input.coverNote, releasedBy: actor.id, releasedAt: new Date() },
      { transaction },
    );
    for (const u of users) {
      await Delivery.create(
        {
          releaseId: created.id,
          memoId,
          revisionId: revision.id,
          recipientId: u.id,
          recipientEmail: u.email,
          status: 'queued',
          lastAttemptAt: null,
          deliveredAt: null,
          lastError: null,
          smtpResponse: null,
          smtpMessageId: null,
          pdfAttached: null,
          nextAttemptAt: null,
          firstOpenedAt: null,
          acknowledgedAt: null,
        },
        { transaction },
      );
    }
    await recordAudit(
      {
        actor,
        action: 'revision.release',
        memoId,
        revisionLetter: letter,
        details: { releaseId: created.id, recipients: users.map((u) => u.email), coverNote: input.coverNote },
      },
      transaction,
    );
    queued = await notifyTransition({
      memo,
      kind: 'released',
      actorId: actor.id,
      note: input.coverNote,
      revisionLetter: letter,
      transaction,
    });
    return created;
  });
  const deliveries = await Delivery.findAll({
    where: { releaseId: release.id },
    attributes: ['id'],
    order: [['id', 'ASC']],
  });
  for (const d of deliveries) await attemptDelivery(d.id, actor);
  sendNotificationMails(queued);
  return getRelease(release.id);
}
