import { withActor, parseId } from '@/lib/api/route-handler';
import { acknowledgeRevision } from '@/lib/delivery/acknowledge-revision';

export const dynamic = 'force-dynamic';

/** The customer acknowledges receipt: {letter, acknowledgedAt} (the first acknowledgement counts). */
export const POST = withActor<{ id: string; letter: string }>(async ({ actor, params }) =>
  acknowledgeRevision(actor, parseId(params.id, 'id'), params.letter),
);
