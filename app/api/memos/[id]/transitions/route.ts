import { withActor, parseJsonBody, parseId } from '@/lib/api/route-handler';
import { transitionInputSchema } from '@/lib/workflow/transition-schema';
import { transitionMemo } from '@/lib/workflow/transition-memo';
import { clientAddress } from '@/lib/throttle/client-address';

export const dynamic = 'force-dynamic';

/** POST {action: submit | approve | request-changes | freeze | reopen, note?, reviewerIds?, changeSummary?, password? (signed actions), meaning?} */
export const POST = withActor<{ id: string }>(async ({ req, actor, params }) => {
  const memoId = parseId(params.id, 'id');
  const input = await parseJsonBody(req, transitionInputSchema);
  return transitionMemo(actor, memoId, input, { clientAddress: clientAddress(req.headers) });
});
