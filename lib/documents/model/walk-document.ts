import type { TiptapNode } from '@/lib/memos/memo-schema';

/** Calls `visit` on a stored node and every node below it, in document order (depth first). */
export function walk(node: TiptapNode, visit: (n: TiptapNode) => void): void {
  visit(node);
  for (const child of node.content ?? []) walk(child, visit);
}
