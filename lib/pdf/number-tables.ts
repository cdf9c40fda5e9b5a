import { getCalcKind, type CalcOutputField } from '@/lib/calc';
import { calcBlockAttrsSchema } from '@/lib/documents/calc-nodes';
import type { BlockEvaluation } from '@/lib/documents/evaluate-document';
import { walk } from '@/lib/documents/model/walk-document';
import type { TiptapNode } from '@/lib/memos/memo-schema';

/** Rows of a series table printed in the body; a longer series is cut there and printed whole in the annex. */
export const ROWS_SHOWN = 8;

/** A series (rows output of a calc block) printed as a table. */
export interface SeriesTable {
  /** Body number: "Table 3". */
  number: number;
  blockLabel: string;
  field: CalcOutputField;
  rows: Record<string, unknown>[];
  /** Destination id of the body table ("tab-3"). */
  id: string;
  /** Annex number ("A-1") when the body shows only the first ROWS_SHOWN rows. */
  annex?: string;
}

export interface TableIndex {
  /** Tables of the memo's text, numbered with the series tables in document order. */
  text: Map<TiptapNode, { number: number; id: string; caption: string }>;
  /** Key `${blockId}/${output}`. */
  series: Map<string, SeriesTable>;
  /** Every numbered table in document order (for the list of tables). */
  all: { id: string; label: string; caption: string }[];
  /** Cut series in annex order. */
  annexed: SeriesTable[];
}

export const seriesKey = (blockId: string, output: string): string => `${blockId}/${output}`;

const rowsOf = (value: unknown): Record<string, unknown>[] =>
  Array.isArray(value) ? value.filter((r): r is Record<string, unknown> => typeof r === 'object' && r !== null) : [];

const textOf = (node: TiptapNode): string =>
  node.type === 'text' ? (node.text ?? '') : (node.content ?? []).map(textOf).join('');

export const seriesCaption = (t: Pick<SeriesTable, 'blockLabel' | 'field'>): string =>
  `${t.blockLabel}: ${t.field.label.charAt(0).toLowerCase()}${t.field.label.slice(1)}`;

/**
 * Numbers the memo's tables in document order: tables of the text (captioned
 * with the heading they stand under, as the text table node has no caption of
 * its own) and the series of evaluated calc blocks. Series longer than
 * ROWS_SHOWN get an annex number in the appendix letter given.
 */
export function numberTables(
  doc: TiptapNode,
  evaluations: ReadonlyMap<string, BlockEvaluation>,
  annexLetter: string,
): TableIndex {
  const index: TableIndex = { text: new Map(), series: new Map(), all: [], annexed: [] };
  let heading = '';
  walk(doc, (node) => {
    if (node.type === 'heading') heading = textOf(node).trim();
    if (node.type === 'table') {
      const number = index.all.length + 1;
      const entry = { number, id: `tab-${number}`, caption: heading || 'Table in the text' };
      index.text.set(node, entry);
      index.all.push({ id: entry.id, label: `Table ${number}`, caption: entry.caption });
      return;
    }
    if (node.type !== 'calcBlock') return;
    const parsed = calcBlockAttrsSchema.safeParse(node.attrs ?? {});
    const evaluation = parsed.success ? evaluations.get(parsed.data.blockId) : undefined;
    if (!parsed.success || evaluation?.status !== 'ok') return;
    const kind = getCalcKind(evaluation.result.kind);
    for (const field of kind?.outputs ?? []) {
      if (field.type !== 'rows' || !Array.isArray(evaluation.result.outputs[field.name])) continue;
      const number = index.all.length + 1;
      const table: SeriesTable = {
        number,
        id: `tab-${number}`,
        blockLabel: parsed.data.label || kind?.title || 'Calc block',
        field,
        rows: rowsOf(evaluation.result.outputs[field.name]),
      };
      if (table.rows.length > ROWS_SHOWN) {
        table.annex = `${annexLetter}-${index.annexed.length + 1}`;
        index.annexed.push(table);
      }
      index.series.set(seriesKey(parsed.data.blockId, field.name), table);
      index.all.push({ id: table.id, label: `Table ${number}`, caption: seriesCaption(table) });
    }
  });
  return index;
}
