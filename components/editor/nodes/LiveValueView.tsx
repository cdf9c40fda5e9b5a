'use client';

import { NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import type { LiveValueAttrs } from '@/lib/documents/calc-nodes';
import { formatValue } from '@/lib/format/format-output';
import { useBlockState, useCalcContext, usePresentBlock } from '../calc/calc-context';

/** A live value inside a sentence: the block's current output, or a clear broken mark. */
export function LiveValueView({ node, selected }: ReactNodeViewProps) {
  const { blockId, output } = node.attrs as LiveValueAttrs;
  const { kinds } = useCalcContext();
  const block = usePresentBlock(blockId);
  const state = useBlockState(blockId);
  const field = block ? kinds.get(block.kind)?.outputs.find((o) => o.name === output) : undefined;
  const ring = selected ? ' ring-2 ring-orbit-500' : '';

  if (!block || !field) {
    const why = !block ? 'its calc block was removed' : `the block no longer has the output “${output}”`;
    return (
      <NodeViewWrapper
        as="span"
        className={`live-value-broken rounded-chip border border-dashed border-ember-500 bg-ember-50 px-1 text-ember-700${ring}`}
        title={`Broken live value: ${why}`}
        data-live-value="broken"
      >
        ⚠ missing value
      </NodeViewWrapper>
    );
  }
  const result = state?.status === 'ok' ? state.result : state?.lastGood;
  const value = result?.outputs[output];
  const label = `${field.label} from ${block.label || block.kind}`;
  if (value === undefined) {
    const failed = state && (state.status === 'error' || state.status === 'waiting');
    return (
      <NodeViewWrapper
        as="span"
        className={`rounded-chip px-1 font-mono ${failed ? 'border border-dashed border-ember-500 text-ember-700' : 'bg-paper-sunk text-ink-faint'}${ring}`}
        title={label}
        data-live-value={failed ? 'error' : 'pending'}
      >
        {failed ? '⚠ not computed' : '…'}
      </NodeViewWrapper>
    );
  }
  return (
    <NodeViewWrapper
      as="span"
      className={`computed${state?.status === 'ok' ? '' : ' opacity-60'}${ring}`}
      title={label}
      data-live-value="ok"
    >
      {formatValue(value, field.unit, field.precision)}
    </NodeViewWrapper>
  );
}
