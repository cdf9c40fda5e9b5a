import type { TiptapNode } from '@/lib/memos/memo-schema';
import type { MemoNode, MemoNodeOf } from './memo-node';
import { isMemoNodeType, MEMO_NODE_TYPES, type MemoNodeType } from './node-types';

/**
 * One handler per node type of MEMO_NODE_TYPES. Being a mapped type over
 * the whole list, a visitor that misses a type does not compile: adding a
 * node type to the model makes the compiler name every walker that must
 * learn it (the PDF, the plain text for comparisons, the comment text).
 */
export type MemoNodeVisitor<Args extends unknown[], R> = {
  [T in MemoNodeType]: (node: MemoNodeOf<T>, ...args: Args) => R;
};

export class UnknownMemoNodeError extends Error {
  constructor(readonly nodeType: string) {
    super(
      `The memo contains a node of type "${nodeType}", which the document model does not know (known node types: ${MEMO_NODE_TYPES.join(', ')}).`,
    );
    this.name = 'UnknownMemoNodeError';
  }
}

/** Calls the visitor's handler for the node's type; a type outside the model throws UnknownMemoNodeError. */
export function visitMemoNode<Args extends unknown[], R>(
  visitor: MemoNodeVisitor<Args, R>,
  node: TiptapNode,
  ...args: Args
): R {
  if (!isMemoNodeType(node.type)) throw new UnknownMemoNodeError(node.type);
  const handler = visitor[node.type] as (n: MemoNode, ...a: Args) => R;
  return handler(node as MemoNode, ...args);
}
