import type { TiptapNode } from '@/lib/memos/memo-schema';
import { conditionText } from '@/lib/requirements/check-requirements';
import { documentIndex, type DocumentIndex } from './model/document-index';
import { isMemoNodeType } from './model/node-types';
import { visitMemoNode, type MemoNodeVisitor } from './model/visit-memo-node';

interface PlainTextContext {
  out: string[];
  index: DocumentIndex;
  quote: (blockId: string, output: string) => string;
}

/** A type outside the model (a version stored before the save-time check) contributes its children's text, so old versions still compare. */
const visit = (n: TiptapNode, ctx: PlainTextContext): void =>
  isMemoNodeType(n.type) ? visitMemoNode(PLAIN_TEXT, n, ctx) : children(n, ctx);
const children = (n: TiptapNode, ctx: PlainTextContext) => {
  for (const c of n.content ?? []) visit(c, ctx);
};
/** A block of text: its content, then a blank line. */
const block = (n: TiptapNode, ctx: PlainTextContext) => {
  children(n, ctx);
  ctx.out.push('\n\n');
};
/** A cell: its content, then a column separator. */
const cell = (n: TiptapNode, ctx: PlainTextContext) => {
  children(n, ctx);
  ctx.out.push(' | ');
};

/** The plain-text form of every node type (a new type does not compile until it has one). */
const PLAIN_TEXT: MemoNodeVisitor<[PlainTextContext], void> = {
  doc: children,
  text: (n, ctx) => void ctx.out.push(n.text ?? ''),
  hardBreak: (_n, ctx) => void ctx.out.push('\n'),
  liveValue: (n, ctx) => void ctx.out.push(ctx.quote(String(n.attrs?.blockId ?? ''), String(n.attrs?.output ?? ''))),
  figureRef: (n, ctx) => {
    const number = ctx.index.figureNumbers.get(String(n.attrs?.figureId ?? ''));
    ctx.out.push(number ? `Figure ${number}` : '[missing figure]');
  },
  calcBlock: (n, ctx) => void ctx.out.push(`[calc block: ${String(n.attrs?.label || n.attrs?.kind || '')}]\n\n`),
  figure: (n, ctx) => void ctx.out.push(`[figure: ${String(n.attrs?.caption ?? '')}]\n\n`),
  requirement: (n, ctx) =>
    void ctx.out.push(
      `[requirement ${String(n.attrs?.requirementId ?? '')}: ${String(n.attrs?.text ?? '')} (${conditionText({ comparison: n.attrs?.comparison ?? 'le', threshold: n.attrs?.threshold ?? '', tolerance: n.attrs?.tolerance ?? '' }, null)})]\n\n`,
    ),
  complianceTable: (_n, ctx) => void ctx.out.push('[compliance table]\n\n'),
  paragraph: block,
  heading: block,
  listItem: block,
  blockquote: block,
  codeBlock: block,
  tableRow: block,
  horizontalRule: block,
  image: block,
  bulletList: children,
  orderedList: children,
  table: children,
  tableCell: cell,
  tableHeader: cell,
};

/**
 * The readable text of a document for comparison: paragraphs separated by
 * blank lines, live values as the text they show (from `quote`), calc blocks
 * and figures as a short bracketed marker.
 */
export function docPlainText(doc: TiptapNode, quote: (blockId: string, output: string) => string): string {
  const ctx: PlainTextContext = { out: [], index: documentIndex(doc), quote };
  visit(doc, ctx);
  return ctx.out
    .join('')
    .replace(/\n{3,}/g, '\n\n')
    .trim();
}

/**
 * The readable text of one node of a document (a paragraph, a table cell),
 * as docPlainText gives it; `index` is the whole document's, so figure
 * numbers are the document's own.
 */
export function nodePlainText(
  node: TiptapNode,
  index: DocumentIndex,
  quote: (blockId: string, output: string) => string,
): string {
  const ctx: PlainTextContext = { out: [], index, quote };
  visit(node, ctx);
  return ctx.out
    .join('')
    .replace(/\n{3,}/g, '\n\n')
    .replace(/ \| $/, '')
    .trim();
}
