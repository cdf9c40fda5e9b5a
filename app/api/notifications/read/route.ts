import { withActor, parseJsonBody } from '@/lib/api/route-handler';
import { markNotificationsRead } from '@/lib/comments/mark-notifications-read';
import { markReadInputSchema } from '@/lib/comments/comment-schema';

export const dynamic = 'force-dynamic';

export const POST = withActor(async ({ req, actor }) =>
  markNotificationsRead(actor, await parseJsonBody(req, markReadInputSchema)),
);
