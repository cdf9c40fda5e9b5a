import type { CalcKindDescriptor, CalcResult } from '@/lib/calc';
import { blockName, isRef, type CalcBlockAttrs } from './calc-nodes';
import { parseInputText } from './parse-input-text';
import { phraseInputProblems } from './phrase-input-problem';

export type ResolvedInputs =
  { ok: true; inputs: Record<string, unknown> } | { ok: false; error: string; fields: Record<string, string> };

/**
 * Turns a block's stored inputs into the engine's inputs: typed text is
 * parsed with its unit, references take the current value of another
 * block's output. `results` holds the results of upstream blocks.
 */
export function resolveBlockInputs(
  block: CalcBlockAttrs,
  kind: CalcKindDescriptor,
  results: ReadonlyMap<string, CalcResult | undefined>,
  blocksById: ReadonlyMap<string, CalcBlockAttrs>,
): ResolvedInputs {
  const inputs: Record<string, unknown> = {};
  const fields: Record<string, string> = {};
  for (const [name, entry] of Object.entries(block.inputs)) {
    const field = kind.inputs.find((f) => f.name === name);
    if (!field) continue; // an input the kind no longer has (e.g. after changing kind) is ignored
    if (isRef(entry)) {
      const upstream = blocksById.get(entry.ref.blockId);
      const result = results.get(entry.ref.blockId);
      if (!upstream) {
        fields[name] = `refers to a block that is no longer in the memo`;
      } else if (!result) {
        fields[name] = `waits for ${blockName(upstream)}, which has no result`;
      } else {
        const value = result.outputs[entry.ref.output];
        if (typeof value === 'number' || typeof value === 'string') inputs[name] = value;
        else fields[name] = `${blockName(upstream)} has no output ${entry.ref.output}`;
      }
      continue;
    }
    const parsed = parseInputText(field, entry.text);
    if (!parsed.ok) fields[name] = parsed.message;
    else if (parsed.value !== undefined) inputs[name] = parsed.value;
  }
  if (Object.keys(fields).length > 0) {
    return { ok: false, error: `Check the inputs. ${phraseInputProblems(kind, fields).join(' ')}`, fields };
  }
  return { ok: true, inputs };
}
