import { withActor, parseId } from '@/lib/api/route-handler';
import { reverifyRevision } from '@/lib/revisions/reverify-revision';
import { assertGlobal } from '@/lib/auth/permissions';

export const dynamic = 'force-dynamic';

/** Recomputes a frozen revision with the current engine and reports outputs that differ; never changes it. */
export const POST = withActor<{ id: string; letter: string }>(async ({ actor, params }) => {
  assertGlobal(actor, 'calc.run');
  return reverifyRevision(actor, parseId(params.id, 'id'), params.letter);
});
