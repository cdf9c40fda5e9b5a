import { Plugin, PluginKey } from '@tiptap/pm/state';

/**
 * Keeps an id attribute unique among the nodes of one type: after any
 * change, a node whose id is empty or already used earlier in the document
 * (pasted, duplicated) gets a fresh one from `newId`, which is told every id
 * already in use.
 */
export function uniqueIdPlugin(nodeName: string, attr: string, newId: (taken: ReadonlySet<string>) => string): Plugin {
  return new Plugin({
    key: new PluginKey(`${nodeName}UniqueIds`),
    appendTransaction: (transactions, _old, state) => {
      if (!transactions.some((t) => t.docChanged)) return null;
      const seen = new Set<string>();
      const taken = new Set<string>();
      state.doc.descendants((node) => {
        if (node.type.name === nodeName) taken.add(String(node.attrs[attr] ?? ''));
      });
      const tr = state.tr;
      state.doc.descendants((node, pos) => {
        if (node.type.name !== nodeName) return;
        const id = String(node.attrs[attr] ?? '');
        if (id && !seen.has(id)) seen.add(id);
        else {
          const fresh = newId(taken);
          taken.add(fresh);
          tr.setNodeMarkup(pos, undefined, { ...node.attrs, [attr]: fresh });
        }
      });
      return tr.docChanged ? tr : null;
    },
  });
}
