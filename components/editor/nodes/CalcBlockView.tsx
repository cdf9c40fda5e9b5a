'use client';

import { useEffect, useMemo, useRef, useState } from 'react';
import { NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { CalcInputField, CalcKindDescriptor, CalcOutputField, CalcResult } from '@/lib/calc';
import { CALC_BLOCK, isRef, newBlockId, type CalcBlockAttrs, type InputEntry } from '@/lib/documents/calc-nodes';
import { eme2000ConversionFor, FRAME_NAMES } from '@/lib/documents/element-frame-conversion';
import { inputFormSchema } from '@/lib/documents/input-form-schema';
import { parseInputText } from '@/lib/documents/parse-input-text';
import { phraseInputProblem, phraseInputProblems } from '@/lib/documents/phrase-input-problem';
import { canFeedInput, quantityMeaningOf } from '@/lib/documents/can-feed-input';
import { unusualInputNote } from '@/lib/documents/unusual-input-note';
import { displayUnit, formatValue } from '@/lib/format/format-output';
import { useBlockState, useCalcContext } from '../calc/calc-context';
import type { BlockState } from '../calc/calc-store';
import { PreliminaryCaution } from './PreliminaryCaution';
import { FileTextInput } from '../calc/FileTextInput';
import { DownloadOpmButton } from '../calc/DownloadOpmButton';

type FormValues = Record<string, string>;

const textsOf = (kind: CalcKindDescriptor, inputs: Record<string, InputEntry>): FormValues =>
  Object.fromEntries(
    kind.inputs.map((f) => {
      const e = inputs[f.name];
      return [f.name, e && !isRef(e) ? e.text : ''];
    }),
  );

/** A calc block in the editor: kind, inputs form generated from the registry, results from the server. */
export function CalcBlockView({ node, updateAttributes, editor, selected, deleteNode, getPos }: ReactNodeViewProps) {
  const attrs = node.attrs as CalcBlockAttrs;
  const { kinds } = useCalcContext();
  const kind = kinds.get(attrs.kind);
  const state = useBlockState(attrs.blockId);
  const editable = editor.isEditable;

  return (
    <NodeViewWrapper
      as="section"
      className={`calc-block my-4 rounded-card border bg-paper-raised ${selected ? 'border-orbit-500 ring-2 ring-orbit-100' : 'border-rule-strong'}`}
      data-block-id={attrs.blockId}
      aria-label={`Calc block ${attrs.label || attrs.kind}`}
      contentEditable={false}
    >
      <header
        className="flex flex-wrap items-center gap-2 border-b border-rule bg-paper-sunk px-3 py-2"
        data-drag-handle
      >
        <span aria-hidden="true" className="cursor-grab select-none font-mono text-ink-faint">
          ⠿
        </span>
        {editable ? (
          <>
            <label className="sr-only" htmlFor={`label-${attrs.blockId}`}>
              Block label
            </label>
            <input
              id={`label-${attrs.blockId}`}
              className="min-w-48 flex-1 rounded-chip border border-transparent bg-transparent px-1 py-0.5 font-semibold hover:border-rule focus:border-orbit-500 focus:bg-paper-raised"
              value={attrs.label}
              placeholder="Name this block"
              onChange={(e) => updateAttributes({ label: e.target.value })}
            />
            <label className="sr-only" htmlFor={`kind-${attrs.blockId}`}>
              Calculation
            </label>
            <select
              id={`kind-${attrs.blockId}`}
              className="field w-auto py-0.5 text-note"
              value={attrs.kind}
              onChange={(e) => updateAttributes({ kind: e.target.value, inputs: {} })}
            >
              {[...kinds.values()].map((k) => (
                <option key={k.kind} value={k.kind}>
                  {k.title}
                </option>
              ))}
            </select>
            <button
              type="button"
              className="btn-quiet py-0.5"
              onClick={() => deleteNode()}
              aria-label={`Remove block ${attrs.label || attrs.kind}`}
            >
              Remove
            </button>
          </>
        ) : (
          <span className="flex-1 font-semibold" role="heading" aria-level={3}>
            {attrs.label || kind?.title || attrs.kind}
          </span>
        )}
        <StatusChip state={state} />
      </header>
      {!kind ? (
        <p role="alert" className="px-3 py-3 text-note text-ember-700">
          This block asks for an unknown calculation “{attrs.kind}”. Choose another kind.
        </p>
      ) : (
        // A trade table (candidates side by side) takes the block's full width under the inputs, so it fits the memo's column.
        <div
          className={`grid gap-4 p-3 ${kind.outputs.some((o) => o.display === 'columns') ? '' : 'md:grid-cols-[minmax(0,22rem)_minmax(0,1fr)]'}`}
          data-layout={kind.outputs.some((o) => o.display === 'columns') ? 'stacked' : 'side-by-side'}
        >
          <InputsForm
            kind={kind}
            attrs={attrs}
            editable={editable}
            state={state}
            onChange={(inputs) => updateAttributes({ inputs })}
            onConvertFromEme2000={() => {
              // One step (one undo): an element-frame block is put just above this one, and this block's
              // element inputs are fed from it, so the conversion and its epoch stay visible in the memo and the PDF.
              const pos = getPos();
              if (typeof pos !== 'number') return;
              const plan = eme2000ConversionFor(kind, attrs, newBlockId());
              editor
                .chain()
                .command(({ tr }) => {
                  const converter = editor.schema.nodes[CALC_BLOCK].create(plan.converter);
                  tr.insert(pos, converter);
                  tr.setNodeMarkup(pos + converter.nodeSize, undefined, { ...node.attrs, inputs: plan.hostInputs });
                  return true;
                })
                .run();
            }}
          />
          <Results
            kind={kind}
            state={state}
            label={attrs.label}
            onChoose={
              editable && kind.inputs.some((f) => f.name === 'chosenIndex')
                ? (i) => updateAttributes({ inputs: { ...attrs.inputs, chosenIndex: { text: String(i) } } })
                : undefined
            }
          />
        </div>
      )}
    </NodeViewWrapper>
  );
}

function StatusChip({ state }: { state: BlockState | undefined }) {
  if (!state || state.status === 'pending')
    return (
      <span className="text-micro uppercase text-ink-faint" role="status">
        computing…
      </span>
    );
  if (state.status === 'ok')
    return (
      <span className="text-micro uppercase text-moss-700" role="status">
        computed on server
      </span>
    );
  return (
    <span className="text-micro uppercase text-ember-700" role="status">
      {state.status === 'waiting' ? 'check inputs' : 'not computed'}
    </span>
  );
}

function InputsForm({
  kind,
  attrs,
  editable,
  state,
  onChange,
  onConvertFromEme2000,
}: {
  kind: CalcKindDescriptor;
  attrs: CalcBlockAttrs;
  editable: boolean;
  state: BlockState | undefined;
  onChange: (inputs: Record<string, InputEntry>) => void;
  onConvertFromEme2000: () => void;
}) {
  const schema = useMemo(() => inputFormSchema(kind), [kind]);
  const texts = textsOf(kind, attrs.inputs);
  const form = useForm<FormValues>({ resolver: zodResolver(schema), mode: 'onChange', defaultValues: texts });
  const attrsRef = useRef(attrs.inputs);
  attrsRef.current = attrs.inputs;
  const onChangeRef = useRef(onChange);
  onChangeRef.current = onChange;

  // Undo, a reload after a conflict or a restore change the stored inputs: show them.
  const textsKey = JSON.stringify(texts);
  useEffect(() => {
    const current = form.getValues();
    if (JSON.stringify(textsOf(kind, attrsRef.current)) !== JSON.stringify(current))
      form.reset(textsOf(kind, attrsRef.current));
  }, [textsKey, kind, form]);

  useEffect(() => {
    const sub = form.watch((values, { name }) => {
      if (!name) return;
      onChangeRef.current({ ...attrsRef.current, [name]: { text: String(values[name] ?? '') } });
    });
    return () => sub.unsubscribe();
  }, [form]);

  const serverFields = state && (state.status === 'error' || state.status === 'waiting') ? state.fields : {};

  return (
    <form className="space-y-2" onSubmit={(e) => e.preventDefault()} aria-label="Inputs" noValidate>
      {kind.inputs.map((field) => {
        const entry = attrs.inputs[field.name];
        const clientError = form.formState.errors[field.name]?.message;
        const error = clientError ?? serverFields[field.name];
        return (
          <div key={field.name}>
            <div className="flex items-baseline justify-between gap-2">
              <label className="label flex-1" htmlFor={`in-${attrs.blockId}-${field.name}`}>
                {field.label}
                {field.unit && (
                  <span className="ml-1 font-mono normal-case text-ink-faint">({displayUnit(field.unit)})</span>
                )}
                {field.frame && (
                  <span
                    className="ml-1 rounded-chip border border-rule px-1 font-mono text-micro normal-case text-ink-soft"
                    title={FRAME_NAMES[field.frame].long}
                    data-frame={field.frame}
                  >
                    {FRAME_NAMES[field.frame].short}
                  </span>
                )}
              </label>
              {editable && !(entry && isRef(entry)) && field.frame === 'TOD' && (
                <button
                  type="button"
                  className="rounded-chip px-1 text-micro text-orbit-600 hover:bg-paper-sunk"
                  aria-label={`Enter ${field.label} in EME2000`}
                  title="Adds a frame-conversion block above this one (EME2000 → true of date at its epoch) and feeds this block's element inputs from it"
                  onClick={onConvertFromEme2000}
                >
                  ⇄ in EME2000…
                </button>
              )}
              {editable && !(entry && isRef(entry)) && (field.type === 'number' || field.type === 'integer') && (
                <LinkPicker
                  field={field}
                  selfId={attrs.blockId}
                  onPick={(ref) => onChange({ ...attrs.inputs, [field.name]: { ref } })}
                />
              )}
            </div>
            {entry && isRef(entry) ? (
              <RefInput
                field={field}
                entry={entry}
                editable={editable}
                onUnlink={() => onChange({ ...attrs.inputs, [field.name]: { text: '' } })}
              />
            ) : field.type === 'enum' && field.options ? (
              <select
                id={`in-${attrs.blockId}-${field.name}`}
                className="field py-1"
                disabled={!editable}
                {...form.register(field.name)}
              >
                {/* An empty entry means "use the default": say so rather than show a blank box. */}
                <option value="" data-default-option={field.default !== undefined ? field.name : undefined}>
                  {field.default !== undefined ? `${String(field.default)} (default)` : '—'}
                </option>
                {field.options.map((o) => (
                  <option key={o} value={o}>
                    {o}
                  </option>
                ))}
              </select>
            ) : field.type === 'text' || field.multiline ? (
              <FileTextInput
                id={`in-${attrs.blockId}-${field.name}`}
                placeholder={field.help ?? (field.optional ? 'optional' : 'paste here')}
                maxLength={field.maxLength}
                editable={editable}
                register={form.register(field.name)}
                onText={(text) => form.setValue(field.name, text, { shouldDirty: true, shouldValidate: true })}
                invalid={Boolean(error)}
                describedBy={error ? `err-${attrs.blockId}-${field.name}` : undefined}
              />
            ) : (
              <input
                id={`in-${attrs.blockId}-${field.name}`}
                className="field py-1 font-mono"
                readOnly={!editable}
                placeholder={
                  field.default !== undefined
                    ? `default ${String(field.default)}${field.unit ? ` ${field.unit}` : ''}`
                    : field.optional
                      ? 'optional'
                      : ''
                }
                aria-invalid={Boolean(error)}
                aria-describedby={error ? `err-${attrs.blockId}-${field.name}` : undefined}
                {...form.register(field.name)}
              />
            )}
            {entry && !isRef(entry) && !field.multiline && field.type !== 'text' && (
              <Normalised field={field} text={entry.text} />
            )}
            {!error &&
              entry &&
              !isRef(entry) &&
              entry.text.trim() === '' &&
              field.default !== undefined &&
              field.type !== 'enum' && (
                <p className="mt-0.5 text-micro text-ink-soft" data-default-in-use={field.name}>
                  Left empty: the default, {String(field.default)}
                  {field.unit ? ` ${displayUnit(field.unit)}` : ''}, is used.
                </p>
              )}
            {error && (
              <p id={`err-${attrs.blockId}-${field.name}`} className="mt-0.5 text-note text-ember-700">
                {phraseInputProblem(kind, field.name, error).sentence}
              </p>
            )}
          </div>
        );
      })}
    </form>
  );
}

/** Feeds an input from another block's output with the same unit. */
function LinkPicker({
  field,
  selfId,
  onPick,
}: {
  field: CalcInputField;
  selfId: string;
  onPick: (ref: { blockId: string; output: string }) => void;
}) {
  const { store, kinds } = useCalcContext();
  // The list of every other block's outputs is built only when asked for: a memo of forty blocks
  // would otherwise carry tens of thousands of <option> elements that slow loading and typing.
  const [open, setOpen] = useState(false);
  if (!open) {
    return (
      <button
        type="button"
        className="rounded-chip px-1 text-micro text-orbit-600 hover:bg-paper-sunk"
        aria-label={`Feed ${field.label} from another block`}
        onClick={() => setOpen(true)}
      >
        {/* The visible words are part of the accessible name (WCAG 2.1 SC 2.5.3, label in name). */}
        <span aria-hidden="true">↳ </span>from another block
      </button>
    );
  }
  const options = store
    .blocks()
    .filter((b) => b.blockId !== selfId)
    .map((b) => ({ block: b, outputs: (kinds.get(b.kind)?.outputs ?? []).filter((o) => canFeedInput(field, o)) }))
    .filter((g) => g.outputs.length > 0);
  return (
    <select
      autoFocus
      className="max-w-40 rounded-chip border border-rule bg-paper-raised text-micro text-orbit-600"
      aria-label={`Feed ${field.label} from another block`}
      value=""
      onBlur={() => setOpen(false)}
      onKeyDown={(e) => e.key === 'Escape' && setOpen(false)}
      onChange={(e) => {
        const [blockId, output] = e.target.value.split('|');
        if (blockId && output) onPick({ blockId, output });
        setOpen(false);
      }}
    >
      <option value="">
        {options.length
          ? 'choose an output…'
          : `no other block has ${quantityMeaningOf(field.name) ? `an output meaning ${quantityMeaningOf(field.name)}` : 'an output'} in ${field.unit ?? 'this unit'}`}
      </option>
      {options.map((g) => (
        <optgroup key={g.block.blockId} label={g.block.label || g.block.kind}>
          {g.outputs.map((o) => (
            <option key={o.name} value={`${g.block.blockId}|${o.name}`}>
              {o.label}
            </option>
          ))}
        </optgroup>
      ))}
    </select>
  );
}

/** Shows the value in the field's own unit when it was typed in another (e.g. 0.705 Mm → 705 km). */
/** The typed value in the field's unit when it was typed in another, and a note when a valid value is unusual. */
function Normalised({ field, text }: { field: CalcInputField; text: string }) {
  const parsed = parseInputText(field, text);
  if (!parsed.ok) return null;
  const unusual = typeof parsed.value === 'number' ? unusualInputNote(field, parsed.value) : null;
  const showNormalised =
    Boolean(field.unit) &&
    /[a-zA-Z]/.test(text) &&
    parsed.normalised !== null &&
    parsed.normalised.replace(/\s+/g, '') !== text.replace(/\s+/g, '');
  return (
    <>
      {showNormalised && <p className="mt-0.5 font-mono text-micro text-ink-soft">= {parsed.normalised}</p>}
      {unusual && (
        <p className="mt-0.5 text-micro text-sunline-700" data-unusual-input={field.name}>
          {unusual}
        </p>
      )}
    </>
  );
}

function RefInput({
  field,
  entry,
  editable,
  onUnlink,
}: {
  field: CalcInputField;
  entry: { ref: { blockId: string; output: string } };
  editable: boolean;
  onUnlink: () => void;
}) {
  const { store, kinds } = useCalcContext();
  const upstream = store.block(entry.ref.blockId);
  const upstreamState = useBlockState(entry.ref.blockId);
  const outField = upstream ? kinds.get(upstream.kind)?.outputs.find((o) => o.name === entry.ref.output) : undefined;
  const result =
    upstreamState?.status === 'ok'
      ? upstreamState.result
      : upstreamState && 'lastGood' in upstreamState
        ? upstreamState.lastGood
        : undefined;
  const value = result?.outputs[entry.ref.output];
  return (
    <div className="flex items-center gap-2 rounded-chip border border-dashed border-sunline-500 bg-sunline-50 px-2 py-1 text-note">
      <span aria-hidden="true">↳</span>
      <span className="flex-1">
        {upstream ? (
          <>
            from <strong>{upstream.label || upstream.kind}</strong> · {outField?.label ?? entry.ref.output}
            {value !== undefined && outField && (
              <span className="computed ml-1">{formatValue(value, outField.unit, outField.precision)}</span>
            )}
          </>
        ) : (
          <span className="text-ember-700">source block removed</span>
        )}
      </span>
      {editable && (
        <button type="button" className="text-micro text-orbit-600 underline" onClick={onUnlink}>
          {/* Named "Type <field> instead" from its content, so the visible words are part of the name (WCAG 2.1 SC 2.5.3). */}
          Type<span className="sr-only"> {field.label}</span> instead
        </button>
      )}
    </div>
  );
}

/** The block's problem in sentences that name fields by label; the engine's own text only when no field is named. */
function problemSentences(
  kind: CalcKindDescriptor,
  state: Extract<BlockState, { status: 'error' | 'waiting' }>,
): string {
  const lines = phraseInputProblems(kind, state.fields);
  if (lines.length > 0)
    return `${lines.length === 1 ? 'The input needs a change' : 'The inputs need changes'}: ${lines.join(' ')}`;
  return state.status === 'error' ? state.error : state.message;
}

function Results({
  kind,
  state,
  label,
  onChoose,
}: {
  kind: CalcKindDescriptor;
  state: BlockState | undefined;
  label: string;
  onChoose?: (candidate: number) => void;
}) {
  const result: CalcResult | undefined = state?.status === 'ok' ? state.result : state?.lastGood;
  const stale = state?.status !== 'ok';
  return (
    <div className="min-w-0 space-y-2">
      {state && (state.status === 'error' || state.status === 'waiting') && (
        <p role="alert" className="rounded-chip border border-ember-500 bg-ember-50 px-2 py-1 text-note text-ember-700">
          {problemSentences(kind, state)}
          {result && ' The last good result is shown greyed.'}
        </p>
      )}
      {result ? (
        <table className={`w-full text-note ${stale ? 'opacity-50' : ''}`} aria-busy={state?.status === 'pending'}>
          <thead className="sr-only">
            <tr>
              <th>Output</th>
              <th>Value</th>
            </tr>
          </thead>
          <tbody>
            {kind.outputs
              .filter((o) => o.type !== 'rows')
              .map((o) => (
                <tr key={o.name} className="border-b border-rule last:border-0">
                  <th scope="row" className="py-1 pr-2 text-left font-normal text-ink-soft">
                    {o.label}
                  </th>
                  <td
                    className="whitespace-nowrap py-1 pl-2 text-right font-mono text-sunline-700"
                    data-output={o.name}
                  >
                    {formatValue(result.outputs[o.name], o.unit, o.precision)}
                  </td>
                </tr>
              ))}
          </tbody>
        </table>
      ) : (
        <p className="text-note text-ink-faint">
          {state?.status === 'pending' || !state ? 'Computing on the server…' : 'No result yet.'}
        </p>
      )}
      {result &&
        kind.outputs
          .filter((o) => o.type === 'rows')
          .map((o) =>
            o.display === 'columns' ? (
              <ColumnsOutput key={o.name} field={o} rows={result.outputs[o.name]} onChoose={onChoose} />
            ) : (
              <RowsOutput key={o.name} field={o} rows={result.outputs[o.name]} />
            ),
          )}
      {result && !stale && <DownloadOpmButton result={result} label={label} />}
      {result && result.warnings.length > 0 && (
        <ul className="space-y-1 text-note text-sunline-700">
          {result.warnings.map((w) => (
            <li key={w}>⚠ {w}</li>
          ))}
        </ul>
      )}
      <details className="text-note text-ink-soft">
        <summary className="cursor-pointer select-none">Method and references</summary>
        <p className="mt-1">{kind.model.method}</p>
        {kind.model.assumptions.length > 0 && (
          <ul className="mt-1 list-disc pl-5">
            {kind.model.assumptions.map((a) => (
              <li key={a}>{a}</li>
            ))}
          </ul>
        )}
        <ul className="mt-1 list-disc pl-5 italic">
          {kind.model.references.map((r) => (
            <li key={r}>{r}</li>
          ))}
        </ul>
        {result && <p className="mt-1 font-mono text-micro">{result.engineVersion}</p>}
      </details>
      <PreliminaryCaution />
    </div>
  );
}

/** A rows output shown with each row as a column: candidates side by side, the chosen one marked. */
function ColumnsOutput({
  field,
  rows,
  onChoose,
}: {
  field: CalcOutputField;
  rows: unknown;
  onChoose?: (candidate: number) => void;
}) {
  if (!Array.isArray(rows)) return null;
  const items = rows as Record<string, unknown>[];
  const columns = (field.columns ?? []).filter((c) => c.name !== 'candidate' && c.name !== 'chosen');
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-note" aria-label={field.label}>
        <thead>
          <tr className="border-b border-rule-strong">
            <th scope="col" className="py-1 pr-2 text-left font-normal text-ink-soft">
              {field.label}
            </th>
            {items.map((r, i) => (
              <th
                key={i}
                scope="col"
                className={`px-2 py-1 text-right ${r.chosen ? 'bg-orbit-50 text-orbit-700' : ''}`}
              >
                <span className="block">
                  #{i + 1}
                  {r.chosen ? ' ✓ chosen' : ''}
                </span>
                {onChoose && !r.chosen && (
                  <button
                    type="button"
                    className="text-micro font-normal text-orbit-600 underline"
                    onClick={() => onChoose(i + 1)}
                  >
                    choose
                  </button>
                )}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {columns.map((c) => (
            <tr key={c.name} className="border-b border-rule last:border-0">
              <th scope="row" className="py-1 pr-2 text-left font-normal text-ink-soft">
                {c.label}
              </th>
              {items.map((r, i) => (
                <td
                  key={i}
                  className={`whitespace-nowrap px-2 py-1 text-right font-mono text-sunline-700 ${r.chosen ? 'bg-orbit-50' : ''}`}
                >
                  {formatValue(r[c.name], c.unit, c.precision)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

const ROWS_SHOWN = 12;

function RowsOutput({ field, rows }: { field: CalcOutputField; rows: unknown }) {
  if (!Array.isArray(rows)) return null;
  const columns = field.columns ?? [];
  return (
    <details className="text-note" open={rows.length <= ROWS_SHOWN}>
      <summary className="cursor-pointer select-none text-ink-soft">
        {field.label}: {rows.length} row{rows.length === 1 ? '' : 's'}
      </summary>
      <div className="mt-1 max-h-64 overflow-auto">
        <table className="w-full text-micro">
          <thead className="bg-paper-sunk">
            <tr>
              {columns.map((c) => (
                <th key={c.name} scope="col" className="px-1 py-0.5 text-left font-semibold">
                  {c.label}
                  {c.unit ? ` (${displayUnit(c.unit)})` : ''}
                </th>
              ))}
            </tr>
          </thead>
          <tbody className="font-mono">
            {(rows as Record<string, unknown>[]).slice(0, rows.length <= ROWS_SHOWN ? ROWS_SHOWN : 50).map((r, i) => (
              <tr key={i} className="border-b border-rule">
                {columns.map((c) => (
                  <td key={c.name} className="px-1 py-0.5">
                    {typeof r[c.name] === 'number'
                      ? formatValue(r[c.name], null, c.precision)
                      : String(r[c.name] ?? '')}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {rows.length > 50 && (
          <p className="mt-1 text-ink-faint">
            First 50 of {rows.length} rows shown; the figure and the PDF use all of them.
          </p>
        )}
      </div>
    </details>
  );
}
