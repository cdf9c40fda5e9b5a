import { withActor, parseId } from '@/lib/api/route-handler';
import { listRevisions } from '@/lib/revisions/list-revisions';

export const dynamic = 'force-dynamic';

export const GET = withActor<{ id: string }>(async ({ actor, params }) => ({
  revisions: await listRevisions(actor, parseId(params.id, 'id')),
}));
