import type { TiptapNode } from '@/lib/memos/memo-schema';
import { CALC_BLOCK, LIVE_VALUE } from './calc-nodes';
import { numberFigures } from './number-figures';

const BLOCK_TYPES = new Set(['paragraph', 'heading', 'listItem', 'blockquote', 'codeBlock', 'tableRow', 'horizontalRule', 'image']);

/**
 * The readable text of a document for comparison: paragraphs separated by
 * blank lines, live values as the text they show (from `quote`), calc blocks
 * and figures as a short bracketed marker.
 */
export function docPlainText(doc: TiptapNode, quote: (blockId: string, output: string) => string): string {
  const out: string[] = [];
  const figures = numberFigures(doc);
  const visit = (n: TiptapNode) => {
    if (n.type === 'text') {
      out.push(n.text ?? '');
      return;
    }
    if (n.type === LIVE_VALUE) {
      out.push(quote(String(n.attrs?.blockId ?? ''), String(n.attrs?.output ?? '')));
      return;
    }
    if (n.type === 'figureRef') {
      const number = figures.get(String(n.attrs?.figureId ?? ''));
      out.push(number ? `Figure ${number}` : '[missing figure]');
      return;
    }
    if (n.type === 'hardBreak') {
      out.push('\n');
      return;
    }
    if (n.type === CALC_BLOCK) {
      out.push(`[calc block: ${String(n.attrs?.label || n.attrs?.kind || '')}]\n\n`);
      return;
    }
    if (n.type === 'figure') {
      out.push(`[figure: ${String(n.attrs?.caption ?? '')}]\n\n`);
      return;
    }
    if (n.type === 'tableCell' || n.type === 'tableHeader') {
      for (const c of n.content ?? []) visit(c);
      out.push(' | ');
      return;
    }
    for (const c of n.content ?? []) visit(c);
    if (BLOCK_TYPES.has(n.type)) out.push('\n\n');
  };
  visit(doc);
  return out.join('').replace(/\n{3,}/g, '\n\n').trim();
}
