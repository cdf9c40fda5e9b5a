import type { TiptapNode } from '@/lib/memos/memo-schema';
import { walk } from '@/lib/documents/extract-calc-blocks';

export interface HeadingInfo {
  /** Destination id for links from the contents ("h-1-2"). */
  id: string;
  /** "1", "1.2", "1.2.3" */
  number: string;
  level: number;
}

/**
 * Numbers headings 1, 1.1, 1.1.1 in document order. A level-2 heading
 * before any level-1 counts as under section 0 ("0.1"), so a number is
 * never skipped or repeated.
 */
export function numberHeadings(doc: TiptapNode): Map<TiptapNode, HeadingInfo> {
  const counters = [0, 0, 0];
  const out = new Map<TiptapNode, HeadingInfo>();
  walk(doc, (node) => {
    if (node.type !== 'heading') return;
    const raw = Number(node.attrs?.level ?? 1);
    const level = Number.isInteger(raw) ? Math.min(Math.max(raw, 1), 3) : 1;
    counters[level - 1]++;
    for (let k = level; k < counters.length; k++) counters[k] = 0;
    const number = counters.slice(0, level).join('.');
    out.set(node, { id: `h-${number.replace(/\./g, '-')}`, number, level });
  });
  return out;
}
