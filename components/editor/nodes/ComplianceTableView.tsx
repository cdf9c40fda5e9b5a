'use client';

import { useEffect, useReducer } from 'react';
import { NodeViewWrapper, useEditorState, type ReactNodeViewProps } from '@tiptap/react';
import { editorDocumentIndex } from '@/lib/documents/model/document-index-plugin';
import { checkRequirementWith } from '@/lib/requirements/check-requirements';
import { editorOutputLookup } from '../calc/editor-output-lookup';
import { useCalcContext } from '../calc/calc-context';
import { VerdictChip } from './RequirementView';

/** The compliance table in the editor: every requirement of the memo, in document order, checked against the current results. */
export function ComplianceTableView({ editor, selected, deleteNode }: ReactNodeViewProps) {
  const { store, kinds } = useCalcContext();
  // Rows follow the document index (rebuilt once per document change) and every block's results.
  const requirements = useEditorState({
    editor,
    selector: ({ editor: e }) => editorDocumentIndex(e.state).requirements,
  });
  const [, refresh] = useReducer((n: number) => n + 1, 0);
  useEffect(() => store.subscribeAll(refresh), [store]);
  const lookup = editorOutputLookup(store, kinds);
  const checks = requirements.map((r) => checkRequirementWith(r, lookup));
  const failing = checks.filter((c) => c.verdict.status !== 'pass').length;

  return (
    <NodeViewWrapper
      as="section"
      className={`compliance-table my-4 rounded-card border bg-paper-raised p-3 ${selected ? 'border-orbit-500 ring-2 ring-orbit-100' : 'border-rule'}`}
      aria-label="Requirements compliance table"
      contentEditable={false}
    >
      <div className="mb-2 flex items-baseline gap-2" data-drag-handle>
        <h3 className="flex-1 font-semibold">Requirements compliance</h3>
        <span className="text-note text-ink-soft">
          {checks.length === 0
            ? 'no requirements yet'
            : failing === 0
              ? `all ${checks.length} met`
              : `${failing} of ${checks.length} not met or undecided`}
        </span>
        {editor.isEditable && (
          <button
            type="button"
            className="btn-quiet px-1 py-0 text-note"
            onClick={() => deleteNode()}
            aria-label="Remove the compliance table"
          >
            ✕
          </button>
        )}
      </div>
      {checks.length > 0 && (
        <div className="overflow-x-auto" tabIndex={0} role="region" aria-label="Requirements compliance table">
          <table className="w-full text-note">
            <thead>
              <tr className="border-b border-rule text-left text-ink-soft">
                <th className="py-1 pr-2 font-medium">Requirement</th>
                <th className="py-1 pr-2 font-medium">Statement</th>
                <th className="py-1 pr-2 font-medium">Value</th>
                <th className="py-1 pr-2 font-medium">Required</th>
                <th className="py-1 pr-2 font-medium">Verdict</th>
                <th className="py-1 font-medium">From</th>
              </tr>
            </thead>
            <tbody>
              {checks.map((c) => (
                <tr
                  key={c.requirement.requirementId}
                  className="border-b border-rule align-top"
                  data-compliance-row={c.requirement.requirementId}
                >
                  <td className="py-1 pr-2 font-mono">{c.requirement.requirementId}</td>
                  <td className="py-1 pr-2">{c.requirement.text}</td>
                  <td className="computed py-1 pr-2 font-mono">{c.valueText}</td>
                  <td className="py-1 pr-2 font-mono">{c.conditionText}</td>
                  <td className="py-1 pr-2">
                    <VerdictChip check={c} />
                  </td>
                  <td className="py-1 text-ink-soft">{c.source}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </NodeViewWrapper>
  );
}
