import type { CalcResult } from '@/lib/calc';
import type { TiptapNode } from '@/lib/memos/memo-schema';
import { calcRequestKey } from './calc-request-key';
import { evaluateDocument } from './evaluate-document';

/**
 * The server's results for a stored document, keyed as the editor's SWR
 * requests are, so a memo opens with its numbers already computed.
 */
export function initialResults(doc: TiptapNode): Record<string, CalcResult> {
  const out: Record<string, CalcResult> = {};
  for (const e of evaluateDocument(doc).values()) {
    if (e.status === 'ok') out[calcRequestKey(e.block.kind, e.requestedInputs)] = e.result;
  }
  return out;
}
