import type { Actor } from '@/lib/auth/permissions';
import { loadActiveActor } from '@/lib/users/authenticate-user';
import { isSessionOpen } from './is-session-open';

/**
 * The person behind a session JWT, checked against the session table on
 * every request: null when the token names no session (issued before
 * sessions were recorded), a session of someone else, or an ended one, and
 * when the person is no longer active.
 */
export async function loadSessionActor(sessionId: string | undefined, userId: number): Promise<Actor | null> {
  if (!(await isSessionOpen(sessionId, userId))) return null;
  return loadActiveActor(userId);
}
