/**
 * Walks a stored memo (Tiptap JSON) into react-pdf elements with one
 * handler for every node type of MEMO_NODE_TYPES and every mark of
 * MEMO_MARK_TYPES (a MemoNodeVisitor of the document model, so a new node
 * type does not compile until it has a handler here); an unknown type
 * throws UnknownContentTypeError naming it. The approach follows Tiptap's static renderer (a mapping from node
 * type to renderer), written for react-pdf's primitives.
 */
import type { ReactNode } from 'react';
import { Image, Text, View } from '@react-pdf/renderer';
import { isMemoNodeType } from '@/lib/documents/model/node-types';
import { visitMemoNode, type MemoNodeVisitor } from '@/lib/documents/model/visit-memo-node';
import { calcBlockAttrsSchema } from '@/lib/documents/calc-nodes';
import type { TiptapNode } from '@/lib/memos/memo-schema';
import { CalcBlockView } from './calc-block-view';
import type { ContentContext } from './content-context';
import { FigureView } from './figure-view';
import { monoText } from './pdf-fonts';
import { styles, INK_SOFT } from './pdf-theme';
import { applyMarks, plainText, renderFigureRef, renderLiveValue, UnknownContentTypeError } from './render-inline';


const INLINE_TYPES = new Set(['text', 'liveValue', 'hardBreak', 'figureRef']);
const HEADING_STYLE = { 1: styles.heading1, 2: styles.heading2, 3: styles.heading3 } as const;

const inline = (node: TiptapNode, ctx: ContentContext): ReactNode[] => (node.content ?? []).map((c, i) => renderNode(c, ctx, i));

/** Block children; stray inline nodes are gathered into paragraphs so react-pdf never sees bare text in a View. */
function blocks(node: TiptapNode, ctx: ContentContext): ReactNode[] {
  const out: ReactNode[] = [];
  let run: TiptapNode[] = [];
  const flush = () => {
    if (run.length) out.push(<Text key={`run${out.length}`} style={styles.paragraph}>{run.map((c, i) => renderNode(c, ctx, i))}</Text>);
    run = [];
  };
  (node.content ?? []).forEach((child, i) => {
    if (INLINE_TYPES.has(child.type)) {
      run.push(child);
      return;
    }
    flush();
    out.push(renderNode(child, ctx, i));
  });
  flush();
  return out;
}

function listItems(node: TiptapNode, ctx: ContentContext, marker: (index: number) => string): ReactNode[] {
  const inner = { ...ctx, listDepth: ctx.listDepth + 1 };
  return (node.content ?? []).map((item, i) => {
    if (item.type !== 'listItem') return renderNode(item, inner, i);
    return (
      <View key={i} style={styles.listRow} wrap={false}>
        <Text style={styles.listMarker}>{marker(i)}</Text>
        <View style={styles.listBody}>{blocks(item, inner)}</View>
      </View>
    );
  });
}

function tableCell(node: TiptapNode, ctx: ContentContext, key: number, header: boolean): ReactNode {
  const span = Number(node.attrs?.colspan ?? 1);
  return (
    <View key={key} style={[styles.tableCell, header ? styles.tableHeaderCell : {}, { flexGrow: Number.isFinite(span) && span > 0 ? span : 1 }]}>
      {blocks(node, { ...ctx, listDepth: ctx.listDepth + 1 })}
    </View>
  );
}

/**
 * The PDF outline entry of a heading. react-pdf's layout reads `bookmark` on any node (resolveBookmarks)
 * while its renderer typings declare it on Page only, hence the untyped prop.
 */
const headingBookmark = (title: string | undefined): object => (title ? { bookmark: { title, fit: true } } : {});

/** One handler per node type of MEMO_NODE_TYPES. */
export const NODE_HANDLERS: MemoNodeVisitor<[ContentContext, number], ReactNode> = {
  doc: (node, ctx, key) => <View key={key}>{blocks(node, ctx)}</View>,
  paragraph: (node, ctx, key) => (
    <Text key={key} style={[styles.paragraph, ctx.listDepth > 0 ? { marginBottom: 2 } : {}]}>
      {node.content?.length ? inline(node, ctx) : ' '}
    </Text>
  ),
  text: (node, _ctx, key) => applyMarks(node.text ?? '', node.marks, key),
  hardBreak: (_node, _ctx, key) => <Text key={key}>{'\n'}</Text>,
  liveValue: renderLiveValue,
  figureRef: renderFigureRef,
  heading: (node, ctx, key) => {
    const info = ctx.prepared.headings.get(node);
    const level = info?.level ?? 1;
    return (
      <View key={key} wrap={false} minPresenceAhead={48} id={info?.id} {...headingBookmark(info ? `${info.number}  ${plainText(node, ctx)}` : undefined)}>
        {info ? (
          <View
            render={({ pageNumber }) => {
              ctx.book.land(info.id, pageNumber);
              return null;
            }}
          />
        ) : null}
        <Text style={HEADING_STYLE[level as 1 | 2 | 3]}>
          {info ? <Text style={styles.headingNumber}>{`${info.number}  `}</Text> : null}
          {inline(node, ctx)}
        </Text>
      </View>
    );
  },
  bulletList: (node, ctx, key) => <View key={key} style={{ marginBottom: ctx.listDepth ? 0 : 6 }}>{listItems(node, ctx, () => (ctx.listDepth % 2 ? '–' : '•'))}</View>,
  orderedList: (node, ctx, key) => {
    const start = Number(node.attrs?.start ?? 1);
    return <View key={key} style={{ marginBottom: ctx.listDepth ? 0 : 6 }}>{listItems(node, ctx, (i) => `${(Number.isFinite(start) ? start : 1) + i}.`)}</View>;
  },
  listItem: (node, ctx, key) => <View key={key}>{blocks(node, ctx)}</View>,
  blockquote: (node, ctx, key) => <View key={key} style={styles.blockquote}>{blocks(node, ctx)}</View>,
  codeBlock: (node, ctx, key) => <Text key={key} style={styles.codeBlock}>{monoText(plainText(node, ctx))}</Text>,
  horizontalRule: (_node, _ctx, key) => <View key={key} style={styles.rule} />,
  image: (node, ctx, key) => {
    const src = typeof node.attrs?.src === 'string' ? node.attrs.src : '';
    const title = typeof node.attrs?.title === 'string' ? node.attrs.title : typeof node.attrs?.alt === 'string' ? node.attrs.alt : '';
    const image = ctx.prepared.images.get(src);
    return (
      <View key={key} wrap={false}>
        {image ? <Image src={image} style={[styles.image, { maxWidth: ctx.contentWidth, maxHeight: 360 }]} /> : <Text style={styles.unavailable}>{`[image unavailable: ${src ? src.slice(0, 80) : 'no source'}]`}</Text>}
        {title ? <Text style={[styles.caption, { color: INK_SOFT }]}>{title}</Text> : null}
      </View>
    );
  },
  table: (node, ctx, key) => <View key={key} style={styles.table}>{(node.content ?? []).map((row, i) => renderNode(row, ctx, i))}</View>,
  tableRow: (node, ctx, key) => (
    <View key={key} style={styles.tableRow} wrap={false}>
      {(node.content ?? []).map((cell, i) => renderNode(cell, ctx, i))}
    </View>
  ),
  tableHeader: (node, ctx, key) => tableCell(node, ctx, key, true),
  tableCell: (node, ctx, key) => tableCell(node, ctx, key, false),
  calcBlock: (node, ctx, key) => {
    const parsed = calcBlockAttrsSchema.safeParse(node.attrs ?? {});
    const evaluation = parsed.success ? ctx.evaluations.get(parsed.data.blockId) : undefined;
    return <CalcBlockView key={key} attrs={parsed.success ? parsed.data : undefined} evaluation={evaluation} evaluations={ctx.evaluations} />;
  },
  figure: (node, ctx, key) => {
    const id = typeof node.attrs?.figureId === 'string' ? node.attrs.figureId : '';
    return <FigureView key={key} figure={ctx.prepared.figures.get(id)} width={ctx.contentWidth} />;
  },
};

export function renderNode(node: TiptapNode, ctx: ContentContext, key: number): ReactNode {
  if (!isMemoNodeType(node.type)) throw new UnknownContentTypeError('node', node.type, Object.keys(NODE_HANDLERS));
  return visitMemoNode(NODE_HANDLERS, node, ctx, key);
}
