import { NextResponse } from 'next/server';
import { withActor, parseJsonBody, parseId } from '@/lib/api/route-handler';
import { addContactInputSchema } from '@/lib/delivery/delivery-schema';
import { listDistribution } from '@/lib/delivery/list-distribution';
import { addDistributionContact } from '@/lib/delivery/add-distribution-contact';

export const dynamic = 'force-dynamic';

/** The memo's distribution list (staff). */
export const GET = withActor<{ id: string }>(async ({ actor, params }) => ({
  contacts: await listDistribution(actor, parseId(params.id, 'id')),
}));

/** POST {userId} (a customer account) or {email, name} (invite): configuration managers. */
export const POST = withActor<{ id: string }>(async ({ req, actor, params }) => {
  const memoId = parseId(params.id, 'id');
  const input = await parseJsonBody(req, addContactInputSchema);
  return NextResponse.json(await addDistributionContact(actor, memoId, input), { status: 201 });
});
