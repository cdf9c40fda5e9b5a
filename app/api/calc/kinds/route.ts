import { withActor } from '@/lib/api/route-handler';
import { assertGlobal } from '@/lib/auth/permissions';
import { engineVersion, listCalcKinds } from '@/lib/calc';

export const dynamic = 'force-dynamic';

/** The registry's kinds (inputs with units, defaults and bounds; outputs; model notes). */
export const GET = withActor(async ({ actor }) => {
  assertGlobal(actor, 'calc.run');
  return { engineVersion, kinds: listCalcKinds() };
});
