import type { CalcKindDescriptor } from '@/lib/calc';
import type { OutputLookup } from '@/lib/requirements/check-requirements';
import type { CalcStore } from './calc-store';

/** Reads outputs from the editor's results (the current one, else the last good one), as requirements need them. */
export function editorOutputLookup(store: CalcStore, kinds: ReadonlyMap<string, CalcKindDescriptor>): OutputLookup {
  return (blockId, output) => {
    const block = store.block(blockId);
    if (!block) return { ok: false, reason: 'its calc block was removed' };
    const name = block.label || block.kind;
    const field = kinds.get(block.kind)?.outputs.find((o) => o.name === output);
    if (!field) return { ok: false, reason: `${name} has no output ${output}` };
    const result = store.lastGood(blockId);
    if (!result) return { ok: false, reason: `${name} has no result yet` };
    return { ok: true, block: name, output: { field, value: result.outputs[output] } };
  };
}
