import { Node, mergeAttributes } from '@tiptap/core';
import { CALC_BLOCK, newBlockId, type InputEntry } from '@/lib/documents/calc-nodes';
import { textAttr } from './html-attributes';
import { uniqueIdPlugin } from './unique-id-plugin';

declare module '@tiptap/core' {
  interface Commands<ReturnType> {
    calcBlock: {
      /** Inserts a calc block of `kind` (inputs default to the kind's defaults). */
      insertCalcBlock: (attrs: { kind: string; label?: string; inputs?: Record<string, InputEntry> }) => ReturnType;
    };
  }
}

const jsonAttr = (name: string, fallback: unknown) => ({
  default: fallback,
  parseHTML: (el: HTMLElement) => {
    const raw = el.getAttribute(`data-${name}`);
    if (!raw) return fallback;
    try {
      return JSON.parse(raw);
    } catch {
      return fallback;
    }
  },
  renderHTML: (attrs: Record<string, unknown>) => ({ [`data-${name}`]: JSON.stringify(attrs[name] ?? fallback) }),
});

/**
 * A calc block: one engine calculation inside a memo. The node stores the
 * block's id, kind, label and inputs (typed text or references to other
 * blocks' outputs) — never results, which always come from the server.
 */
export const CalcBlock = Node.create({
  name: CALC_BLOCK,
  group: 'block',
  atom: true,
  draggable: true,
  selectable: true,

  addAttributes() {
    return {
      blockId: textAttr('blockId', 'block-id', null),
      kind: textAttr('kind', 'kind', 'sso-inclination'),
      label: textAttr('label', 'label', ''),
      inputs: jsonAttr('inputs', {}),
    };
  },

  parseHTML() {
    return [{ tag: 'div[data-type="calc-block"]' }];
  },

  renderHTML({ HTMLAttributes }) {
    return ['div', mergeAttributes(HTMLAttributes, { 'data-type': 'calc-block' })];
  },

  addCommands() {
    return {
      insertCalcBlock:
        ({ kind, label = '', inputs = {} }) =>
        ({ commands }) =>
          commands.insertContent({ type: this.name, attrs: { blockId: newBlockId(), kind, label, inputs } }),
    };
  },

  addProseMirrorPlugins() {
    // Every block needs an id of its own: a pasted or duplicated block gets a new one,
    // so that live values keep pointing at the block they were made from.
    return [uniqueIdPlugin(CALC_BLOCK, 'blockId', newBlockId)];
  },
});
