/**
 * The node and mark types a stored memo may contain: the one list. Records
 * keyed by these types (attribute schemas, the visitors of the PDF, the
 * plain text and the comment text) fail to compile until they handle a
 * type added here.
 */
export const MEMO_NODE_TYPES = [
  'doc',
  'paragraph',
  'text',
  'heading',
  'bulletList',
  'orderedList',
  'listItem',
  'blockquote',
  'codeBlock',
  'hardBreak',
  'horizontalRule',
  'image',
  'table',
  'tableRow',
  'tableHeader',
  'tableCell',
  'calcBlock',
  'liveValue',
  'figure',
  'figureRef',
  'requirement',
  'complianceTable',
] as const;
/** Marks a stored memo may contain. */
export const MEMO_MARK_TYPES = ['bold', 'italic', 'strike', 'code', 'underline', 'link'] as const;

export type MemoNodeType = (typeof MEMO_NODE_TYPES)[number];
export type MemoMarkType = (typeof MEMO_MARK_TYPES)[number];

const NODE_TYPE_SET: ReadonlySet<string> = new Set(MEMO_NODE_TYPES);
const MARK_TYPE_SET: ReadonlySet<string> = new Set(MEMO_MARK_TYPES);
export const isMemoNodeType = (t: string): t is MemoNodeType => NODE_TYPE_SET.has(t);
export const isMemoMarkType = (t: string): t is MemoMarkType => MARK_TYPE_SET.has(t);
