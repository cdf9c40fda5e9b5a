import { withoutActor, parseJsonBody } from '@/lib/api/route-handler';
import { completePasswordResetInputSchema } from '@/lib/delivery/delivery-schema';
import { completePasswordReset } from '@/lib/delivery/complete-password-reset';

export const dynamic = 'force-dynamic';

/** POST {token, password}: sets the new password; {email} to sign in with. */
export const POST = withoutActor(async ({ req }) =>
  completePasswordReset(await parseJsonBody(req, completePasswordResetInputSchema)),
);
