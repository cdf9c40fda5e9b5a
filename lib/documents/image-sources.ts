import type { TiptapNode } from '@/lib/memos/memo-schema';
import { walk } from './extract-calc-blocks';

/** The src of every image node of a document, once each, in document order. */
export function imageSources(doc: TiptapNode): Set<string> {
  const sources = new Set<string>();
  walk(doc, (n) => {
    if (n.type === 'image' && typeof n.attrs?.src === 'string') sources.add(n.attrs.src);
  });
  return sources;
}
