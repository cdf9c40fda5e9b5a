import { withActor, parseId } from '@/lib/api/route-handler';
import { notFound } from '@/lib/api/errors';
import { downloadRevisionOrbitMessage } from '@/lib/revisions/download-revision-orbit-message';
import { orbitMessageResponse } from '@/lib/orbit-exports/orbit-message-response';

export const dynamic = 'force-dynamic';

/** `…/revisions/:letter/opm` and `…/oem`: the frozen revision's stored CCSDS OPM or OEM (KVN), the same text every time, with its SHA-256. */
export const GET = withActor<{ id: string; letter: string; message: string }>(async ({ actor, params }) => {
  if (params.message !== 'opm' && params.message !== 'oem') throw notFound(`“${params.message.slice(0, 20)}”`);
  return orbitMessageResponse(
    await downloadRevisionOrbitMessage(actor, parseId(params.id, 'id'), params.letter, params.message),
  );
});
