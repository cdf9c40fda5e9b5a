import { NextResponse } from 'next/server';
import { withActor, parseJsonBody, parseId } from '@/lib/api/route-handler';
import { listThreads } from '@/lib/comments/list-threads';
import { createThread } from '@/lib/comments/create-thread';
import { createThreadInputSchema } from '@/lib/comments/comment-schema';

export const dynamic = 'force-dynamic';

export const GET = withActor<{ id: string }>(async ({ actor, params }) => ({
  threads: await listThreads(actor, parseId(params.id, 'id')),
}));

export const POST = withActor<{ id: string }>(async ({ req, actor, params }) => {
  const memoId = parseId(params.id, 'id');
  const input = await parseJsonBody(req, createThreadInputSchema);
  return NextResponse.json(await createThread(actor, memoId, input), { status: 201 });
});
