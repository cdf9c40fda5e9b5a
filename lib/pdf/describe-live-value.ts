import { getCalcKind } from '@/lib/calc';
import type { BlockEvaluation } from '@/lib/documents/evaluate-document';
import { formatValue } from '@/lib/format/format-output';

export type LiveValueText = { ok: true; text: string } | { ok: false; reason: string };

/** A live value as printed: the block's current output at display precision with its unit, or why it cannot be shown. */
export function describeLiveValue(attrs: Record<string, unknown> | undefined, evaluations: ReadonlyMap<string, BlockEvaluation>): LiveValueText {
  const blockId = typeof attrs?.blockId === 'string' ? attrs.blockId : '';
  const output = typeof attrs?.output === 'string' ? attrs.output : '';
  const evaluation = evaluations.get(blockId);
  if (!evaluation) return { ok: false, reason: `block ${blockId || '(none)'} is not in the memo` };
  if (evaluation.status === 'error') return { ok: false, reason: `${evaluation.block.label || blockId} has no result` };
  const field = getCalcKind(evaluation.result.kind)?.outputs.find((o) => o.name === output);
  const value = evaluation.result.outputs[output];
  if (!field || value === undefined) return { ok: false, reason: `${evaluation.block.label || blockId} has no output ${output || '(none)'}` };
  return { ok: true, text: formatValue(value, field.unit, field.precision) };
}
