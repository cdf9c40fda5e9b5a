import { Node, mergeAttributes } from '@tiptap/core';
import { LIVE_VALUE } from '@/lib/documents/calc-nodes';

declare module '@tiptap/core' {
  interface Commands<ReturnType> {
    liveValue: {
      /** Inserts a live value quoting `output` of the calc block `blockId`. */
      insertLiveValue: (attrs: { blockId: string; output: string }) => ReturnType;
    };
  }
}

/**
 * A live value: an inline quotation of one output of one calc block. It
 * stores the reference only; the text shown is the block's current result.
 */
export const LiveValue = Node.create({
  name: LIVE_VALUE,
  group: 'inline',
  inline: true,
  atom: true,
  selectable: true,

  addAttributes() {
    return {
      blockId: {
        default: '',
        parseHTML: (el) => el.getAttribute('data-block-id') ?? '',
        renderHTML: (a) => ({ 'data-block-id': a.blockId }),
      },
      output: {
        default: '',
        parseHTML: (el) => el.getAttribute('data-output') ?? '',
        renderHTML: (a) => ({ 'data-output': a.output }),
      },
    };
  },

  parseHTML() {
    return [{ tag: 'span[data-type="live-value"]' }];
  },

  renderHTML({ HTMLAttributes }) {
    return [
      'span',
      mergeAttributes(HTMLAttributes, { 'data-type': 'live-value' }),
      `{${HTMLAttributes['data-block-id']}.${HTMLAttributes['data-output']}}`,
    ];
  },

  renderText({ node }) {
    return `{${node.attrs.blockId}.${node.attrs.output}}`;
  },

  addCommands() {
    return {
      insertLiveValue:
        (attrs) =>
        ({ commands }) =>
          commands.insertContent({ type: this.name, attrs }),
    };
  },
});
