import { Node, mergeAttributes } from '@tiptap/core';
import { COMPLIANCE_TABLE } from '@/lib/requirements/requirement-attrs';

declare module '@tiptap/core' {
  interface Commands<ReturnType> {
    complianceTable: {
      /** Inserts the compliance table: every requirement of the memo with value, threshold, margin and verdict. */
      insertComplianceTable: () => ReturnType;
    };
  }
}

/**
 * The requirements compliance table. It stores nothing: its rows are the
 * memo's requirements in document order (from the document index), each
 * checked against the current results wherever the table is shown.
 */
export const ComplianceTable = Node.create({
  name: COMPLIANCE_TABLE,
  group: 'block',
  atom: true,
  draggable: true,
  selectable: true,

  parseHTML() {
    return [{ tag: 'div[data-type="compliance-table"]' }];
  },

  renderHTML({ HTMLAttributes }) {
    return ['div', mergeAttributes(HTMLAttributes, { 'data-type': 'compliance-table' })];
  },

  renderText() {
    return '[compliance table]';
  },

  addCommands() {
    return {
      insertComplianceTable:
        () =>
        ({ commands, state }) => {
          // After the block the cursor is in, never splitting its sentence.
          const { $from } = state.selection;
          return commands.insertContentAt($from.depth > 0 ? $from.after(1) : $from.pos, { type: this.name });
        },
    };
  },
});
