/** A calc block in the PDF: inputs and results with units, warnings, and the model note (method and references). */
import { Text, View } from '@react-pdf/renderer';
import { getCalcKind, type CalcKindDescriptor, type CalcResult } from '@/lib/calc';
import { isRef, type CalcBlockAttrs } from '@/lib/documents/calc-nodes';
import type { BlockEvaluation } from '@/lib/documents/evaluate-document';
import { FRAME_NAMES } from '@/lib/calc/frame-names';
import { displayUnit, formatValue } from '@/lib/format/format-output';
import { summariseInputText } from '@/lib/format/summarise-input-text';
import { calcStyles as s } from './calc-block-styles';
import type { HeadingPageBook } from './heading-page-book';
import { ROWS_SHOWN, seriesKey, type SeriesTable } from './number-tables';
import { monoText } from './pdf-fonts';
import { SeriesTableView } from './series-table-view';

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

/** Rows kept with a column's title, so that a column never starts with its title alone at a page foot. */
const ROWS_WITH_TITLE = 3;

function KeyValueRow({ row }: { row: { label: string; value: string; note?: string } }) {
  return (
    <View style={s.kvRow} wrap={false}>
      <View style={s.kvLabel}>
        <Text>{row.label}</Text>
        {row.note ? <Text style={s.note}>{row.note}</Text> : null}
      </View>
      <Text style={s.kvValue}>{row.value}</Text>
    </View>
  );
}

function KeyValueTable({ title, rows }: { title: string; rows: { label: string; value: string; note?: string }[] }) {
  return (
    <View style={s.column}>
      <View wrap={false}>
        <Text style={s.columnTitle}>{title}</Text>
        {rows.slice(0, ROWS_WITH_TITLE).map((r, i) => (
          <KeyValueRow key={i} row={r} />
        ))}
      </View>
      {rows.slice(ROWS_WITH_TITLE).map((r, i) => (
        <KeyValueRow key={i} row={r} />
      ))}
    </View>
  );
}

type Evaluations = ReadonlyMap<string, BlockEvaluation>;

/** An input fed by another block's output: shown at that output's display precision, with where it comes from. */
function referencedInput(
  ref: { blockId: string; output: string },
  value: unknown,
  unit: string | null,
  evaluations: Evaluations,
) {
  const upstream = evaluations.get(ref.blockId);
  const field =
    upstream?.status === 'ok'
      ? getCalcKind(upstream.result.kind)?.outputs.find((o) => o.name === ref.output)
      : undefined;
  return {
    value: field ? formatValue(value, unit ?? field.unit, field.precision) : formatInputValue(value, unit),
    note: `from ${blockName(upstream)}${field ? ` (${field.label.toLowerCase()})` : ''}`,
  };
}

function inputRows(attrs: CalcBlockAttrs, kind: CalcKindDescriptor, result: CalcResult, evaluations: Evaluations) {
  return kind.inputs
    .filter((f) => result.inputs[f.name] !== undefined)
    .map((f) => {
      const entry = attrs.inputs[f.name];
      const value = result.inputs[f.name];
      // Text of several lines (pasted TLEs) is printed whole under the block, line by line; the table says so.
      const shown =
        f.multiline && typeof value === 'string'
          ? { value: `${textLines(value).length} lines, printed below` }
          : undefined;
      const row = {
        label: f.label,
        ...(shown ??
          (entry && isRef(entry)
            ? referencedInput(entry.ref, value, f.unit, evaluations)
            : { value: formatInputValue(value, f.unit) })),
      };
      // An element input names the frame its value is in (the design kinds: true of date).
      const frameNote = f.frame ? `frame: ${FRAME_NAMES[f.frame].short}` : undefined;
      return frameNote ? { ...row, note: 'note' in row && row.note ? `${row.note}; ${frameNote}` : frameNote } : row;
    });
}

/** The non-blank lines of a multi-line input. */
function textLines(text: string): string[] {
  return text
    .split(/\r\n|\r|\n/)
    .map((l) => l.replace(/\s+$/, ''))
    .filter((l) => l !== '');
}

/** Multi-line inputs (a pasted TLE list) in full, in monospace, one printed line per input line. */
function MultilineInputs({ kind, result }: { kind: CalcKindDescriptor; result: CalcResult }) {
  const fields = kind.inputs.filter((f) => f.multiline && typeof result.inputs[f.name] === 'string');
  return (
    <>
      {fields.map((f) => (
        // The rule above sits on the title, not the box: a box edge would stay behind alone at a page foot.
        <View key={f.name} style={s.textBlock}>
          <Text style={s.textBlockTitle} minPresenceAhead={1}>
            {f.label}
          </Text>
          {textLines(result.inputs[f.name] as string).map((line, i) => (
            <Text key={i} style={s.textBlockLine}>
              {monoText(line)}
            </Text>
          ))}
        </View>
      ))}
    </>
  );
}

/** A block as the reader knows it: its label, else its kind's title; never its internal id. */
function blockName(evaluation: BlockEvaluation | undefined): string {
  return (
    evaluation?.block.label ||
    (evaluation ? getCalcKind(evaluation.block.kind)?.title : undefined) ||
    'another calc block'
  );
}

/**
 * The block's title line. First child of the block's box and marked `fixed`: react-pdf's paginator repeats it at the
 * head of every page the block continues on, and (being first, with minPresenceAhead) never leaves it alone at a page foot.
 */
function Header({ attrs, kind }: { attrs?: CalcBlockAttrs; kind?: CalcKindDescriptor }) {
  const title = attrs?.label || kind?.title || 'Calc block';
  return (
    <View style={s.header} fixed minPresenceAhead={1} wrap={false}>
      <Text style={s.headerTitle}>{title}</Text>
      {kind && kind.title !== title ? <Text style={s.headerMeta}>{kind.title}</Text> : null}
    </View>
  );
}

/** The engine's refusal with each input named by its label (the engine's message names fields by their internal names). */
function errorReason(
  evaluation: Extract<BlockEvaluation, { status: 'error' }>,
  kind: CalcKindDescriptor | undefined,
): string {
  const fields = Object.entries(evaluation.fields);
  if (!kind || fields.length === 0) return evaluation.error;
  return fields
    .map(
      ([name, message]) =>
        `${kind.inputs.find((f) => f.name === name)?.label ?? 'input'}: ${message.startsWith(`${name}: `) ? message.slice(name.length + 2) : message}`,
    )
    .join('; ');
}

/** Inputs as stored in a block that could not be computed, by field label; references name the block they read. */
function storedInputs(attrs: CalcBlockAttrs, kind: CalcKindDescriptor | undefined, evaluations: Evaluations) {
  return Object.entries(attrs.inputs).map(([name, e]) => {
    const field = kind?.inputs.find((f) => f.name === name);
    if (!isRef(e))
      return { label: field?.label ?? 'Input no longer used by this kind', value: summariseInputText(e.text) };
    const upstream = evaluations.get(e.ref.blockId);
    const output = upstream
      ? getCalcKind(upstream.block.kind)?.outputs.find((o) => o.name === e.ref.output)
      : undefined;
    return {
      label: field?.label ?? 'Input no longer used by this kind',
      value: upstream
        ? `from ${blockName(upstream)}${output ? ` (${output.label.toLowerCase()})` : ''}`
        : 'from a calc block no longer in the memo',
    };
  });
}

export function CalcBlockView({
  attrs,
  evaluation,
  evaluations,
  series,
  book,
}: {
  attrs?: CalcBlockAttrs;
  evaluation?: BlockEvaluation;
  evaluations: Evaluations;
  series: ReadonlyMap<string, SeriesTable>;
  book: HeadingPageBook;
}) {
  const kind = attrs ? getCalcKind(attrs.kind) : undefined;
  if (!attrs || !evaluation || evaluation.status === 'error' || !kind) {
    const reason = !attrs
      ? 'the block’s stored attributes are malformed'
      : evaluation?.status === 'error'
        ? errorReason(evaluation, kind)
        : !kind
          ? `unknown calc kind "${attrs.kind}"`
          : 'the block was not evaluated';
    const typed = attrs ? storedInputs(attrs, kind, evaluations) : [];
    return (
      <View style={[s.box, s.boxError]} wrap={false}>
        <Header attrs={attrs} kind={kind} />
        <Text style={s.error}>{`[calculation unavailable: ${reason}]`}</Text>
        {typed.length ? (
          <View style={s.columns}>
            <KeyValueTable title="Inputs as stored" rows={typed} />
          </View>
        ) : null}
        <View style={s.boxEnd} />
      </View>
    );
  }
  const { result } = evaluation;
  const scalar = kind.outputs.filter((o) => o.type !== 'rows' && result.outputs[o.name] !== undefined);
  const tables = kind.outputs
    .map((o) => series.get(seriesKey(attrs.blockId, o.name)))
    .filter((t): t is SeriesTable => t !== undefined);
  // The box has no vertical padding: a padded box whose content moves to the next page would leave its empty,
  // ruled top edge at the foot of this one. Header and foot carry the spacing instead.
  return (
    <View style={s.box}>
      <Header attrs={attrs} kind={kind} />
      <View style={s.columns}>
        <KeyValueTable title="Inputs" rows={inputRows(attrs, kind, result, evaluations)} />
        <KeyValueTable
          title="Results"
          rows={scalar.map((o) => ({
            label: o.label,
            value: formatValue(result.outputs[o.name], o.unit, o.precision),
          }))}
        />
      </View>
      <MultilineInputs kind={kind} result={result} />
      {tables.map((t) => (
        <SeriesTableView key={t.id} table={t} shown={ROWS_SHOWN} book={book} />
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
