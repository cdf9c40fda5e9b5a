import { Node, mergeAttributes } from '@tiptap/core';
import { FIGURE, newFigureId } from '@/lib/figures/figure-nodes';
import { uniqueIdPlugin } from './unique-id-plugin';

declare module '@tiptap/core' {
  interface Commands<ReturnType> {
    figure: {
      /** Inserts a figure of `figureKind` drawn from the calc block `blockId`. */
      insertFigure: (attrs: { figureKind: string; blockId: string; caption?: string }) => ReturnType;
    };
  }
}

const stringAttr = (name: string) => ({
  default: '',
  parseHTML: (el: HTMLElement) => el.getAttribute(`data-${name}`) ?? '',
  renderHTML: (attrs: Record<string, unknown>) => ({ [`data-${name}`]: attrs[camel(name)] ?? '' }),
});

const camel = (kebab: string) => kebab.replace(/-([a-z])/g, (_, c: string) => c.toUpperCase());

/**
 * A figure: a chart of one calc block's results. The node stores which
 * figure kind, which block and the caption — never data, which the server
 * builds from the block's recomputed result. Its number ("Figure 3")
 * follows document order and is not stored.
 */
export const Figure = Node.create({
  name: FIGURE,
  group: 'block',
  atom: true,
  draggable: true,
  selectable: true,

  addAttributes() {
    return {
      figureId: stringAttr('figure-id'),
      figureKind: stringAttr('figure-kind'),
      blockId: stringAttr('block-id'),
      caption: stringAttr('caption'),
    };
  },

  parseHTML() {
    return [{ tag: 'figure[data-type="figure"]' }];
  },

  renderHTML({ HTMLAttributes }) {
    return ['figure', mergeAttributes(HTMLAttributes, { 'data-type': 'figure' })];
  },

  renderText({ node }) {
    return `[figure: ${node.attrs.caption || node.attrs.figureKind}]`;
  },

  addCommands() {
    return {
      insertFigure:
        ({ figureKind, blockId, caption = '' }) =>
        ({ commands }) =>
          commands.insertContent({ type: this.name, attrs: { figureId: newFigureId(), figureKind, blockId, caption } }),
    };
  },

  addProseMirrorPlugins() {
    // Figures are addressed by id (API route, numbering): a pasted or duplicated figure gets an id of its own.
    return [uniqueIdPlugin(FIGURE, 'figureId', newFigureId)];
  },
});
