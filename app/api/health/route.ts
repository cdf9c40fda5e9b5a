import { withoutActor } from '@/lib/api/route-handler';

export const dynamic = 'force-dynamic';

/**
 * Liveness for a load balancer, and the floor of `npm run bench:load`: the
 * cost of a route handler in this app with no session, database or work
 * (through the same wrapper as every anonymous route).
 */
export const GET = withoutActor(async () => ({ ok: true }));
