import { z } from 'zod';
import { withActor, parseJsonBody } from '@/lib/api/route-handler';
import { assertGlobal } from '@/lib/auth/permissions';
import { exportBlockOpm } from '@/lib/orbit-exports/export-block-opm';
import { orbitMessageResponse } from '@/lib/orbit-exports/orbit-message-response';

export const dynamic = 'force-dynamic';

const opmRequestSchema = z.strictObject({
  kind: z.string({ error: 'kind is required' }).min(1, 'kind is required').max(64),
  inputs: z.record(z.string(), z.unknown(), { error: 'inputs must be an object of named values' }).default({}),
  objectName: z.string().max(80).optional(),
  objectId: z.string().max(64).optional(),
  label: z.string().max(120).optional(),
});

/** POST {kind, inputs, objectName?, objectId?, label?} → the block's dated state as a CCSDS OPM (KVN, EME2000), or 400 naming what is missing. */
export const POST = withActor(async ({ req, actor }) => {
  const body = await parseJsonBody(req, opmRequestSchema);
  assertGlobal(actor, 'calc.run');
  return orbitMessageResponse(await exportBlockOpm(actor.id, body));
});
