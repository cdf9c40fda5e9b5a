import { NextResponse } from 'next/server';
import { withActor, parseJsonBody, parseId } from '@/lib/api/route-handler';
import { nameVersionInputSchema } from '@/lib/memos/memo-schema';
import { nameMemoVersion } from '@/lib/memos/name-memo-version';

export const dynamic = 'force-dynamic';

/** POST {label}: an author names a saved version → 201 {versionNumber, label, namedBy, namedAt}. */
export const POST = withActor<{ id: string; version: string }>(async ({ req, actor, params }) => {
  const memoId = parseId(params.id, 'id');
  const versionNumber = parseId(params.version, 'version');
  const input = await parseJsonBody(req, nameVersionInputSchema);
  return NextResponse.json(await nameMemoVersion(actor, memoId, versionNumber, input), { status: 201 });
});
