import { withoutActor, parseJsonBody } from '@/lib/api/route-handler';
import { acceptInvitationInputSchema } from '@/lib/delivery/delivery-schema';
import { acceptInvitation } from '@/lib/delivery/accept-invitation';

export const dynamic = 'force-dynamic';

/** POST {token, name, password}: activates the invited account; {email} to sign in with. */
export const POST = withoutActor(async ({ req }) =>
  acceptInvitation(await parseJsonBody(req, acceptInvitationInputSchema)),
);
