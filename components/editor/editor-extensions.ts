import { ReactNodeViewRenderer } from '@tiptap/react';
import type { Extensions } from '@tiptap/core';
import { Placeholder } from '@tiptap/extensions';
import { memoExtensions } from '@/lib/documents/model/memo-extensions';
import { CalcBlockView } from './nodes/CalcBlockView';
import { LiveValueView } from './nodes/LiveValueView';
import { FigureView } from './nodes/FigureView';
import { FigureRefView } from './nodes/FigureRefView';
import { RequirementView } from './nodes/RequirementView';
import { ComplianceTableView } from './nodes/ComplianceTableView';
import { COMPLIANCE_TABLE, REQUIREMENT } from '@/lib/requirements/requirement-attrs';
import { ImageView } from './nodes/ImageView';
import { FIGURE_REF } from '@/lib/documents/model/nodes/figure-ref';
import { FIGURE } from '@/lib/figures/figure-nodes';
import { CALC_BLOCK, LIVE_VALUE } from '@/lib/documents/calc-nodes';

/** What an empty memo says where the text would start (editor only; it adds nothing to the document). */
export const EMPTY_MEMO_PLACEHOLDER =
  'Start the memo here: a section heading (Ctrl+Alt+1), text, or a calc block (Ctrl+Alt+K)…';

/** The shared extension list with the editor's React node views and the empty-memo placeholder added (the schema stays the same). */
export function editorExtensions(): Extensions {
  const withViews = memoExtensions().map((ext) => {
    if (ext.name === CALC_BLOCK) return ext.extend({ addNodeView: () => ReactNodeViewRenderer(CalcBlockView) });
    if (ext.name === FIGURE_REF)
      return ext.extend({ addNodeView: () => ReactNodeViewRenderer(FigureRefView, { as: 'span' }) });
    if (ext.name === FIGURE) return ext.extend({ addNodeView: () => ReactNodeViewRenderer(FigureView) });
    if (ext.name === LIVE_VALUE)
      return ext.extend({ addNodeView: () => ReactNodeViewRenderer(LiveValueView, { as: 'span' }) });
    if (ext.name === REQUIREMENT) return ext.extend({ addNodeView: () => ReactNodeViewRenderer(RequirementView) });
    if (ext.name === COMPLIANCE_TABLE)
      return ext.extend({ addNodeView: () => ReactNodeViewRenderer(ComplianceTableView) });
    if (ext.name === 'image') return ext.extend({ addNodeView: () => ReactNodeViewRenderer(ImageView) });
    return ext;
  });
  return [
    ...withViews,
    Placeholder.configure({ placeholder: EMPTY_MEMO_PLACEHOLDER, showOnlyWhenEditable: true, includeChildren: false }),
  ];
}
