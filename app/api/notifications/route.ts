import { withActor } from '@/lib/api/route-handler';
import { listNotifications } from '@/lib/comments/list-notifications';

export const dynamic = 'force-dynamic';

export const GET = withActor(async ({ actor }) => listNotifications(actor));
