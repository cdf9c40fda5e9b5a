import { withActor, parseJsonBody, parseId } from '@/lib/api/route-handler';
import { updateUser } from '@/lib/users/update-user';
import { updateUserInputSchema } from '@/lib/users/user-schema';
import { currentSessionId } from '@/lib/auth/current-actor';

export const dynamic = 'force-dynamic';

export const PATCH = withActor<{ id: string }>(async ({ req, actor, params }) => {
  const userId = parseId(params.id, 'id');
  const change = await parseJsonBody(req, updateUserInputSchema);
  return updateUser(actor, userId, change, { currentSessionId: await currentSessionId() });
});
