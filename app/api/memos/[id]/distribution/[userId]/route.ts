import { withActor, parseId } from '@/lib/api/route-handler';
import { removeDistributionContact } from '@/lib/delivery/remove-distribution-contact';

export const dynamic = 'force-dynamic';

/** Takes a contact off the list (what was released to them stays theirs). */
export const DELETE = withActor<{ id: string; userId: string }>(async ({ actor, params }) => {
  await removeDistributionContact(actor, parseId(params.id, 'id'), parseId(params.userId, 'userId'));
  return new Response(null, { status: 204 });
});
