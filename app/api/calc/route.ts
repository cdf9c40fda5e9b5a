import { z } from 'zod';
import { withActor, parseJsonBody } from '@/lib/api/route-handler';
import { assertGlobal } from '@/lib/auth/permissions';
import { ApiError } from '@/lib/api/errors';
import { runCalcJob } from '@/lib/jobs/run-calc-job';

export const dynamic = 'force-dynamic';

const calcRequestSchema = z.strictObject({
  kind: z.string({ error: 'kind is required' }).min(1, 'kind is required').max(64),
  inputs: z.record(z.string(), z.unknown(), { error: 'inputs must be an object of named values' }).default({}),
});

/**
 * POST {kind, inputs} → the engine's result, or 400 {error, fields} naming the bad input.
 * A heavy kind runs in the worker pool: 429 over the per-user limit, 422 naming the inputs to reduce when it runs out of time.
 */
export const POST = withActor(async ({ req, actor }) => {
  const body = await parseJsonBody(req, calcRequestSchema);
  assertGlobal(actor, 'calc.run');
  const outcome = await runCalcJob(actor.id, body.kind, body.inputs);
  if (!outcome.ok) throw new ApiError('bad_request', outcome.error, { fields: outcome.fields });
  return outcome.result;
});
