import { Op, type Transaction } from 'sequelize';
import { AuthSession, db } from '@/models';
import type { SessionEndReason } from '@/models/auth-session';

/** Ends one session (sign-out); false when it was ended already or never existed. */
export async function endSession(sessionId: string, reason: SessionEndReason): Promise<boolean> {
  await db();
  const [n] = await AuthSession.update(
    { endedAt: new Date(), endedReason: reason },
    { where: { id: sessionId, endedAt: null } },
  );
  return n === 1;
}

/** Ends every open session of a person, except `exceptSessionId` (the browser that changed its own password). Returns how many ended. */
export async function endUserSessions(
  userId: number,
  reason: SessionEndReason,
  opts: { exceptSessionId?: string | null; transaction?: Transaction } = {},
): Promise<number> {
  await db();
  const where = { userId, endedAt: null, ...(opts.exceptSessionId ? { id: { [Op.ne]: opts.exceptSessionId } } : {}) };
  const [n] = await AuthSession.update(
    { endedAt: new Date(), endedReason: reason },
    { where, transaction: opts.transaction },
  );
  return n;
}
