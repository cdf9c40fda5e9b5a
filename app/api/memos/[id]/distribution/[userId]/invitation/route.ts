import { withActor, parseId } from '@/lib/api/route-handler';
import { resendInvitation } from '@/lib/delivery/resend-invitation';

export const dynamic = 'force-dynamic';

/** Mails a fresh invitation to a contact who has not accepted yet: {sent} or {sent: false, error}. */
export const POST = withActor<{ id: string; userId: string }>(async ({ actor, params }) =>
  resendInvitation(actor, parseId(params.id, 'id'), parseId(params.userId, 'userId')),
);
