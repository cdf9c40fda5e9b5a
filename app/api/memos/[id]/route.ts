import { withActor, parseJsonBody, parseId } from '@/lib/api/route-handler';
import { getMemo } from '@/lib/memos/get-memo';
import { saveMemo } from '@/lib/memos/save-memo';
import { patchMemoInputSchema } from '@/lib/memos/memo-schema';

export const dynamic = 'force-dynamic';

export const GET = withActor<{ id: string }>(async ({ actor, params }) => getMemo(actor, parseId(params.id, 'id')));

export const PATCH = withActor<{ id: string }>(async ({ req, actor, params }) => {
  const memoId = parseId(params.id, 'id');
  const change = await parseJsonBody(req, patchMemoInputSchema);
  return saveMemo(actor, memoId, change);
});
