import type { TiptapDoc, TiptapNode } from '@/lib/memos/memo-schema';
import { CALC_BLOCK, LIVE_VALUE, type InputEntry } from '@/lib/documents/calc-nodes';
import { COMPLIANCE_TABLE, REQUIREMENT, type Comparison } from '@/lib/requirements/requirement-attrs';

/** Small builders for template documents. */

type Inline = string | TiptapNode;

export const text = (t: string): TiptapNode => ({ type: 'text', text: t });
export const bold = (t: string): TiptapNode => ({ type: 'text', text: t, marks: [{ type: 'bold' }] });

/** A live value quoting `output` of block `blockId`. */
export const value = (blockId: string, output: string): TiptapNode => ({
  type: LIVE_VALUE,
  attrs: { blockId, output },
});

export const p = (...parts: Inline[]): TiptapNode => ({
  type: 'paragraph',
  content: parts.map((x) => (typeof x === 'string' ? text(x) : x)),
});
export const h = (level: 1 | 2 | 3, t: string): TiptapNode => ({
  type: 'heading',
  attrs: { level },
  content: [text(t)],
});
export const bullets = (...items: Inline[][]): TiptapNode => ({
  type: 'bulletList',
  content: items.map((parts) => ({ type: 'listItem', content: [p(...parts)] })),
});

/** Typed input text. */
export const typed = (t: string): InputEntry => ({ text: t });
/** An input fed by another block's output. */
export const from = (blockId: string, output: string): InputEntry => ({ ref: { blockId, output } });

export const calc = (blockId: string, kind: string, label: string, inputs: Record<string, InputEntry>): TiptapNode => ({
  type: CALC_BLOCK,
  attrs: { blockId, kind, label, inputs },
});

/** A figure of `figureKind` drawn from block `blockId` (numbered by document order). */
export const figure = (figureId: string, figureKind: string, blockId: string, caption: string): TiptapNode => ({
  type: 'figure',
  attrs: { figureId, figureKind, blockId, caption },
});

/** A reference to a figure in the text ("Figure 3"). */
export const figureRef = (figureId: string): TiptapNode => ({ type: 'figureRef', attrs: { figureId } });

export const table = (header: string[], rows: string[][]): TiptapNode => ({
  type: 'table',
  content: [
    { type: 'tableRow', content: header.map((c) => ({ type: 'tableHeader', content: [p(c)] })) },
    ...rows.map((r) => ({ type: 'tableRow', content: r.map((c) => ({ type: 'tableCell', content: [p(c)] })) })),
  ],
});

/** A requirement on `output` of block `blockId`: `comparison` against `threshold` (and `tolerance` for within ±), typed with units. */
export const requirement = (
  requirementId: string,
  text: string,
  [blockId, output]: [string, string],
  comparison: Comparison,
  threshold: string,
  tolerance = '',
): TiptapNode => ({
  type: REQUIREMENT,
  attrs: { requirementId, text, blockId, output, comparison, threshold, tolerance },
});

/** The compliance table of every requirement in the memo. */
export const complianceTable = (): TiptapNode => ({ type: COMPLIANCE_TABLE });

export const doc = (...content: TiptapNode[]): TiptapDoc => ({ type: 'doc', content });
