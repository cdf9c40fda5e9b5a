import { parseId, withActor } from '@/lib/api/route-handler';
import { listMemoRequirements } from '@/lib/requirements/list-memo-requirements';

export const dynamic = 'force-dynamic';

/** GET: the memo's requirements, each checked against the blocks recomputed now. */
export const GET = withActor<{ id: string }>(async ({ actor, params }) =>
  listMemoRequirements(actor, parseId(params.id, 'id')),
);
