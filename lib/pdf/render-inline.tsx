/** Inline content of the memo PDF: text with marks, live values, hard breaks. */
import type { ReactNode } from 'react';
import { Link, Text } from '@react-pdf/renderer';
import type { MemoMarkType } from '@/lib/documents/model/node-types';
import type { TiptapNode } from '@/lib/memos/memo-schema';
import { isAllowedLinkHref } from '@/lib/documents/is-allowed-link-href';
import { describeLiveValue } from './describe-live-value';
import type { ContentContext } from './content-context';
import { monoText } from './pdf-fonts';
import { styles } from './pdf-theme';

type Mark = NonNullable<TiptapNode['marks']>[number];
type MarkHandler = (children: ReactNode, mark: Mark, key: number) => ReactNode;

/** One handler per mark type of MEMO_MARK_TYPES. */
export const MARK_HANDLERS: Record<MemoMarkType, MarkHandler> = {
  bold: (c, _m, key) => (
    <Text key={key} style={{ fontWeight: 700 }}>
      {c}
    </Text>
  ),
  italic: (c, _m, key) => (
    <Text key={key} style={{ fontStyle: 'italic' }}>
      {c}
    </Text>
  ),
  strike: (c, _m, key) => (
    <Text key={key} style={{ textDecoration: 'line-through' }}>
      {c}
    </Text>
  ),
  underline: (c, _m, key) => (
    <Text key={key} style={{ textDecoration: 'underline' }}>
      {c}
    </Text>
  ),
  code: (c, _m, key) => (
    <Text key={key} style={styles.inlineCode}>
      {c}
    </Text>
  ),
  // Only allowed schemes become link annotations; any other target (a legacy `javascript:` or `data:` link) is plain text.
  link: (c, m, key) => {
    const href = m.attrs?.href;
    return isAllowedLinkHref(href) ? (
      <Link key={key} src={href} style={styles.link}>
        {c}
      </Link>
    ) : (
      <Text key={key}>{c}</Text>
    );
  },
};

export class UnknownContentTypeError extends Error {
  constructor(what: 'node' | 'mark', type: string, known: readonly string[]) {
    super(
      `The memo contains a ${what} of type "${type}", which the PDF renderer does not know (known ${what} types: ${known.join(', ')}).`,
    );
    this.name = 'UnknownContentTypeError';
  }
}

const isMarkType = (t: string): t is MemoMarkType => t in MARK_HANDLERS;

export function applyMarks(text: ReactNode, marks: TiptapNode['marks'], key: number): ReactNode {
  let out = typeof text === 'string' && marks?.some((m) => m.type === 'code') ? monoText(text) : text;
  // The first mark is the outermost, as ProseMirror stores them.
  for (const mark of [...(marks ?? [])].reverse()) {
    if (!isMarkType(mark.type)) throw new UnknownContentTypeError('mark', mark.type, Object.keys(MARK_HANDLERS));
    out = MARK_HANDLERS[mark.type](out, mark, key);
  }
  return out;
}

/** A live value as text at display precision with its unit, or a visible "[value unavailable: …]". */
export function renderLiveValue(node: TiptapNode, ctx: ContentContext, key: number): ReactNode {
  const v = describeLiveValue(node.attrs, ctx.evaluations);
  const inner = v.ok ? (
    <Text key={key} style={styles.liveValue}>
      {v.text}
    </Text>
  ) : (
    <Text key={key} style={styles.unavailable}>{`[value unavailable: ${v.reason}]`}</Text>
  );
  return applyMarks(inner, node.marks, key);
}

/** "Figure n" of a referenced figure, by document order, or a visible "[figure reference broken]". */
export function figureRefText(node: TiptapNode, ctx: ContentContext): string {
  const figure = ctx.prepared.figures.get(String(node.attrs?.figureId ?? ''));
  return figure ? `Figure ${figure.number}` : '[figure reference broken: the figure was removed]';
}

export function renderFigureRef(node: TiptapNode, ctx: ContentContext, key: number): ReactNode {
  const text = figureRefText(node, ctx);
  return applyMarks(
    <Text key={key} style={text.startsWith('[') ? styles.unavailable : undefined}>
      {text}
    </Text>,
    node.marks,
    key,
  );
}

/** Plain text of inline content (for the contents, bookmarks and figure captions). */
export function plainText(node: TiptapNode, ctx: ContentContext): string {
  if (node.type === 'text') return node.text ?? '';
  if (node.type === 'hardBreak') return ' ';
  if (node.type === 'figureRef') return figureRefText(node, ctx);
  if (node.type === 'liveValue') {
    const v = describeLiveValue(node.attrs, ctx.evaluations);
    return v.ok ? v.text : `[value unavailable: ${v.reason}]`;
  }
  return (node.content ?? []).map((c) => plainText(c, ctx)).join('');
}
