import { withActor, parseJsonBody } from '@/lib/api/route-handler';
import { assertGlobal } from '@/lib/auth/permissions';
import { getOrganisation } from '@/lib/organisation/get-organisation';
import { updateOrganisation } from '@/lib/organisation/update-organisation';
import { organisationInputSchema } from '@/lib/organisation/organisation-schema';

export const dynamic = 'force-dynamic';

export const GET = withActor(async ({ actor }) => {
  assertGlobal(actor, 'organisation.manage');
  return getOrganisation();
});

export const PUT = withActor(async ({ req, actor }) => {
  assertGlobal(actor, 'organisation.manage');
  const input = await parseJsonBody(req, organisationInputSchema);
  return updateOrganisation(actor, input);
});
