import { withActor, parseId } from '@/lib/api/route-handler';
import { listMemoVersions } from '@/lib/memos/list-memo-versions';

export const dynamic = 'force-dynamic';

export const GET = withActor<{ id: string }>(async ({ actor, params }) => ({
  versions: await listMemoVersions(actor, parseId(params.id, 'id')),
}));
