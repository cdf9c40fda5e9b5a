import { withActor, parseJsonBody, parseId } from '@/lib/api/route-handler';
import { transitionInputSchema } from '@/lib/workflow/transition-schema';
import { transitionMemo } from '@/lib/workflow/transition-memo';

export const dynamic = 'force-dynamic';

/** POST {action: submit | approve | request-changes | freeze | reopen, note?, reviewerIds?, changeSummary?} */
export const POST = withActor<{ id: string }>(async ({ req, actor, params }) => {
  const memoId = parseId(params.id, 'id');
  const input = await parseJsonBody(req, transitionInputSchema);
  return transitionMemo(actor, memoId, input);
});
