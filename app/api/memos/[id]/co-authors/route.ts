import { withActor, parseJsonBody, parseId } from '@/lib/api/route-handler';
import { setCoAuthorsInputSchema } from '@/lib/memos/memo-schema';
import { setCoAuthors } from '@/lib/memos/set-co-authors';

export const dynamic = 'force-dynamic';

/** PUT {userIds}: the owner names the memo's co-authors (replaces the list) → {coAuthors}. */
export const PUT = withActor<{ id: string }>(async ({ req, actor, params }) => {
  const memoId = parseId(params.id, 'id');
  const input = await parseJsonBody(req, setCoAuthorsInputSchema);
  return setCoAuthors(actor, memoId, input);
});
