import { Node, mergeAttributes } from '@tiptap/core';

export const FIGURE_REF = 'figureRef';

declare module '@tiptap/core' {
  interface Commands<ReturnType> {
    figureRef: {
      /** Inserts a reference to the figure `figureId` ("Figure 3"), numbered by document order. */
      insertFigureRef: (attrs: { figureId: string }) => ReturnType;
    };
  }
}

/**
 * A reference to a figure inside a sentence. It stores the figure's id; the
 * number shown ("Figure 3") follows the figures' document order everywhere
 * (editor, comparison text, PDF), and a removed figure shows as broken.
 */
export const FigureRef = Node.create({
  name: FIGURE_REF,
  group: 'inline',
  inline: true,
  atom: true,
  selectable: true,

  addAttributes() {
    return {
      figureId: {
        default: '',
        parseHTML: (el) => el.getAttribute('data-figure-id') ?? '',
        renderHTML: (a) => ({ 'data-figure-id': a.figureId }),
      },
    };
  },

  parseHTML() {
    return [{ tag: 'span[data-type="figure-ref"]' }];
  },

  renderHTML({ HTMLAttributes }) {
    return [
      'span',
      mergeAttributes(HTMLAttributes, { 'data-type': 'figure-ref' }),
      `Figure ${String(HTMLAttributes['data-figure-id'])}`,
    ];
  },

  renderText({ node }) {
    return `{figure ${String(node.attrs.figureId)}}`;
  },

  addCommands() {
    return {
      insertFigureRef:
        (attrs) =>
        ({ commands }) =>
          commands.insertContent({ type: this.name, attrs }),
    };
  },
});
