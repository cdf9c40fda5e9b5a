import { Op } from 'sequelize';
import { AccountMessage, db } from '@/models';
import type { AccountMessagePurpose } from '@/models/account-message';

/**
 * Stores a new invitation or reset message for an account, queued for its
 * first attempt. Older messages of the same kind still waiting for a retry
 * are stood down (their retry would void the new link).
 */
export async function queueAccountMessage(
  purpose: AccountMessagePurpose,
  userId: number,
  context: { memoId?: number; requestedBy?: number } = {},
): Promise<AccountMessage> {
  await db();
  await AccountMessage.update(
    { status: 'failed', nextAttemptAt: null, lastError: 'superseded by a newer message' },
    { where: { purpose, userId, status: { [Op.in]: ['queued', 'failed'] } } },
  );
  return AccountMessage.create({
    purpose,
    userId,
    memoId: context.memoId ?? null,
    requestedBy: context.requestedBy ?? null,
    status: 'queued',
    lastAttemptAt: null,
    deliveredAt: null,
    lastError: null,
    nextAttemptAt: null,
  });
}
