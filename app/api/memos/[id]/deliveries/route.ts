import { withActor, parseId } from '@/lib/api/route-handler';
import { listMemoDeliveries } from '@/lib/delivery/list-memo-deliveries';

export const dynamic = 'force-dynamic';

/** Tracking per revision: releases and each recipient's delivery (staff). */
export const GET = withActor<{ id: string }>(async ({ actor, params }) => ({
  revisions: await listMemoDeliveries(actor, parseId(params.id, 'id')),
}));
