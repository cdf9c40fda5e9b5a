import { getCalcKind } from '@/lib/calc';
import type { BlockEvaluation } from '@/lib/documents/evaluate-document';
import { formatValue } from '@/lib/format/format-output';

export type LiveValueText = { ok: true; text: string } | { ok: false; reason: string };

/** A live value as printed: the block's current output at display precision with its unit, or why it cannot be shown. */
export function describeLiveValue(
  attrs: Record<string, unknown> | undefined,
  evaluations: ReadonlyMap<string, BlockEvaluation>,
): LiveValueText {
  const blockId = typeof attrs?.blockId === 'string' ? attrs.blockId : '';
  const output = typeof attrs?.output === 'string' ? attrs.output : '';
  const evaluation = evaluations.get(blockId);
  // Reasons name blocks by label (or kind title), never by internal id or output name: they are printed for the reader.
  if (!evaluation) return { ok: false, reason: 'the calc block it quotes is no longer in the memo' };
  const name = evaluation.block.label || getCalcKind(evaluation.block.kind)?.title || 'its calc block';
  if (evaluation.status === 'error') return { ok: false, reason: `${name} has no result` };
  const field = getCalcKind(evaluation.result.kind)?.outputs.find((o) => o.name === output);
  const value = evaluation.result.outputs[output];
  if (!field || value === undefined) return { ok: false, reason: `${name} no longer has the quoted result` };
  return { ok: true, text: formatValue(value, field.unit, field.precision) };
}
