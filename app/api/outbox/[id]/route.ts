import { withActor, parseId } from '@/lib/api/route-handler';
import { getOutboxMessage } from '@/lib/mail/get-outbox-message';

export const dynamic = 'force-dynamic';

export const GET = withActor<{ id: string }>(async ({ actor, params }) =>
  getOutboxMessage(actor, parseId(params.id, 'id')),
);
