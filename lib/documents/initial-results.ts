import type { CalcResult } from '@/lib/calc';
import { ApiError } from '@/lib/api/errors';
import { evaluateDocumentJob } from '@/lib/jobs/evaluate-document-job';
import type { TiptapNode } from '@/lib/memos/memo-schema';
import { calcRequestKey } from './calc-request-key';

/**
 * The server's results for a stored document, keyed as the editor's SWR
 * requests are, so a memo opens with its numbers already computed. When
 * the heavy blocks cannot be computed now (the person's job limit, a busy
 * pool, the time budget) the page opens without initial results and the
 * editor asks for each block itself, where the reason is shown.
 */
export async function initialResults(userId: number, doc: TiptapNode): Promise<Record<string, CalcResult>> {
  const out: Record<string, CalcResult> = {};
  let evaluations;
  try {
    evaluations = await evaluateDocumentJob(userId, doc);
  } catch (err) {
    if (err instanceof ApiError) return out;
    throw err;
  }
  for (const e of evaluations.values()) {
    if (e.status === 'ok') out[calcRequestKey(e.block.kind, e.requestedInputs)] = e.result;
  }
  return out;
}
