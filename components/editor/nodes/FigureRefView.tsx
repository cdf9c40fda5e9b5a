'use client';

import { NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import { editorDocumentIndex } from '@/lib/documents/model/document-index-plugin';

/** "Figure n" for the referenced figure, by document order; a clear broken mark when it is gone. */
export function FigureRefView({ node, editor, selected }: ReactNodeViewProps) {
  const figureId = String(node.attrs.figureId ?? '');
  const found = editorDocumentIndex(editor.state).figureNumbers.get(figureId) ?? 0;
  const ring = selected ? ' ring-2 ring-orbit-500' : '';
  if (!found) {
    return (
      <NodeViewWrapper
        as="span"
        className={`rounded-chip border border-dashed border-ember-500 bg-ember-50 px-1 text-ember-700${ring}`}
        title="Broken figure reference: the figure was removed"
        data-figure-ref="broken"
      >
        ⚠ missing figure
      </NodeViewWrapper>
    );
  }
  return (
    <NodeViewWrapper as="span" className={`rounded-chip bg-orbit-50 px-1 text-orbit-700${ring}`} data-figure-ref="ok">
      <a
        href={`#figure-${figureId}`}
        className="underline decoration-1 underline-offset-2"
        onClick={(e) => {
          e.preventDefault();
          document
            .querySelector(`[data-figure-id="${figureId}"]`)
            ?.scrollIntoView({ behavior: 'smooth', block: 'center' });
        }}
      >
        Figure {found}
      </a>
    </NodeViewWrapper>
  );
}
