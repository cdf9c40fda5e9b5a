import { renderToBuffer } from '@react-pdf/renderer';
import { HeadingPageBook } from './heading-page-book';
import type { RenderMemoPdfInput } from './memo-pdf-types';
import { MemoDocument } from './memo-pdf-document';
import { memoiseGlyphShaping } from './pdf-fonts';
import { prepareMemoPdf } from './prepare-memo-pdf';

/** One layout normally (see HeadingPageBook); a second only if a contents page number came out wrong. */
const MAX_RENDERS = 2;

/**
 * Renders a memo to PDF bytes. The caller passes the server's own results
 * (evaluateDocument of the stored content); figures are built from them.
 */
export async function renderMemoPdf(input: RenderMemoPdfInput): Promise<Buffer> {
  await memoiseGlyphShaping();
  const prepared = await prepareMemoPdf(input.memo.content, input.evaluations, input.resolveImage);
  let book = new HeadingPageBook();
  for (let n = 1; ; n++) {
    const bytes = await renderToBuffer(<MemoDocument input={input} prepared={prepared} book={book} />);
    if (book.consistent() || n === MAX_RENDERS) return bytes;
    book = book.next();
  }
}
