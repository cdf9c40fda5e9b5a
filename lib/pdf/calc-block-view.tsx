/** A calc block in the PDF: inputs and results with units, warnings, and the model note (method and references). */
import { Text, View } from '@react-pdf/renderer';
import { getCalcKind, type CalcKindDescriptor, type CalcOutputField, type CalcResult } from '@/lib/calc';
import { isRef, type CalcBlockAttrs } from '@/lib/documents/calc-nodes';
import type { BlockEvaluation } from '@/lib/documents/evaluate-document';
import { FRAME_NAMES } from '@/lib/calc/frame-names';
import { displayUnit, formatValue } from '@/lib/format/format-output';
import { summariseInputText } from '@/lib/format/summarise-input-text';
import { calcStyles as s } from './calc-block-styles';
import { monoText } from './pdf-fonts';

/** Rows of a rows output printed under the block; the rest are counted. */
export const ROWS_SHOWN = 5;

/** An input as the engine received it: numbers as given, with the field's unit. */
export function formatInputValue(value: unknown, unit: string | null): string {
  if (typeof value === 'number') {
    const u = displayUnit(unit);
    return u === '°' || u === '%' ? `${value}${u}` : u ? `${value} ${u}` : String(value);
  }
  if (typeof value === 'string') return summariseInputText(value);
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  return JSON.stringify(value) ?? '—';
}

function KeyValueTable({ title, rows }: { title: string; rows: { label: string; value: string; note?: string }[] }) {
  return (
    <View style={s.column}>
      <Text style={s.columnTitle}>{title}</Text>
      {rows.map((r, i) => (
        <View key={i} style={s.kvRow} wrap={false}>
          <View style={s.kvLabel}>
            <Text>{r.label}</Text>
            {r.note ? <Text style={s.note}>{r.note}</Text> : null}
          </View>
          <Text style={s.kvValue}>{r.value}</Text>
        </View>
      ))}
    </View>
  );
}

function RowsSummary({ field, rows }: { field: CalcOutputField; rows: Record<string, unknown>[] }) {
  const columns = field.columns ?? [];
  const shown = rows.slice(0, ROWS_SHOWN);
  return (
    <View style={s.rowsBlock} wrap={false}>
      <Text style={s.rowsTitle}>{`${field.label}: ${rows.length} ${rows.length === 1 ? 'row' : 'rows'}${rows.length > shown.length ? `, first ${shown.length} shown` : ''}`}</Text>
      <View style={s.rowsHeader}>
        {columns.map((c) => (
          <Text key={c.name} style={s.rowsCell}>{c.unit ? `${c.label} (${displayUnit(c.unit)})` : c.label}</Text>
        ))}
      </View>
      {shown.map((row, i) => (
        <View key={i} style={s.rowsRow}>
          {columns.map((c) => (
            <Text key={c.name} style={s.rowsCell}>{formatValue(row[c.name], null, c.precision)}</Text>
          ))}
        </View>
      ))}
    </View>
  );
}

type Evaluations = ReadonlyMap<string, BlockEvaluation>;

/** An input fed by another block's output: shown at that output's display precision, with where it comes from. */
function referencedInput(ref: { blockId: string; output: string }, value: unknown, unit: string | null, evaluations: Evaluations) {
  const upstream = evaluations.get(ref.blockId);
  const field = upstream?.status === 'ok' ? getCalcKind(upstream.result.kind)?.outputs.find((o) => o.name === ref.output) : undefined;
  return {
    value: field ? formatValue(value, unit ?? field.unit, field.precision) : formatInputValue(value, unit),
    note: `from ${upstream?.block.label || ref.blockId}${field ? ` (${field.label.toLowerCase()})` : ''}`,
  };
}

function inputRows(attrs: CalcBlockAttrs, kind: CalcKindDescriptor, result: CalcResult, evaluations: Evaluations) {
  return kind.inputs
    .filter((f) => result.inputs[f.name] !== undefined)
    .map((f) => {
      const entry = attrs.inputs[f.name];
      const value = result.inputs[f.name];
      // Text of several lines (pasted TLEs) is printed whole under the block, line by line; the table says so.
      const shown = f.multiline && typeof value === 'string' ? { value: `${textLines(value).length} lines, printed below` } : undefined;
      const row = { label: f.label, ...(shown ?? (entry && isRef(entry) ? referencedInput(entry.ref, value, f.unit, evaluations) : { value: formatInputValue(value, f.unit) })) };
      // An element input names the frame its value is in (the design kinds: true of date).
      const frameNote = f.frame ? `frame: ${FRAME_NAMES[f.frame].short}` : undefined;
      return frameNote ? { ...row, note: 'note' in row && row.note ? `${row.note}; ${frameNote}` : frameNote } : row;
    });
}

/** The non-blank lines of a multi-line input. */
function textLines(text: string): string[] {
  return text.split(/\r\n|\r|\n/).map((l) => l.replace(/\s+$/, '')).filter((l) => l !== '');
}

/** Multi-line inputs (a pasted TLE list) in full, in monospace, one printed line per input line. */
function MultilineInputs({ kind, result }: { kind: CalcKindDescriptor; result: CalcResult }) {
  const fields = kind.inputs.filter((f) => f.multiline && typeof result.inputs[f.name] === 'string');
  return (
    <>
      {fields.map((f) => (
        <View key={f.name} style={s.textBlock}>
          <Text style={s.rowsTitle}>{f.label}</Text>
          {textLines(result.inputs[f.name] as string).map((line, i) => (
            <Text key={i} style={s.textBlockLine}>{monoText(line)}</Text>
          ))}
        </View>
      ))}
    </>
  );
}

function Header({ attrs, kind }: { attrs?: CalcBlockAttrs; kind?: CalcKindDescriptor }) {
  return (
    <View style={s.header}>
      <Text style={s.headerTitle}>{attrs?.label || kind?.title || 'Calc block'}</Text>
      <Text style={s.headerMeta}>{monoText(`${attrs?.kind ?? 'unknown kind'} · ${attrs?.blockId ?? 'no id'}`)}</Text>
    </View>
  );
}

export function CalcBlockView({ attrs, evaluation, evaluations }: { attrs?: CalcBlockAttrs; evaluation?: BlockEvaluation; evaluations: Evaluations }) {
  const kind = attrs ? getCalcKind(attrs.kind) : undefined;
  if (!attrs || !evaluation || evaluation.status === 'error' || !kind) {
    const reason = !attrs ? 'the block’s stored attributes are malformed' : evaluation?.status === 'error' ? evaluation.error : !kind ? `unknown calc kind "${attrs.kind}"` : 'the block was not evaluated';
    const typed = attrs ? Object.entries(attrs.inputs).map(([name, e]) => ({ label: name, value: isRef(e) ? `${e.ref.blockId}.${e.ref.output}` : summariseInputText(e.text) })) : [];
    return (
      <View style={[s.box, s.boxError]} wrap={false}>
        <Header attrs={attrs} kind={kind} />
        <Text style={s.error}>{`[calculation unavailable: ${reason}]`}</Text>
        {typed.length ? (
          <View style={s.columns}>
            <KeyValueTable title="Inputs as stored" rows={typed} />
          </View>
        ) : null}
      </View>
    );
  }
  const { result } = evaluation;
  const scalar = kind.outputs.filter((o) => o.type !== 'rows' && result.outputs[o.name] !== undefined);
  const rowsOutputs = kind.outputs.filter((o) => o.type === 'rows' && Array.isArray(result.outputs[o.name]));
  return (
    <View style={s.box}>
      <View wrap={false}>
        <Header attrs={attrs} kind={kind} />
        <View style={s.columns}>
          <KeyValueTable title="Inputs" rows={inputRows(attrs, kind, result, evaluations)} />
          <KeyValueTable title="Results" rows={scalar.map((o) => ({ label: o.label, value: formatValue(result.outputs[o.name], o.unit, o.precision) }))} />
        </View>
      </View>
      <MultilineInputs kind={kind} result={result} />
      {rowsOutputs.map((o) => (
        <RowsSummary key={o.name} field={o} rows={(result.outputs[o.name] as unknown[]).filter((r): r is Record<string, unknown> => typeof r === 'object' && r !== null)} />
      ))}
      {result.warnings.map((w, i) => (
        <Text key={i} style={s.warning}>{`Warning: ${w}`}</Text>
      ))}
      <View style={s.model} wrap={false}>
        <Text>
          <Text style={s.modelLabel}>Method. </Text>
          {result.model.method}
        </Text>
        <Text>
          <Text style={s.modelLabel}>References. </Text>
          {result.model.references.join('; ')}
        </Text>
      </View>
      <Text style={s.blockFoot}>{result.engineVersion}</Text>
    </View>
  );
}
