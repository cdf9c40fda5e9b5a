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
import { bookmarkProps, PageMark, TableCaption } from './page-mark';
import { groupSections, isSection, type Section } from './group-sections';
import { ComplianceTableView, RequirementView } from './requirement-view';
import { monoText } from './pdf-fonts';
import { styles, INK_SOFT } from './pdf-theme';
import { applyMarks, plainText, renderFigureRef, renderLiveValue, UnknownContentTypeError } from './render-inline';

const INLINE_TYPES = new Set(['text', 'liveValue', 'hardBreak', 'figureRef']);
const HEADING_STYLE = { 1: styles.heading1, 2: styles.heading2, 3: styles.heading3 } as const;

const inline = (node: TiptapNode, ctx: ContentContext): ReactNode[] =>
  (node.content ?? []).map((c, i) => renderNode(c, ctx, i));

/** Stray inline nodes among blocks gathered into paragraphs. */
function paragraphed(children: readonly TiptapNode[]): TiptapNode[] {
  const out: TiptapNode[] = [];
  for (const child of children) {
    const last = out[out.length - 1];
    if (!INLINE_TYPES.has(child.type)) out.push(child);
    else if (last?.type === 'paragraph' && (last.attrs as { stray?: boolean } | undefined)?.stray)
      last.content = [...(last.content ?? []), child];
    else out.push({ type: 'paragraph', attrs: { stray: true }, content: [child] });
  }
  return out;
}

/** Block children; stray inline nodes are gathered into paragraphs so react-pdf never sees bare text in a View. */
function blocks(node: TiptapNode, ctx: ContentContext): ReactNode[] {
  const out: ReactNode[] = [];
  let run: TiptapNode[] = [];
  const flush = () => {
    if (run.length)
      out.push(
        <Text key={`run${out.length}`} style={styles.paragraph}>
          {run.map((c, i) => renderNode(c, ctx, i))}
        </Text>,
      );
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

/**
 * Text-table cells carry every rule themselves (top rule on the first row, left rule on the first cell): a table box
 * with its own top border would leave that border, and nothing else, at a page foot when its rows move on.
 */
function tableCell(node: TiptapNode, ctx: ContentContext, key: number, header: boolean): ReactNode {
  const span = Number(node.attrs?.colspan ?? 1);
  return (
    <View
      key={key}
      style={[
        styles.tableCell,
        header ? styles.tableHeaderCell : {},
        key === 0 ? { borderLeftWidth: 0.6 } : {},
        { flexGrow: Number.isFinite(span) && span > 0 ? span : 1 },
      ]}
    >
      {blocks(node, { ...ctx, listDepth: ctx.listDepth + 1 })}
    </View>
  );
}

/** Images added before captions existed carry their file name as alternative text: that is not a caption. */
const FILE_NAME = /^[^\s/\\]+\.(png|jpe?g|gif|webp|svg|bmp|tiff?)$/i;

/** A caption printed under an image: its caption, else its alternative text; never a file name. */
export function imageCaption(attrs: Record<string, unknown> | undefined): string {
  for (const key of ['caption', 'alt']) {
    const v = attrs?.[key];
    if (typeof v === 'string' && v.trim() && !FILE_NAME.test(v.trim())) return v.trim();
  }
  return '';
}

/** The memo's top-level blocks, each numbered section wrapped in a View carrying its bookmark (nested outline). */
function sections(items: (TiptapNode | Section)[], ctx: ContentContext): ReactNode[] {
  return items.map((item, i) =>
    isSection(item) ? (
      <View key={i} {...bookmarkProps(`${item.info.number}  ${plainText(item.heading, ctx)}`)}>
        {sections(item.children, ctx)}
      </View>
    ) : (
      renderNode(item, ctx, i)
    ),
  );
}

/** One handler per node type of MEMO_NODE_TYPES. */
export const NODE_HANDLERS: MemoNodeVisitor<[ContentContext, number], ReactNode> = {
  doc: (node, ctx, key) => (
    <View key={key}>{sections(groupSections(paragraphed(node.content ?? []), ctx.prepared.headings), ctx)}</View>
  ),
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
      <View key={key} wrap={false} minPresenceAhead={48} id={info?.id}>
        {info ? <PageMark id={info.id} book={ctx.book} /> : null}
        <Text style={HEADING_STYLE[level as 1 | 2 | 3]}>
          {info ? <Text style={styles.headingNumber}>{`${info.number}  `}</Text> : null}
          {inline(node, ctx)}
        </Text>
      </View>
    );
  },
  bulletList: (node, ctx, key) => (
    <View key={key} style={{ marginBottom: ctx.listDepth ? 0 : 6 }}>
      {listItems(node, ctx, () => (ctx.listDepth % 2 ? '–' : '•'))}
    </View>
  ),
  orderedList: (node, ctx, key) => {
    const start = Number(node.attrs?.start ?? 1);
    return (
      <View key={key} style={{ marginBottom: ctx.listDepth ? 0 : 6 }}>
        {listItems(node, ctx, (i) => `${(Number.isFinite(start) ? start : 1) + i}.`)}
      </View>
    );
  },
  listItem: (node, ctx, key) => <View key={key}>{blocks(node, ctx)}</View>,
  blockquote: (node, ctx, key) => (
    <View key={key} style={styles.blockquote}>
      {blocks(node, ctx)}
    </View>
  ),
  codeBlock: (node, ctx, key) => (
    <Text key={key} style={styles.codeBlock}>
      {monoText(plainText(node, ctx))}
    </Text>
  ),
  horizontalRule: (_node, _ctx, key) => <View key={key} style={styles.rule} />,
  image: (node, ctx, key) => {
    const src = typeof node.attrs?.src === 'string' ? node.attrs.src : '';
    const caption = imageCaption(node.attrs);
    const image = ctx.prepared.images.get(src);
    return (
      <View key={key} wrap={false}>
        {image ? (
          <Image src={image} style={[styles.image, { maxWidth: ctx.contentWidth, maxHeight: 360 }]} />
        ) : (
          <Text style={styles.unavailable}>{`[image unavailable: ${src ? src.slice(0, 80) : 'no source'}]`}</Text>
        )}
        {caption ? <Text style={[styles.caption, { color: INK_SOFT }]}>{caption}</Text> : null}
      </View>
    );
  },
  table: (node, ctx, key) => {
    const info = ctx.prepared.tables.text.get(node);
    return (
      <View key={key} style={styles.table} id={info?.id}>
        {info ? (
          <TableCaption id={info.id} book={ctx.book} label={`Table ${info.number}. `}>
            {info.caption}
          </TableCaption>
        ) : null}
        {(node.content ?? []).map((row, i) => renderNode(row, ctx, i))}
      </View>
    );
  },
  tableRow: (node, ctx, key) => (
    <View key={key} style={[styles.tableRow, key === 0 ? styles.tableFirstRow : {}]} wrap={false}>
      {(node.content ?? []).map((cell, i) => renderNode(cell, ctx, i))}
    </View>
  ),
  tableHeader: (node, ctx, key) => tableCell(node, ctx, key, true),
  tableCell: (node, ctx, key) => tableCell(node, ctx, key, false),
  calcBlock: (node, ctx, key) => {
    const parsed = calcBlockAttrsSchema.safeParse(node.attrs ?? {});
    const evaluation = parsed.success ? ctx.evaluations.get(parsed.data.blockId) : undefined;
    return (
      <CalcBlockView
        key={key}
        attrs={parsed.success ? parsed.data : undefined}
        evaluation={evaluation}
        evaluations={ctx.evaluations}
        series={ctx.prepared.tables.series}
        book={ctx.book}
      />
    );
  },
  figure: (node, ctx, key) => {
    const id = typeof node.attrs?.figureId === 'string' ? node.attrs.figureId : '';
    return <FigureView key={key} figure={ctx.prepared.figures.get(id)} width={ctx.contentWidth} book={ctx.book} />;
  },
  requirement: (node, ctx, key) => {
    const check = ctx.prepared.requirements.find((c) => c.requirement.requirementId === node.attrs?.requirementId);
    return check ? (
      <RequirementView key={key} check={check} />
    ) : (
      <Text
        key={key}
        style={styles.unavailable}
      >{`[requirement ${String(node.attrs?.requirementId ?? '')} unavailable: its id is repeated or malformed]`}</Text>
    );
  },
  complianceTable: (_node, ctx, key) => <ComplianceTableView key={key} checks={ctx.prepared.requirements} />,
};

export function renderNode(node: TiptapNode, ctx: ContentContext, key: number): ReactNode {
  if (!isMemoNodeType(node.type)) throw new UnknownContentTypeError('node', node.type, Object.keys(NODE_HANDLERS));
  return visitMemoNode(NODE_HANDLERS, node, ctx, key);
}
