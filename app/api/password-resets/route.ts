import { NextResponse } from 'next/server';
import { withoutActor, parseJsonBody } from '@/lib/api/route-handler';
import { requestPasswordResetInputSchema } from '@/lib/delivery/delivery-schema';
import { requestPasswordReset } from '@/lib/delivery/request-password-reset';

export const dynamic = 'force-dynamic';

/** POST {email}: 202 whether or not the address has an account. */
export const POST = withoutActor(async ({ req }) => {
  const { email } = await parseJsonBody(req, requestPasswordResetInputSchema);
  await requestPasswordReset(email);
  return NextResponse.json({ accepted: true }, { status: 202 });
});
