import { getCalcKind } from '@/lib/calc';
import { blockName } from '@/lib/documents/calc-nodes';
import type { BlockEvaluation } from '@/lib/documents/evaluate-document';
import type { OutputLookup } from './check-requirements';

/** What a lookup reads of a block's result: its kind and outputs (a live CalcResult or a frozen block). */
type BlockOutputs = { kind: string; outputs: Record<string, unknown> };

/** Reads outputs from results by block id, each with the block's name. */
export function lookupInResults(
  results: ReadonlyMap<string, { result: BlockOutputs; name: string } | undefined>,
): OutputLookup {
  return (blockId, output) => {
    const entry = results.get(blockId);
    if (!entry) return { ok: false, reason: `block ${blockId} has no result` };
    const field = getCalcKind(entry.result.kind)?.outputs.find((o) => o.name === output);
    if (!field) return { ok: false, reason: `${entry.name} has no output ${output}` };
    return { ok: true, block: entry.name, output: { field, value: entry.result.outputs[output] } };
  };
}

/** Reads outputs from a document's server evaluations (PDF, submit, freeze, re-verification). */
export function lookupInEvaluations(evaluations: ReadonlyMap<string, BlockEvaluation>): OutputLookup {
  const results = new Map<string, { result: BlockOutputs; name: string } | undefined>();
  for (const [id, e] of evaluations)
    results.set(id, e.status === 'ok' ? { result: e.result, name: e.block.label || blockName(e.block) } : undefined);
  const read = lookupInResults(results);
  return (blockId, output) => {
    const e = evaluations.get(blockId);
    if (!e) return { ok: false, reason: `block ${blockId} is not in the memo` };
    if (e.status === 'error') return { ok: false, reason: `${e.block.label || blockName(e.block)} has no result` };
    return read(blockId, output);
  };
}
