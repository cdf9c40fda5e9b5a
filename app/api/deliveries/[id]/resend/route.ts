import { withActor, parseId } from '@/lib/api/route-handler';
import { resendDelivery } from '@/lib/delivery/resend-delivery';

export const dynamic = 'force-dynamic';

/** Sends one recipient's message again now, with a fresh link: the delivery as it stands after the attempt. */
export const POST = withActor<{ id: string }>(async ({ actor, params }) =>
  resendDelivery(actor, parseId(params.id, 'id')),
);
