import { db, User } from '@/models';
import { notFound } from '@/lib/api/errors';
import { assertGlobal, type Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { endUserSessions } from '@/lib/sessions/end-sessions';

/**
 * An administrator ends every session of a person at once (a lost laptop, a
 * shared machine). For administrators acting on themselves, the browser they
 * do it from stays signed in.
 */
export async function signOutEverywhere(
  actor: Actor,
  userId: number,
  currentSessionId: string | null,
): Promise<{ userId: number; sessionsEnded: number }> {
  assertGlobal(actor, 'user.manage');
  await db();
  const user = await User.findByPk(userId, { attributes: ['id', 'email'] });
  if (!user) throw notFound(`User ${userId}`);
  const sessionsEnded = await endUserSessions(user.id, 'signed-out-everywhere', {
    exceptSessionId: user.id === actor.id ? currentSessionId : null,
  });
  await recordAudit({ actor, action: 'sessions.end', details: { userId: user.id, email: user.email, sessionsEnded } });
  return { userId: user.id, sessionsEnded };
}
