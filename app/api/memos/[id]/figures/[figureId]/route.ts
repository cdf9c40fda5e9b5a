import { parseId, parseWith, withActor } from '@/lib/api/route-handler';
import { blockIdSchema } from '@/lib/documents/calc-nodes';
import { getMemoFigure } from '@/lib/figures/get-memo-figure';

export const dynamic = 'force-dynamic';

export const GET = withActor<{ id: string; figureId: string }>(async ({ actor, params }) =>
  getMemoFigure(actor, parseId(params.id, 'id'), parseWith(blockIdSchema, params.figureId)),
);
