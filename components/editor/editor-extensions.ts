import { ReactNodeViewRenderer } from '@tiptap/react';
import type { Extensions } from '@tiptap/core';
import { memoExtensions } from '@/lib/documents/model/memo-extensions';
import { CalcBlockView } from './nodes/CalcBlockView';
import { LiveValueView } from './nodes/LiveValueView';
import { FigureView } from './nodes/FigureView';
import { FigureRefView } from './nodes/FigureRefView';
import { FIGURE_REF } from '@/lib/documents/model/nodes/figure-ref';
import { FIGURE } from '@/lib/figures/figure-nodes';
import { CALC_BLOCK, LIVE_VALUE } from '@/lib/documents/calc-nodes';

/** The shared extension list with the editor's React node views added (the schema stays the same). */
export function editorExtensions(): Extensions {
  return memoExtensions().map((ext) => {
    if (ext.name === CALC_BLOCK) return ext.extend({ addNodeView: () => ReactNodeViewRenderer(CalcBlockView) });
    if (ext.name === FIGURE_REF) return ext.extend({ addNodeView: () => ReactNodeViewRenderer(FigureRefView, { as: 'span' }) });
    if (ext.name === FIGURE) return ext.extend({ addNodeView: () => ReactNodeViewRenderer(FigureView) });
    if (ext.name === LIVE_VALUE) return ext.extend({ addNodeView: () => ReactNodeViewRenderer(LiveValueView, { as: 'span' }) });
    return ext;
  });
}
