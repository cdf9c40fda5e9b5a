import 'server-only';
import { getServerSession } from 'next-auth';
import { redirect } from 'next/navigation';
import { authOptions } from './auth-options';
import { loadSessionActor } from '@/lib/sessions/load-session-actor';
import { unauthenticated } from '@/lib/api/errors';
import type { Actor } from './permissions';

/**
 * The signed-in user as they are now in the database. A token whose session
 * was ended (sign-out, password change, "sign out everywhere") and a
 * deactivated user both count as signed out.
 */
export async function currentActor(): Promise<Actor | null> {
  const session = await getServerSession(authOptions);
  const id = session?.user?.id;
  if (typeof id !== 'number') return null;
  return loadSessionActor(session?.sid, id);
}

/** The id of this browser's session (to keep it when the person changes their own password). */
export async function currentSessionId(): Promise<string | null> {
  const session = await getServerSession(authOptions);
  return session?.sid ?? null;
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
