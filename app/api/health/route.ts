import { NextResponse } from 'next/server';

export const dynamic = 'force-dynamic';

/**
 * Liveness for a load balancer, and the floor of `npm run bench:load`: the
 * cost of a route handler in this app with no session, database or work.
 */
export function GET() {
  return NextResponse.json({ ok: true });
}
