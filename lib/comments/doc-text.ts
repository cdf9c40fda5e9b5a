import type { Node as ProseMirrorNode } from '@tiptap/pm/model';
import { isMemoNodeType, type MemoNodeType } from '@/lib/documents/model/node-types';
import type { TextRange } from './locate-anchor';

/** Between two blocks (paragraphs, headings, list items, table cells, calc blocks). */
export const BLOCK_SEPARATOR = '\n';
/**
 * Stands for an inline node without text of its own (a live value, an
 * inline image): U+FFFC OBJECT REPLACEMENT CHARACTER (The Unicode
 * Standard, chapter 23.8, "Specials"). A quote that spans a live value
 * keeps matching when the value's number changes.
 */
export const INLINE_OBJECT = '\uFFFC';

/**
 * What each node type gives the comment text: `block` separates blocks (its
 * content follows), `text` its characters, `break` a line break, `object`
 * one INLINE_OBJECT. Keyed by every node type of the model, so a new type
 * does not compile until its part in quoted text is decided here.
 */
export const COMMENT_TEXT_ROLE: Record<MemoNodeType, 'block' | 'text' | 'break' | 'object'> = {
  doc: 'block',
  paragraph: 'block',
  heading: 'block',
  bulletList: 'block',
  orderedList: 'block',
  listItem: 'block',
  blockquote: 'block',
  codeBlock: 'block',
  horizontalRule: 'block',
  image: 'block',
  table: 'block',
  tableRow: 'block',
  tableHeader: 'block',
  tableCell: 'block',
  calcBlock: 'block',
  figure: 'block',
  requirement: 'block',
  complianceTable: 'block',
  text: 'text',
  hardBreak: 'break',
  liveValue: 'object',
  figureRef: 'object',
};

/** The role of a node; a type outside the model (not in the editor's schema, so not expected) by its shape. */
function roleOf(node: ProseMirrorNode): 'block' | 'text' | 'break' | 'object' | 'other' {
  const name = node.type.name;
  if (isMemoNodeType(name)) return COMMENT_TEXT_ROLE[name];
  if (node.isBlock) return 'block';
  if (node.isText) return 'text';
  return node.isInline && node.isLeaf ? 'object' : 'other';
}

/** A memo's plain text with, for each character, its ProseMirror document position. */
export interface DocText {
  text: string;
  /** Document position of each character of `text`; -1 for a block separator. */
  positions: Int32Array;
}

/**
 * The plain text of a ProseMirror document, as comment anchors quote it:
 * text as written, a BLOCK_SEPARATOR between blocks, a hard break as a
 * line break, and INLINE_OBJECT for each inline node without text. Block
 * nodes without text (calc blocks, figures, rules) only separate.
 */
export function docText(doc: ProseMirrorNode): DocText {
  const chars: string[] = [];
  const positions: number[] = [];
  const separate = () => {
    if (chars.length > 0 && positions[positions.length - 1] !== -1) {
      chars.push(BLOCK_SEPARATOR);
      positions.push(-1);
    }
  };
  doc.descendants((node, pos) => {
    const role = roleOf(node);
    if (role === 'block') {
      separate();
      return true;
    }
    if (role === 'text') {
      const t = node.text ?? '';
      for (let i = 0; i < t.length; i++) {
        chars.push(t[i]);
        positions.push(pos + i);
      }
      return false;
    }
    if (role === 'break' || role === 'object') {
      chars.push(role === 'break' ? '\n' : INLINE_OBJECT);
      positions.push(pos);
      return false;
    }
    return true;
  });
  // A trailing separator carries nothing.
  if (positions[positions.length - 1] === -1) {
    chars.pop();
    positions.pop();
  }
  return { text: chars.join(''), positions: Int32Array.from(positions) };
}

/** Document positions [from, to) of a text range, or null when it covers no character of the document. */
export function textRangeToDocRange(dt: DocText, range: TextRange): { from: number; to: number } | null {
  let i = Math.max(0, range.from);
  let j = Math.min(dt.positions.length, range.to) - 1;
  while (i <= j && dt.positions[i] < 0) i++;
  while (j >= i && dt.positions[j] < 0) j--;
  if (i > j) return null;
  return { from: dt.positions[i], to: dt.positions[j] + 1 };
}

/** Text offsets [from, to) of the characters inside document positions [from, to). */
export function docRangeToTextRange(dt: DocText, from: number, to: number): TextRange {
  const p = dt.positions;
  let start = p.length;
  for (let i = 0; i < p.length; i++) {
    if (p[i] >= from) {
      start = i;
      break;
    }
  }
  let end = start;
  for (let i = p.length - 1; i >= start; i--) {
    if (p[i] >= 0 && p[i] < to) {
      end = i + 1;
      break;
    }
  }
  return { from: start, to: Math.max(start, end) };
}

/**
 * The text [from, to) as the reader sees it: each INLINE_OBJECT replaced by
 * the text its node shows (`objectText` of its document position: a live
 * value's number and unit, a figure reference's "Figure 2"), or kept when
 * that is unknown.
 */
export function shownText(dt: DocText, range: TextRange, objectText: (pos: number) => string | null): string {
  let out = '';
  for (let i = Math.max(0, range.from); i < Math.min(dt.text.length, range.to); i++) {
    const ch = dt.text[i];
    out += ch === INLINE_OBJECT && dt.positions[i] >= 0 ? (objectText(dt.positions[i]) ?? ch) : ch;
  }
  return out;
}
