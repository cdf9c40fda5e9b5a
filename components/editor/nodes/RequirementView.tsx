'use client';

import { NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import { checkRequirementWith, type RequirementCheck } from '@/lib/requirements/check-requirements';
import {
  COMPARISONS,
  COMPARISON_WORDS,
  requirementAttrsSchema,
  type RequirementAttrs,
} from '@/lib/requirements/requirement-attrs';
import { displayUnit } from '@/lib/format/format-output';
import { editorOutputLookup } from '../calc/editor-output-lookup';
import { useBlockState, useCalcContext } from '../calc/calc-context';

/** ✓ met / ✗ not met / ? undecided, in words as well as symbol and colour. */
export function VerdictChip({ check }: { check: RequirementCheck }) {
  const v = check.verdict;
  if (v.status === 'undecided')
    return (
      <span
        className="rounded-chip border border-dashed border-ember-500 px-1.5 text-note text-ember-700"
        data-verdict="undecided"
        title={v.reason}
      >
        ? undecided: {v.reason}
      </span>
    );
  const pass = v.status === 'pass';
  return (
    <span
      className={`rounded-chip px-1.5 text-note font-medium ${pass ? 'bg-orbit-50 text-orbit-700' : 'bg-ember-50 text-ember-700'}`}
      data-verdict={v.status}
    >
      {pass ? '✓ met' : '✗ not met'} · margin {check.marginText}
    </span>
  );
}

/** A requirement in the editor: id and statement, the output it checks against its condition, and the verdict with its margin. */
export function RequirementView({ node, updateAttributes, editor, selected, deleteNode }: ReactNodeViewProps) {
  const parsed = requirementAttrsSchema.safeParse(node.attrs);
  const attrs: RequirementAttrs = parsed.success
    ? parsed.data
    : {
        requirementId: String(node.attrs.requirementId ?? ''),
        text: '',
        blockId: '',
        output: '',
        comparison: 'le',
        threshold: '',
        tolerance: '',
      };
  const { store, kinds } = useCalcContext();
  useBlockState(attrs.blockId); // re-render when the checked block's result changes
  const check = checkRequirementWith(attrs, editorOutputLookup(store, kinds));
  const editable = editor.isEditable;
  const id = `req-${attrs.requirementId}`;
  const block = store.block(attrs.blockId);
  const unit = block ? (kinds.get(block.kind)?.outputs.find((o) => o.name === attrs.output)?.unit ?? null) : null;
  const outputs = store
    .blocks()
    .flatMap((b) =>
      (kinds.get(b.kind)?.outputs ?? [])
        .filter((o) => o.type === 'number' || o.type === 'integer')
        .map((o) => ({ value: `${b.blockId}.${o.name}`, label: `${b.label || b.kind} · ${o.label}` })),
    );
  const text = (name: 'threshold' | 'tolerance', label: string) => (
    <label className="flex items-center gap-1 text-note">
      <span className="sr-only">{label}</span>
      <input
        className="field w-28 py-0.5 font-mono text-note"
        aria-label={`${label} of ${attrs.requirementId}`}
        value={attrs[name]}
        placeholder={unit ? `e.g. 10 ${displayUnit(unit)}` : 'number'}
        onChange={(e) => updateAttributes({ [name]: e.target.value })}
      />
    </label>
  );

  return (
    <NodeViewWrapper
      as="section"
      className={`requirement my-3 rounded-card border-l-4 bg-paper-raised px-3 py-2 ${check.verdict.status === 'pass' ? 'border-orbit-500' : 'border-ember-500'} ${selected ? 'ring-2 ring-orbit-100' : ''}`}
      data-requirement-id={attrs.requirementId}
      aria-label={`Requirement ${attrs.requirementId}`}
      contentEditable={false}
    >
      <div className="flex flex-wrap items-baseline gap-2" data-drag-handle>
        <span aria-hidden="true" className="cursor-grab select-none font-mono text-ink-faint">
          ⠿
        </span>
        {editable ? (
          <input
            id={id}
            className="w-32 rounded-chip border border-transparent bg-transparent px-1 font-mono font-semibold hover:border-rule focus:border-orbit-500"
            aria-label="Requirement id"
            value={attrs.requirementId}
            onChange={(e) => updateAttributes({ requirementId: e.target.value.toUpperCase() })}
          />
        ) : (
          <span className="font-mono font-semibold">{attrs.requirementId}</span>
        )}
        {editable ? (
          <input
            className="min-w-48 flex-1 rounded-chip border border-transparent bg-transparent px-1 hover:border-rule focus:border-orbit-500"
            aria-label={`Statement of ${attrs.requirementId}`}
            value={attrs.text}
            placeholder="What the orbit must achieve"
            onChange={(e) => updateAttributes({ text: e.target.value })}
          />
        ) : (
          <span className="flex-1">{attrs.text}</span>
        )}
        {editable && (
          <button
            type="button"
            className="btn-quiet px-1 py-0 text-note"
            onClick={() => deleteNode()}
            aria-label={`Remove requirement ${attrs.requirementId}`}
          >
            ✕
          </button>
        )}
      </div>
      <div className="mt-1 flex flex-wrap items-center gap-2 text-note text-ink-soft">
        {editable ? (
          <select
            className="field w-auto max-w-72 py-0.5 text-note"
            aria-label={`Output checked by ${attrs.requirementId}`}
            value={`${attrs.blockId}.${attrs.output}`}
            onChange={(e) => {
              const [blockId, output] = e.target.value.split('.');
              updateAttributes({ blockId, output });
            }}
          >
            {!outputs.some((o) => o.value === `${attrs.blockId}.${attrs.output}`) && (
              <option value={`${attrs.blockId}.${attrs.output}`}>{check.source}</option>
            )}
            {outputs.map((o) => (
              <option key={o.value} value={o.value}>
                {o.label}
              </option>
            ))}
          </select>
        ) : (
          <span>{check.source}</span>
        )}
        <span className="computed font-mono text-ink" data-requirement-value>
          {check.valueText}
        </span>
        {editable ? (
          <>
            <select
              className="field w-auto py-0.5 text-note"
              aria-label={`Comparison of ${attrs.requirementId}`}
              value={attrs.comparison}
              onChange={(e) => updateAttributes({ comparison: e.target.value })}
            >
              {COMPARISONS.map((c) => (
                <option key={c} value={c}>
                  {COMPARISON_WORDS[c]}
                </option>
              ))}
            </select>
            {text('threshold', attrs.comparison === 'within' ? 'Target' : 'Threshold')}
            {attrs.comparison === 'within' && (
              <>
                <span aria-hidden="true">±</span>
                {text('tolerance', 'Tolerance')}
              </>
            )}
          </>
        ) : (
          <span>required {check.conditionText}</span>
        )}
        <VerdictChip check={check} />
      </div>
    </NodeViewWrapper>
  );
}
