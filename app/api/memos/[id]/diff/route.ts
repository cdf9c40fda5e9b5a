import { withActor, parseId } from '@/lib/api/route-handler';
import { compareVersions, parseVersionRef } from '@/lib/revisions/compare-versions';

export const dynamic = 'force-dynamic';

/** GET ?from=v3|rA|current&to=… → text differences, changed outputs and changed inputs. */
export const GET = withActor<{ id: string }>(async ({ req, actor, params }) => {
  const memoId = parseId(params.id, 'id');
  const q = req.nextUrl.searchParams;
  return compareVersions(
    actor,
    memoId,
    parseVersionRef(q.get('from') ?? undefined, 'from'),
    parseVersionRef(q.get('to') ?? undefined, 'to'),
  );
});
