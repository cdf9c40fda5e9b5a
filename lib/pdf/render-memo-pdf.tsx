import { renderToBuffer } from '@react-pdf/renderer';
import { HeadingPageBook } from './heading-page-book';
import type { RenderMemoPdfInput } from './memo-pdf-types';
import { MemoDocument } from './memo-pdf-document';
import { registerPdfFonts } from './pdf-fonts';
import { prepareMemoPdf } from './prepare-memo-pdf';

/** Two passes normally: the first finds the heading pages, the second prints them. */
const MAX_RENDERS = 3;

/**
 * Renders a memo to PDF bytes. The caller passes the server's own results
 * (evaluateDocument of the stored content); figures are built from them.
 */
export async function renderMemoPdf(input: RenderMemoPdfInput): Promise<Buffer> {
  registerPdfFonts();
  const prepared = await prepareMemoPdf(input.memo.content, input.evaluations, input.resolveImage);
  let book = new HeadingPageBook();
  for (let n = 1; ; n++) {
    const bytes = await renderToBuffer(<MemoDocument input={input} prepared={prepared} book={book} />);
    if (book.consistent() || n === MAX_RENDERS) return bytes;
    book = book.next();
  }
}
