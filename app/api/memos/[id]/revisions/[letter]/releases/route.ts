import { NextResponse } from 'next/server';
import { withActor, parseJsonBody, parseId } from '@/lib/api/route-handler';
import { releaseInputSchema } from '@/lib/delivery/delivery-schema';
import { releaseRevision } from '@/lib/delivery/release-revision';

export const dynamic = 'force-dynamic';

/** POST {recipientIds: number[] | "all", coverNote}: 201 with the release and each delivery's outcome. */
export const POST = withActor<{ id: string; letter: string }>(async ({ req, actor, params }) => {
  const memoId = parseId(params.id, 'id');
  const input = await parseJsonBody(req, releaseInputSchema);
  return NextResponse.json(await releaseRevision(actor, memoId, params.letter, input), { status: 201 });
});
