import { withActor, parseId } from '@/lib/api/route-handler';
import { currentSessionId } from '@/lib/auth/current-actor';
import { signOutEverywhere } from '@/lib/users/sign-out-everywhere';

export const dynamic = 'force-dynamic';

/** DELETE: ends every session of the person ("sign out everywhere"), admin only → {userId, sessionsEnded}. */
export const DELETE = withActor<{ id: string }>(async ({ actor, params }) =>
  signOutEverywhere(actor, parseId(params.id, 'id'), await currentSessionId()),
);
