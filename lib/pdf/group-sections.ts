import type { TiptapNode } from '@/lib/memos/memo-schema';
import type { HeadingInfo } from '@/lib/documents/model/document-index';

/** A numbered heading with everything up to the next heading of the same or a higher level. */
export interface Section {
  heading: TiptapNode;
  info: HeadingInfo;
  children: (TiptapNode | Section)[];
}

export const isSection = (x: TiptapNode | Section): x is Section => 'info' in x;

/**
 * The top-level blocks of a memo as nested sections, so that the PDF outline
 * (react-pdf nests a bookmark under the nearest ancestor that has one) follows
 * the heading levels: 1 › 1.1 › 1.1.1. Blocks before the first heading stay
 * outside any section.
 */
export function groupSections(
  blocks: readonly TiptapNode[],
  headings: ReadonlyMap<TiptapNode, HeadingInfo>,
): (TiptapNode | Section)[] {
  const root: (TiptapNode | Section)[] = [];
  const open: Section[] = [];
  for (const node of blocks) {
    const info = node.type === 'heading' ? headings.get(node) : undefined;
    if (info) {
      while (open.length && open[open.length - 1].info.level >= info.level) open.pop();
      const section: Section = { heading: node, info, children: [node] };
      (open.length ? open[open.length - 1].children : root).push(section);
      open.push(section);
      continue;
    }
    (open.length ? open[open.length - 1].children : root).push(node);
  }
  return root;
}
