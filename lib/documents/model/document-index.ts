import type { TiptapNode } from '@/lib/memos/memo-schema';
import { FIGURE, figureAttrsSchema, type FigureAttrs } from '@/lib/figures/figure-nodes';
import { CALC_BLOCK, LIVE_VALUE, calcBlockAttrsSchema, type CalcBlockAttrs, type LiveValueAttrs } from '../calc-nodes';
import { orderCalcBlocks, type BlockOrder } from '../order-calc-blocks';
import { REQUIREMENT, requirementAttrsSchema, type RequirementAttrs } from '@/lib/requirements/requirement-attrs';
import { walk } from './walk-document';

export interface ExtractedBlocks {
  blocks: CalcBlockAttrs[];
  /** Blocks whose stored attributes are malformed, with the reason. */
  invalid: { index: number; message: string }[];
  /** A block id used twice: the second one is reported, not evaluated. */
  duplicates: string[];
}

export interface HeadingInfo {
  /** Destination id for links from the contents ("h-1-2"). */
  id: string;
  /** "1", "1.2", "1.2.3" */
  number: string;
  level: number;
}

/**
 * The facts about one document that more than one reader needs, found in
 * one walk: the editor's plugins, the PDF, the comparison and the freeze
 * read them here instead of walking the document again (requirement ids
 * and order for the compliance table, figure numbers for references …).
 */
export interface DocumentIndex {
  /** Calc blocks in document order (malformed and repeated ones reported apart). */
  calc: ExtractedBlocks;
  /** Evaluation order and each block's dependencies. */
  blockOrder: BlockOrder;
  /** Live values in document order. */
  liveValues: LiveValueAttrs[];
  /** Well-formed figures in document order (a repeated id is kept once, first wins). */
  figures: FigureAttrs[];
  /** Figure numbers by figure id: the first figure is 1. */
  figureNumbers: Map<string, number>;
  /** Table numbers by table node, in document order: the first table is 1. */
  tableNumbers: Map<TiptapNode, number>;
  /** Heading numbers 1, 1.1, 1.1.1 by heading node. */
  headings: Map<TiptapNode, HeadingInfo>;
  /** The src of every image, once each, in document order. */
  imageSources: Set<string>;
  /** Well-formed requirements in document order (a repeated id is kept once, first wins). */
  requirements: RequirementAttrs[];
}

/**
 * Builds the index in one walk. Headings are numbered 1, 1.1, 1.1.1 in
 * document order; a level-2 heading before any level-1 counts as under
 * section 0 ("0.1"), so a number is never skipped or repeated.
 */
export function buildDocumentIndex(doc: TiptapNode): DocumentIndex {
  const calc: ExtractedBlocks = { blocks: [], invalid: [], duplicates: [] };
  const seenBlocks = new Set<string>();
  let blockIndex = 0;
  const liveValues: LiveValueAttrs[] = [];
  const figures: FigureAttrs[] = [];
  const tableNumbers = new Map<TiptapNode, number>();
  const headings = new Map<TiptapNode, HeadingInfo>();
  const headingCounters = [0, 0, 0];
  const imageSources = new Set<string>();
  const requirements: RequirementAttrs[] = [];

  walk(doc, (node) => {
    switch (node.type) {
      case CALC_BLOCK: {
        const parsed = calcBlockAttrsSchema.safeParse(node.attrs ?? {});
        if (!parsed.success)
          calc.invalid.push({
            index: blockIndex,
            message: parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; '),
          });
        else if (seenBlocks.has(parsed.data.blockId)) calc.duplicates.push(parsed.data.blockId);
        else {
          seenBlocks.add(parsed.data.blockId);
          calc.blocks.push(parsed.data);
        }
        blockIndex++;
        return;
      }
      case LIVE_VALUE:
        liveValues.push({ blockId: String(node.attrs?.blockId ?? ''), output: String(node.attrs?.output ?? '') });
        return;
      case FIGURE: {
        const parsed = figureAttrsSchema.safeParse(node.attrs ?? {});
        if (parsed.success && !figures.some((f) => f.figureId === parsed.data.figureId)) figures.push(parsed.data);
        return;
      }
      case REQUIREMENT: {
        const parsed = requirementAttrsSchema.safeParse(node.attrs ?? {});
        if (parsed.success && !requirements.some((r) => r.requirementId === parsed.data.requirementId))
          requirements.push(parsed.data);
        return;
      }
      case 'table':
        tableNumbers.set(node, tableNumbers.size + 1);
        return;
      case 'image':
        if (typeof node.attrs?.src === 'string') imageSources.add(node.attrs.src);
        return;
      case 'heading': {
        const raw = Number(node.attrs?.level ?? 1);
        const level = Number.isInteger(raw) ? Math.min(Math.max(raw, 1), 3) : 1;
        headingCounters[level - 1]++;
        for (let k = level; k < headingCounters.length; k++) headingCounters[k] = 0;
        const number = headingCounters.slice(0, level).join('.');
        headings.set(node, { id: `h-${number.replace(/\./g, '-')}`, number, level });
        return;
      }
    }
  });

  return {
    calc,
    blockOrder: orderCalcBlocks(calc.blocks),
    liveValues,
    figures,
    figureNumbers: new Map(figures.map((f, i) => [f.figureId, i + 1])),
    tableNumbers,
    headings,
    imageSources,
    requirements,
  };
}

const cache = new WeakMap<TiptapNode, DocumentIndex>();

/**
 * The index of a stored document, built once per document object. Stored
 * content is never changed in place (a change is a new document: a save,
 * `editor.getJSON()`), so the object is the key; the PDF, the evaluation,
 * the comparison and the freeze of one document share one index.
 */
export function documentIndex(doc: TiptapNode): DocumentIndex {
  let index = cache.get(doc);
  if (!index) {
    index = buildDocumentIndex(doc);
    cache.set(doc, index);
  }
  return index;
}
