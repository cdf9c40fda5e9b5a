import type { TiptapNode } from '@/lib/memos/memo-schema';
import { CALC_BLOCK, LIVE_VALUE, calcBlockAttrsSchema, type CalcBlockAttrs, type LiveValueAttrs } from './calc-nodes';

export interface ExtractedBlocks {
  blocks: CalcBlockAttrs[];
  /** Blocks whose stored attributes are malformed, with the reason. */
  invalid: { index: number; message: string }[];
  /** A block id used twice: the second one is reported, not evaluated. */
  duplicates: string[];
}

/** Every calc block of a document, in document order. */
export function extractCalcBlocks(doc: TiptapNode): ExtractedBlocks {
  const out: ExtractedBlocks = { blocks: [], invalid: [], duplicates: [] };
  const seen = new Set<string>();
  let index = 0;
  walk(doc, (node) => {
    if (node.type !== CALC_BLOCK) return;
    const parsed = calcBlockAttrsSchema.safeParse(node.attrs ?? {});
    if (!parsed.success) {
      out.invalid.push({ index, message: parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ') });
    } else if (seen.has(parsed.data.blockId)) {
      out.duplicates.push(parsed.data.blockId);
    } else {
      seen.add(parsed.data.blockId);
      out.blocks.push(parsed.data);
    }
    index++;
  });
  return out;
}

/** Every live value of a document, in document order. */
export function extractLiveValues(doc: TiptapNode): LiveValueAttrs[] {
  const out: LiveValueAttrs[] = [];
  walk(doc, (node) => {
    if (node.type === LIVE_VALUE) out.push({ blockId: String(node.attrs?.blockId ?? ''), output: String(node.attrs?.output ?? '') });
  });
  return out;
}

export function walk(node: TiptapNode, visit: (n: TiptapNode) => void): void {
  visit(node);
  for (const child of node.content ?? []) walk(child, visit);
}
