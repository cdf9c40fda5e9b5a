import { withActor } from '@/lib/api/route-handler';
import { listPortalRevisions } from '@/lib/delivery/list-portal-revisions';

export const dynamic = 'force-dynamic';

/** The signed-in customer's released revisions, newest first. */
export const GET = withActor(async ({ actor }) => ({ revisions: await listPortalRevisions(actor) }));
