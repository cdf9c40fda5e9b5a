import { withActor, parseId, parseWith, searchParamsObject } from '@/lib/api/route-handler';
import { listMemoVersions } from '@/lib/memos/list-memo-versions';
import { listVersionsQuerySchema } from '@/lib/memos/memo-schema';

export const dynamic = 'force-dynamic';

/** GET [?all=true]: the memo's editing sessions (or every save), newest first → {versions}. */
export const GET = withActor<{ id: string }>(async ({ req, actor, params }) => {
  const memoId = parseId(params.id, 'id');
  const query = parseWith(listVersionsQuerySchema, searchParamsObject(req));
  return { versions: await listMemoVersions(actor, memoId, { everySave: query.all === 'true' }) };
});
