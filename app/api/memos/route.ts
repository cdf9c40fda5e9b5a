import { NextResponse } from 'next/server';
import { z } from 'zod';
import { withActor, parseJsonBody, parseWith, searchParamsObject } from '@/lib/api/route-handler';
import { listMemos } from '@/lib/memos/list-memos';
import { createMemo } from '@/lib/memos/create-memo';
import { createMemoInputSchema } from '@/lib/memos/memo-schema';
import { MEMO_STATUSES } from '@/lib/memos/memo-status';

export const dynamic = 'force-dynamic';

const listQuery = z.strictObject({
  status: z.enum(MEMO_STATUSES, { error: `status must be one of ${MEMO_STATUSES.join(', ')}` }).optional(),
});

export const GET = withActor(async ({ req, actor }) => {
  const query = parseWith(listQuery, searchParamsObject(req));
  return { memos: await listMemos(actor, query) };
});

export const POST = withActor(async ({ req, actor }) => {
  const input = await parseJsonBody(req, createMemoInputSchema);
  const memo = await createMemo(actor, input);
  return NextResponse.json(memo, { status: 201 });
});
