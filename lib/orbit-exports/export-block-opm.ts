import { badRequest, ApiError } from '@/lib/api/errors';
import { runCalcJob } from '@/lib/jobs/run-calc-job';
import { getOrganisation } from '@/lib/organisation/get-organisation';
import { readStateResult } from '@/lib/orbit-data/read-state-result';
import { writeStateOpm } from '@/lib/orbit-data/write-state-messages';

export interface BlockOpmRequest {
  kind: string;
  inputs: Record<string, unknown>;
  /** Names written into OBJECT_NAME and OBJECT_ID (the memo's title and document number, from the editor). */
  objectName?: string;
  objectId?: string;
  label?: string;
}

/**
 * "Download OPM" of a calc block: the block is computed on the server with the
 * inputs sent (as POST /api/calc does), and its dated state, if it yields one,
 * is written as a CCSDS OPM in EME2000. 400 naming what is missing otherwise.
 */
export async function exportBlockOpm(
  userId: number,
  request: BlockOpmRequest,
  now = new Date(),
): Promise<{ text: string; filename: string }> {
  const outcome = await runCalcJob(userId, request.kind, request.inputs);
  if (!outcome.ok) throw new ApiError('bad_request', outcome.error, { fields: outcome.fields });
  const read = readStateResult(outcome.result);
  if (!read.ok)
    throw badRequest(`No OPM: ${read.reason}.`, { [read.reason.includes('epoch') ? 'epoch' : 'kind']: read.reason });
  const objectId = request.objectId?.trim() || 'UNASSIGNED';
  const text = writeStateOpm(
    {
      // The issuing organisation setting (lib/organisation), as the memo PDFs print it.
      originator: (await getOrganisation()).name,
      creationDate: now,
      objectName: request.objectName?.trim() || 'DESIGN ORBIT',
      objectId,
      comments: [
        `State of calc block "${request.label?.trim() || request.kind}" (${request.kind}), computed ${now.toISOString().slice(0, 19)}Z; not a frozen revision.`,
      ],
    },
    read.state,
  );
  return { text, filename: `${objectId.replace(/[^A-Za-z0-9._-]+/g, '-')}-${request.kind}.opm` };
}
