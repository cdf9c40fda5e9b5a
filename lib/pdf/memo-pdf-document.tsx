/** The memo PDF as a react-pdf document: front matter, contents, numbered body, appendix, on pages with header, footer and draft marking. */
import { Document, Page, View } from '@react-pdf/renderer';
import { getCalcKind } from '@/lib/calc';
import { ANNEX_TITLE, AnnexView, appendixAnchor, AppendixView, CONSTANTS_TITLE } from './appendix-view';
import type { ContentContext } from './content-context';
import type { HeadingPageBook } from './heading-page-book';
import { ContentsView, type ContentsEntry } from './contents-view';
import { ApprovalBlock, CautionNote, isoDate, RevisionRecord, TitlePage } from './front-matter';
import type { RenderMemoPdfInput, RevisionRecordRow } from './memo-pdf-types';
import { DraftWatermark, PageFurniture } from './page-furniture';
import { DEFAULT_DISTRIBUTION, DOCUMENT_KIND, UNSET_ORGANISATION } from './pdf-text';
import { figureAnchor } from './figure-view';
import { PageMark } from './page-mark';
import { contentWidth, PAGE_SIZES, styles } from './pdf-theme';
import { ANNEX_LETTER, type PreparedMemo } from './prepare-memo-pdf';
import { renderNode } from './render-content';
import { revisionLabel } from './revision-label';
import { plainText } from './render-inline';

function revisionRows(input: RenderMemoPdfInput): RevisionRecordRow[] {
  const given = input.revisionRecord ?? [];
  if (input.draft) {
    const reviewers = input.memo.reviewers.map((r) => r.name).join(', ') || undefined;
    return [
      ...given,
      {
        revision: 'Draft',
        date: input.memo.updatedAt,
        description: `Working draft, version ${input.memo.version}; not released.`,
        author: input.memo.owner.name,
        reviewers,
      },
    ];
  }
  return given.length
    ? given
    : [
        {
          revision: input.revision ?? '–',
          date: input.memo.updatedAt,
          description: 'Frozen revision.',
          author: input.memo.owner.name,
        },
      ];
}

export interface MemoDocumentProps {
  input: RenderMemoPdfInput;
  prepared: PreparedMemo;
  book: HeadingPageBook;
}

/** PDF keywords: what the memo is about, its number, and the methods its calc blocks use. */
function keywords(input: RenderMemoPdfInput): string {
  const titles = new Set<string>();
  for (const e of input.evaluations.values())
    if (e.status === 'ok') titles.add(getCalcKind(e.result.kind)?.title ?? '');
  return [input.memo.documentNumber, DOCUMENT_KIND, 'sun-synchronous orbit', ...[...titles].filter(Boolean)].join(', ');
}

const LIST_OF_FIGURES = { id: 'list-figures', title: 'List of figures' };
const LIST_OF_TABLES = { id: 'list-tables', title: 'List of tables' };

export function MemoDocument({ input, prepared, book }: MemoDocumentProps) {
  const { memo } = input;
  const organisation = input.organisation ?? UNSET_ORGANISATION;
  const label = revisionLabel(input);
  const ctx: ContentContext = {
    evaluations: input.evaluations,
    prepared,
    contentWidth: contentWidth(input.paper),
    book,
    listDepth: 0,
  };
  const figures: ContentsEntry[] = [...prepared.figures.values()]
    .sort((a, b) => a.number - b.number)
    .map((f) => ({ id: figureAnchor(f.number), number: `Figure ${f.number}`, title: f.caption, level: 1 }));
  const annexed = prepared.tables.annexed;
  const tables: ContentsEntry[] = [
    ...prepared.tables.all.map((t) => ({ id: t.id, number: t.label, title: t.caption, level: 1 })),
    ...annexed.map((t) => ({
      id: `tab-${t.annex}`,
      number: `Table ${t.annex}`,
      title: `${t.blockLabel}: ${t.field.label.toLowerCase()}, all ${t.rows.length} rows`,
      level: 1,
    })),
  ];
  const constantsLetter = annexed.length ? String.fromCharCode(ANNEX_LETTER.charCodeAt(0) + 1) : ANNEX_LETTER;
  const appendices = [
    ...(annexed.length ? [{ letter: ANNEX_LETTER, title: ANNEX_TITLE }] : []),
    { letter: constantsLetter, title: CONSTANTS_TITLE },
  ];
  const entries: ContentsEntry[] = [
    ...(figures.length ? [{ id: LIST_OF_FIGURES.id, number: '', title: LIST_OF_FIGURES.title, level: 1 }] : []),
    ...(tables.length ? [{ id: LIST_OF_TABLES.id, number: '', title: LIST_OF_TABLES.title, level: 1 }] : []),
    ...[...prepared.headings].map(([node, info]) => ({ ...info, title: plainText(node, ctx) })),
    ...appendices.map((a) => ({
      id: appendixAnchor(a.letter),
      number: '',
      title: `Appendix ${a.letter}  ${a.title}`,
      level: 1,
    })),
  ];
  const approvals = input.approvals ?? {
    author: { name: memo.owner.name },
    reviewer: { name: memo.reviewers[0]?.name },
  };
  return (
    <Document
      title={`${memo.documentNumber} ${memo.title}`}
      author={memo.owner.name}
      subject={`${DOCUMENT_KIND} ${memo.documentNumber}, ${label}`}
      keywords={keywords(input)}
      creator="Nodewright"
      producer="Nodewright"
      language="en"
      pageMode="useOutlines"
    >
      <Page size={PAGE_SIZES[input.paper].size} style={styles.page} experimentalPagination>
        <PageFurniture
          documentNumber={memo.documentNumber}
          revisionLabel={label}
          title={memo.title}
          organisation={organisation}
          draft={input.draft}
          paper={input.paper}
        />
        <TitlePage
          organisation={organisation}
          documentNumber={memo.documentNumber}
          title={memo.title}
          revisionLabel={label}
          date={isoDate(memo.updatedAt)}
          author={memo.owner.name}
          distribution={input.distribution ?? DEFAULT_DISTRIBUTION}
        />
        <ApprovalBlock approvals={approvals} />
        <CautionNote />
        <View break>
          <RevisionRecord rows={revisionRows(input)} />
          <ContentsView title="Contents" entries={entries} book={book} />
          <PageMark id={LIST_OF_FIGURES.id} book={book} />
          <ContentsView title={LIST_OF_FIGURES.title} entries={figures} book={book} numberWidth={52} />
          <PageMark id={LIST_OF_TABLES.id} book={book} />
          <ContentsView title={LIST_OF_TABLES.title} entries={tables} book={book} numberWidth={52} />
        </View>
        <View break>{renderNode(memo.content, ctx, 0)}</View>
        {annexed.length ? <AnnexView tables={annexed} letter={ANNEX_LETTER} book={book} /> : null}
        <AppendixView evaluations={input.evaluations} letter={constantsLetter} book={book} />
        {input.draft ? <DraftWatermark paper={input.paper} /> : null}
      </Page>
    </Document>
  );
}
