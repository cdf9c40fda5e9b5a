import { Extension } from '@tiptap/core';
import type { EditorState } from '@tiptap/pm/state';
import { Plugin, PluginKey } from '@tiptap/pm/state';
import type { TiptapNode } from '@/lib/memos/memo-schema';
import { buildDocumentIndex, type DocumentIndex } from './document-index';

const documentIndexKey = new PluginKey<DocumentIndex>('documentIndex');

/**
 * Keeps the editor's DocumentIndex in the editor state: built when the
 * document is loaded and again after each transaction that changes it
 * (never on a selection move), so node views and the toolbar look a figure
 * number up instead of walking the document on every render.
 */
export const DocumentIndexExtension = Extension.create({
  name: 'documentIndex',
  addProseMirrorPlugins() {
    return [
      new Plugin<DocumentIndex>({
        key: documentIndexKey,
        state: {
          init: (_config, state) => buildDocumentIndex(state.doc.toJSON() as TiptapNode),
          apply: (tr, previous, _old, state) =>
            tr.docChanged ? buildDocumentIndex(state.doc.toJSON() as TiptapNode) : previous,
        },
      }),
    ];
  },
});

/** The index of the editor's current document. */
export function editorDocumentIndex(state: EditorState): DocumentIndex {
  return documentIndexKey.getState(state) ?? buildDocumentIndex(state.doc.toJSON() as TiptapNode);
}
