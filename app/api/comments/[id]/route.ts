import { withActor, parseJsonBody, parseId } from '@/lib/api/route-handler';
import { threadActionInputSchema } from '@/lib/comments/comment-schema';
import { replyToThread } from '@/lib/comments/reply-to-thread';
import { changeThreadStatus } from '@/lib/comments/change-thread-status';

export const dynamic = 'force-dynamic';

/** One action on the thread a comment belongs to: reply, resolve or reopen; answers the thread as it now is. */
export const PATCH = withActor<{ id: string }>(async ({ req, actor, params }) => {
  const commentId = parseId(params.id, 'id');
  const input = await parseJsonBody(req, threadActionInputSchema);
  switch (input.action) {
    case 'reply':
      return replyToThread(actor, commentId, input.body);
    case 'resolve':
      return changeThreadStatus(actor, commentId, 'resolved');
    case 'reopen':
      return changeThreadStatus(actor, commentId, 'open');
  }
});
