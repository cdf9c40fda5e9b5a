import { AuthSession, db } from '@/models';

/** Thrown from the jwt callback for a token whose session has ended: next-auth then answers "no session" and clears the cookie. */
export class SessionEnded extends Error {
  constructor() {
    super('This session has ended; sign in again.');
    this.name = 'SessionEnded';
  }
}

/** True while the session row exists, belongs to this person and has not been ended. */
export async function isSessionOpen(sessionId: string | undefined, userId: number | undefined): Promise<boolean> {
  if (!sessionId || typeof userId !== 'number') return false;
  await db();
  const session = await AuthSession.findByPk(sessionId, { attributes: ['userId', 'endedAt'] });
  return Boolean(session && !session.endedAt && session.userId === userId);
}
