import { withActor, parseId } from '@/lib/api/route-handler';
import { getMemoVersion } from '@/lib/memos/list-memo-versions';

export const dynamic = 'force-dynamic';

export const GET = withActor<{ id: string; version: string }>(async ({ actor, params }) =>
  getMemoVersion(actor, parseId(params.id, 'id'), parseId(params.version, 'version')),
);
