import { after, NextResponse } from 'next/server';
import { withoutActor, parseJsonBody } from '@/lib/api/route-handler';
import { requestPasswordResetInputSchema } from '@/lib/delivery/delivery-schema';
import { requestPasswordReset } from '@/lib/delivery/request-password-reset';
import { clientAddress } from '@/lib/throttle/client-address';

export const dynamic = 'force-dynamic';

/**
 * POST {email}: 202 {accepted: true} for every address (429 when throttled);
 * the lookup and the message run after the response (`after`).
 */
export const POST = withoutActor(async ({ req }) => {
  const { email } = await parseJsonBody(req, requestPasswordResetInputSchema);
  await requestPasswordReset(email, clientAddress(req.headers), after);
  return NextResponse.json({ accepted: true }, { status: 202 });
});
