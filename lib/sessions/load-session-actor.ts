import { AuthSession, db } from '@/models';
import type { Actor } from '@/lib/auth/permissions';
import { loadActiveActor } from '@/lib/users/authenticate-user';

/**
 * The person behind a session JWT, checked against the session table on
 * every request: null when the token names no session (issued before
 * sessions were recorded), a session of someone else, or an ended one, and
 * when the person is no longer active.
 */
export async function loadSessionActor(sessionId: string | undefined, userId: number): Promise<Actor | null> {
  if (!sessionId) return null;
  await db();
  const session = await AuthSession.findByPk(sessionId, { attributes: ['userId', 'endedAt'] });
  if (!session || session.endedAt || session.userId !== userId) return null;
  return loadActiveActor(userId);
}
