import 'server-only';
import { getServerSession } from 'next-auth';
import { redirect } from 'next/navigation';
import { authOptions } from './auth-options';
import { loadActiveActor } from '@/lib/users/authenticate-user';
import { unauthenticated } from '@/lib/api/errors';
import type { Actor } from './permissions';

/** The signed-in user as they are now in the database (deactivated users count as signed out). */
export async function currentActor(): Promise<Actor | null> {
  const session = await getServerSession(authOptions);
  const id = session?.user?.id;
  if (typeof id !== 'number') return null;
  return loadActiveActor(id);
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
