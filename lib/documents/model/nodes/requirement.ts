import { Node, mergeAttributes } from '@tiptap/core';
import { nextRequirementId, REQUIREMENT, type Comparison } from '@/lib/requirements/requirement-attrs';
import { textAttr } from './html-attributes';
import { uniqueIdPlugin } from './unique-id-plugin';

declare module '@tiptap/core' {
  interface Commands<ReturnType> {
    requirement: {
      /** Inserts a requirement on `output` of the calc block `blockId`, with the next free id (REQ-…-00n). */
      insertRequirement: (attrs: {
        blockId: string;
        output: string;
        text?: string;
        comparison?: Comparison;
        threshold?: string;
        tolerance?: string;
      }) => ReturnType;
    };
  }
}

/**
 * A requirement: what the orbit must achieve, stated as one calc block
 * output compared with a threshold (≤, ≥, =, within ±). The node stores the
 * statement, the output reference and the threshold text; the verdict and
 * margin are worked out wherever it is shown, from the current result.
 */
export const Requirement = Node.create({
  name: REQUIREMENT,
  group: 'block',
  atom: true,
  draggable: true,
  selectable: true,

  addAttributes() {
    return {
      requirementId: textAttr('requirementId', 'requirement-id', ''),
      text: textAttr('text', 'text', ''),
      blockId: textAttr('blockId', 'block-id', ''),
      output: textAttr('output', 'output', ''),
      comparison: textAttr('comparison', 'comparison', 'le'),
      threshold: textAttr('threshold', 'threshold', ''),
      tolerance: textAttr('tolerance', 'tolerance', ''),
    };
  },

  parseHTML() {
    return [{ tag: 'div[data-type="requirement"]' }];
  },

  renderHTML({ HTMLAttributes }) {
    return ['div', mergeAttributes(HTMLAttributes, { 'data-type': 'requirement' })];
  },

  renderText({ node }) {
    return `[${String(node.attrs.requirementId)}: ${String(node.attrs.text)}]`;
  },

  addCommands() {
    return {
      insertRequirement:
        ({ blockId, output, text = '', comparison = 'le', threshold = '', tolerance = '' }) =>
        ({ commands, state }) => {
          const taken: string[] = [];
          state.doc.descendants((n) => {
            if (n.type.name === REQUIREMENT) taken.push(String(n.attrs.requirementId));
          });
          const requirementId = nextRequirementId(taken, taken.at(-1) || undefined);
          // After the block the cursor is in, never splitting its sentence.
          const { $from } = state.selection;
          return commands.insertContentAt($from.depth > 0 ? $from.after(1) : $from.pos, {
            type: this.name,
            attrs: { requirementId, text, blockId, output, comparison, threshold, tolerance },
          });
        },
    };
  },

  addProseMirrorPlugins() {
    // The compliance table and the revision's re-verification name requirements by id: a pasted copy gets the next free one.
    return [
      uniqueIdPlugin(REQUIREMENT, 'requirementId', (taken) =>
        nextRequirementId([...taken].filter(Boolean), [...taken].filter(Boolean).at(-1)),
      ),
    ];
  },
});
