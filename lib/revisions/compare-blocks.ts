import { diffArrays, diffWordsWithSpace } from 'diff';
import { nodePlainText } from '@/lib/documents/doc-plain-text';
import { documentIndex, type DocumentIndex } from '@/lib/documents/model/document-index';
import { isMemoNodeType, type MemoNodeType } from '@/lib/documents/model/node-types';
import type { TiptapDoc, TiptapNode } from '@/lib/memos/memo-schema';

export interface TextSegment {
  op: 'equal' | 'insert' | 'delete';
  text: string;
}

/** One top-level part of a memo as the comparison sees it. */
export type CompareUnit =
  | { kind: 'text'; text: string }
  | { kind: 'image'; src: string; alt: string }
  | { kind: 'table'; rows: { header: boolean; cells: string[] }[] };

export interface TableRowChange {
  op: 'equal' | 'insert' | 'delete' | 'change';
  header: boolean;
  /** Each cell's words, with what was inserted or deleted in it. */
  cells: TextSegment[][];
}

/**
 * A step of the comparison, in document order: a part that stayed, one
 * that was inserted or deleted whole, or one that changed — text word by
 * word, an image as its old and new picture, a table row by row and cell
 * by cell.
 */
export type BlockChange =
  | { op: 'equal' | 'insert' | 'delete'; unit: CompareUnit }
  | { op: 'change'; kind: 'text'; segments: TextSegment[] }
  | {
      op: 'change';
      kind: 'image';
      from: Extract<CompareUnit, { kind: 'image' }>;
      to: Extract<CompareUnit, { kind: 'image' }>;
    }
  | { op: 'change'; kind: 'table'; rows: TableRowChange[] };

type Quote = (blockId: string, output: string) => string;

/**
 * How each node type takes part when it is a top-level part of a memo:
 * images and tables are compared as such, everything else as its readable
 * text. Keyed by every node type, so a new type does not compile until its
 * comparison is decided here.
 */
const COMPARE_AS: Record<MemoNodeType, CompareUnit['kind']> = {
  doc: 'text',
  paragraph: 'text',
  heading: 'text',
  bulletList: 'text',
  orderedList: 'text',
  listItem: 'text',
  blockquote: 'text',
  codeBlock: 'text',
  horizontalRule: 'text',
  image: 'image',
  table: 'table',
  tableRow: 'text',
  tableHeader: 'text',
  tableCell: 'text',
  calcBlock: 'text',
  figure: 'text',
  text: 'text',
  hardBreak: 'text',
  liveValue: 'text',
  figureRef: 'text',
  requirement: 'text',
  complianceTable: 'text',
};

function toUnit(node: TiptapNode, index: DocumentIndex, quote: Quote): CompareUnit {
  const as = isMemoNodeType(node.type) ? COMPARE_AS[node.type] : 'text';
  if (as === 'image') return { kind: 'image', src: String(node.attrs?.src ?? ''), alt: String(node.attrs?.alt ?? '') };
  if (as === 'table') {
    return {
      kind: 'table',
      rows: (node.content ?? []).map((row) => ({
        header: (row.content ?? []).length > 0 && (row.content ?? []).every((c) => c.type === 'tableHeader'),
        cells: (row.content ?? []).map((cell) => nodePlainText(cell, index, quote)),
      })),
    };
  }
  return { kind: 'text', text: nodePlainText(node, index, quote) };
}

/** The comparable parts of a memo: one per top-level node, empty paragraphs left out. */
export function compareUnits(doc: TiptapDoc, quote: Quote): CompareUnit[] {
  const index = documentIndex(doc);
  return doc.content.map((n) => toUnit(n, index, quote)).filter((u) => u.kind !== 'text' || u.text.length > 0);
}

const unitKey = (u: CompareUnit): string =>
  u.kind === 'text' ? `t:${u.text}` : u.kind === 'image' ? `i:${u.src}\u0000${u.alt}` : `b:${JSON.stringify(u.rows)}`;
const rowKey = (r: { header: boolean; cells: string[] }) => JSON.stringify(r);

/**
 * Changes separated only by white space read as one: "to be computed" →
 * "668.4 km" shows the old words struck through, then the new ones, rather
 * than word against word interleaved.
 */
function joinChangeRuns(segments: TextSegment[]): TextSegment[] {
  const out: TextSegment[] = [];
  let i = 0;
  while (i < segments.length) {
    if (segments[i].op === 'equal') {
      out.push(segments[i++]);
      continue;
    }
    let deleted = '';
    let inserted = '';
    for (; i < segments.length; i++) {
      const s = segments[i];
      if (s.op === 'delete') deleted += s.text;
      else if (s.op === 'insert') inserted += s.text;
      else if (/^\s+$/.test(s.text) && i + 1 < segments.length && segments[i + 1].op !== 'equal') {
        deleted += s.text;
        inserted += s.text;
      } else break;
    }
    if (deleted) out.push({ op: 'delete', text: deleted });
    if (inserted) out.push({ op: 'insert', text: inserted });
  }
  return out;
}

/** Word-level differences (Myers' O(ND) algorithm, as the `diff` package implements it), changes a space apart joined. */
export function wordDiff(a: string, b: string): TextSegment[] {
  return joinChangeRuns(
    diffWordsWithSpace(a, b).map((part): TextSegment => ({
      op: part.added ? 'insert' : part.removed ? 'delete' : 'equal',
      text: part.value,
    })),
  );
}

/** Walks a list difference, pairing each run of deletions with the insertions right after it. */
function alignRuns<T, R>(
  a: T[],
  b: T[],
  key: (x: T) => string,
  out: { same: (x: T) => R; gone: (x: T) => R; added: (x: T) => R; changed: (x: T, y: T) => R | null },
): R[] {
  const parts = diffArrays(a.map(key), b.map(key));
  const result: R[] = [];
  let ai = 0;
  let bi = 0;
  for (let p = 0; p < parts.length; p++) {
    const part = parts[p];
    const n = part.value.length;
    if (!part.added && !part.removed) {
      for (let k = 0; k < n; k++) result.push(out.same(b[bi + k]));
      ai += n;
      bi += n;
      continue;
    }
    if (part.removed) {
      const next = parts[p + 1];
      const added = next?.added ? next.value.length : 0;
      const olds = a.slice(ai, ai + n);
      const news = b.slice(bi, bi + added);
      for (let k = 0; k < Math.max(olds.length, news.length); k++) {
        const changed = k < olds.length && k < news.length ? out.changed(olds[k], news[k]) : null;
        if (changed) result.push(changed);
        else {
          if (k < olds.length) result.push(out.gone(olds[k]));
          if (k < news.length) result.push(out.added(news[k]));
        }
      }
      ai += n;
      bi += added;
      if (added) p++;
      continue;
    }
    for (let k = 0; k < n; k++) result.push(out.added(b[bi + k]));
    bi += n;
  }
  return result;
}

const whole = (op: 'equal' | 'insert' | 'delete', text: string): TextSegment[] => (text ? [{ op, text }] : []);

function compareTables(
  a: Extract<CompareUnit, { kind: 'table' }>,
  b: Extract<CompareUnit, { kind: 'table' }>,
): TableRowChange[] {
  return alignRuns<{ header: boolean; cells: string[] }, TableRowChange>(a.rows, b.rows, rowKey, {
    same: (r) => ({ op: 'equal', header: r.header, cells: r.cells.map((c) => whole('equal', c)) }),
    gone: (r) => ({ op: 'delete', header: r.header, cells: r.cells.map((c) => whole('delete', c)) }),
    added: (r) => ({ op: 'insert', header: r.header, cells: r.cells.map((c) => whole('insert', c)) }),
    changed: (x, y) => {
      const width = Math.max(x.cells.length, y.cells.length);
      return {
        op: 'change',
        header: y.header,
        cells: Array.from({ length: width }, (_, i) => wordDiff(x.cells[i] ?? '', y.cells[i] ?? '')),
      };
    },
  });
}

/**
 * Compares two memos part by part (top-level nodes, matched by Myers'
 * algorithm over their content): a deleted part followed by an inserted
 * one of the same kind is shown as one change — text word by word, tables
 * row by row and cell by cell, images as the old and the new picture.
 */
export function compareBlocks(a: CompareUnit[], b: CompareUnit[]): BlockChange[] {
  return alignRuns<CompareUnit, BlockChange>(a, b, unitKey, {
    same: (u) => ({ op: 'equal', unit: u }),
    gone: (u) => ({ op: 'delete', unit: u }),
    added: (u) => ({ op: 'insert', unit: u }),
    changed: (x, y) => {
      if (x.kind === 'text' && y.kind === 'text')
        return { op: 'change', kind: 'text', segments: wordDiff(x.text, y.text) };
      if (x.kind === 'image' && y.kind === 'image') return { op: 'change', kind: 'image', from: x, to: y };
      if (x.kind === 'table' && y.kind === 'table') return { op: 'change', kind: 'table', rows: compareTables(x, y) };
      return null;
    },
  });
}
