import { getCalcKind, runCalc, type CalcResult } from '@/lib/calc';
import type { TiptapNode } from '@/lib/memos/memo-schema';
import { getOrThrow } from '../collections/get-or-throw';
import { blockName, type CalcBlockAttrs } from './calc-nodes';
import { documentIndex } from './model/document-index';
import { resolveBlockInputs } from './resolve-block-inputs';

export type BlockEvaluation =
  | {
      blockId: string;
      status: 'ok';
      block: CalcBlockAttrs;
      result: CalcResult;
      requestedInputs: Record<string, unknown>;
    }
  | { blockId: string; status: 'error'; block: CalcBlockAttrs; error: string; fields: Record<string, string> };

/**
 * Recomputes every calc block of a stored document on the server, in
 * dependency order (the read view, PDF and freeze all use this; a client
 * never supplies a number).
 */
export function evaluateDocument(doc: TiptapNode): Map<string, BlockEvaluation> {
  const {
    calc: { blocks },
    blockOrder,
  } = documentIndex(doc);
  const byId = new Map(blocks.map((b) => [b.blockId, b]));
  const { order, cyclic } = blockOrder;
  const results = new Map<string, CalcResult | undefined>();
  const out = new Map<string, BlockEvaluation>();

  for (const id of order) {
    const block = getOrThrow(byId, id, 'calc block');
    const kind = getCalcKind(block.kind);
    if (!kind) {
      out.set(id, {
        blockId: id,
        status: 'error',
        block,
        error: `unknown calc kind "${block.kind}"`,
        fields: { kind: `unknown calc kind "${block.kind}"` },
      });
      continue;
    }
    const resolved = resolveBlockInputs(block, kind, results, byId);
    if (!resolved.ok) {
      out.set(id, { blockId: id, status: 'error', block, error: resolved.error, fields: resolved.fields });
      continue;
    }
    const outcome = runCalc(block.kind, resolved.inputs);
    if (outcome.ok) {
      results.set(id, outcome.result);
      out.set(id, { blockId: id, status: 'ok', block, result: outcome.result, requestedInputs: resolved.inputs });
    } else {
      out.set(id, { blockId: id, status: 'error', block, error: outcome.error, fields: outcome.fields });
    }
  }
  for (const [id, message] of cyclic) {
    const block = getOrThrow(byId, id, 'calc block');
    out.set(id, {
      blockId: id,
      status: 'error',
      block,
      error: `${blockName(block)}: ${message}`,
      fields: { _: message },
    });
  }
  return out;
}
