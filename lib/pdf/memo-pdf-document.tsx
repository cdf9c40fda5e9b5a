/** The memo PDF as a react-pdf document: front matter, contents, numbered body, appendix, on pages with header, footer and draft marking. */
import { Document, Page, View } from '@react-pdf/renderer';
import { DEMO_ORGANISATION } from '@/lib/demo/demo-organisation';
import { AppendixView } from './appendix-view';
import type { ContentContext } from './content-context';
import type { HeadingPageBook } from './heading-page-book';
import { ContentsView, type ContentsEntry } from './contents-view';
import { ApprovalBlock, CautionNote, isoDate, RevisionRecord, TitlePage } from './front-matter';
import type { RenderMemoPdfInput, RevisionRecordRow } from './memo-pdf-types';
import { DraftWatermark, PageFurniture } from './page-furniture';
import { DEFAULT_DISTRIBUTION, DOCUMENT_KIND } from './pdf-text';
import { contentWidth, PAGE_SIZES, styles } from './pdf-theme';
import type { PreparedMemo } from './prepare-memo-pdf';
import { renderNode } from './render-content';
import { revisionLabel } from './revision-label';
import { plainText } from './render-inline';

function revisionRows(input: RenderMemoPdfInput): RevisionRecordRow[] {
  const given = input.revisionRecord ?? [];
  if (input.draft) {
    const reviewers = input.memo.reviewers.map((r) => r.name).join(', ') || undefined;
    return [...given, { revision: 'Draft', date: input.memo.updatedAt, description: `Working draft, version ${input.memo.version}; not released.`, author: input.memo.owner.name, reviewers }];
  }
  return given.length ? given : [{ revision: input.revision ?? '–', date: input.memo.updatedAt, description: 'Frozen revision.', author: input.memo.owner.name }];
}

export interface MemoDocumentProps {
  input: RenderMemoPdfInput;
  prepared: PreparedMemo;
  book: HeadingPageBook;
}

export function MemoDocument({ input, prepared, book }: MemoDocumentProps) {
  const { memo } = input;
  const organisation = input.organisation ?? DEMO_ORGANISATION;
  const label = revisionLabel(input);
  const ctx: ContentContext = { evaluations: input.evaluations, prepared, contentWidth: contentWidth(input.paper), book, listDepth: 0 };
  const entries: ContentsEntry[] = [...prepared.headings].map(([node, info]) => ({ ...info, title: plainText(node, ctx) }));
  const approvals = input.approvals ?? { author: { name: memo.owner.name }, reviewer: { name: memo.reviewers[0]?.name } };
  return (
    <Document title={`${memo.documentNumber} ${memo.title}`} author={memo.owner.name} subject={`${DOCUMENT_KIND}, ${label}`} creator="Nodewright" producer="Nodewright">
      <Page size={PAGE_SIZES[input.paper].size} style={styles.page} experimentalPagination>
        <PageFurniture documentNumber={memo.documentNumber} revisionLabel={label} title={memo.title} organisation={organisation} draft={input.draft} paper={input.paper} />
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
          <ContentsView entries={entries} book={book} />
        </View>
        <View break>{renderNode(memo.content, ctx, 0)}</View>
        <AppendixView evaluations={input.evaluations} letter="A" />
        {input.draft ? <DraftWatermark paper={input.paper} /> : null}
      </Page>
    </Document>
  );
}
