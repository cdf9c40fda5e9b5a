/**
 * The typed visitor: an unknown node type is refused by name at run time,
 * and a visitor that misses a node type of the model does not compile
 * (checked by `tsc --noEmit` over the tests through the @ts-expect-error below).
 */
import { describe, expect, it } from 'vitest';
import { MEMO_NODE_TYPES, type MemoNodeType } from '@/lib/documents/model/node-types';
import { UnknownMemoNodeError, visitMemoNode, type MemoNodeVisitor } from '@/lib/documents/model/visit-memo-node';

const NAMES = Object.fromEntries(
  MEMO_NODE_TYPES.map((t) => [t, (n: { type: string }) => `saw ${n.type}`]),
) as MemoNodeVisitor<[], string>;

describe('visitMemoNode', () => {
  it('calls the handler of the node type', () => {
    expect(visitMemoNode(NAMES, { type: 'figureRef', attrs: { figureId: 'f1' } })).toBe('saw figureRef');
  });

  it('refuses a type outside the model, naming it', () => {
    expect(() => visitMemoNode(NAMES, { type: 'mathBlock' })).toThrow(UnknownMemoNodeError);
    expect(() => visitMemoNode(NAMES, { type: 'mathBlock' })).toThrow(/"mathBlock"/);
  });

  it('is typed so that a visitor missing a node type does not compile', () => {
    const { calcBlock: _dropped, ...partial } = NAMES;
    // @ts-expect-error — calcBlock has no handler
    const incomplete: MemoNodeVisitor<[], string> = partial;
    expect(Object.keys(incomplete)).not.toContain('calcBlock');
    const all: MemoNodeType[] = [...MEMO_NODE_TYPES];
    expect(all.every((t) => t in NAMES)).toBe(true);
  });
});
