import 'server-only';
import { cookies } from 'next/headers';
import { redirect } from 'next/navigation';
import { decodeSessionCookie, type SessionClaims } from '@/lib/sessions/decode-session-cookie';
import { loadSessionActor } from '@/lib/sessions/load-session-actor';
import { unauthenticated } from '@/lib/api/errors';
import type { Actor } from './permissions';

/**
 * This request's session token, decrypted and verified with next-auth's own
 * decoder. Not through getServerSession: that runs next-auth's whole session
 * endpoint per call (its jwt callback queries the session row, then it
 * re-encrypts a renewed token that a server component or route handler
 * cannot send back), and the session row was then read a second time.
 * The browser's token is renewed where next-auth can set the cookie: its
 * own /api/auth/session, which the client polls.
 */
async function requestSessionClaims(): Promise<SessionClaims | null> {
  const jar = await cookies();
  return decodeSessionCookie(Object.fromEntries(jar.getAll().map((c) => [c.name, c.value])));
}

/**
 * The signed-in user as they are now in the database. A token whose session
 * was ended (sign-out, password change, "sign out everywhere") and a
 * deactivated user both count as signed out.
 */
export async function currentActor(): Promise<Actor | null> {
  const claims = await requestSessionClaims();
  return claims ? loadSessionActor(claims.sessionId, claims.userId) : null;
}

/** The id of this browser's session (to keep it when the person changes their own password). */
export async function currentSessionId(): Promise<string | null> {
  return (await requestSessionClaims())?.sessionId ?? null;
}

/** For route handlers: the actor, or a 401. */
export async function requireActor(): Promise<Actor> {
  const actor = await currentActor();
  if (!actor) throw unauthenticated();
  return actor;
}

/** For pages: the actor, or a redirect to the sign-in page that comes back here. */
export async function requirePageActor(returnTo: string): Promise<Actor> {
  const actor = await currentActor();
  if (!actor) redirect(`/signin?callbackUrl=${encodeURIComponent(returnTo)}`);
  return actor;
}
