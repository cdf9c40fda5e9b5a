import { beforeAll, describe, expect, it } from 'vitest';
import { renderMemoPdf } from '@/lib/pdf/render-memo-pdf';
import { documentIndex } from '@/lib/documents/model/document-index';
import { docPlainText } from '@/lib/documents/doc-plain-text';
import type { TiptapDoc } from '@/lib/memos/memo-schema';
import { evaluate, pdfTestDocument, pdfTestMemo } from './support/pdf-test-memo';
import { pageTexts, writePdf } from './support/pdf-tools';

/** Figure references in the text print the figure's number by document order, in the PDF and in comparison text. */
describe('figure references', () => {
  let doc: TiptapDoc;
  let text: string;
  beforeAll(async () => {
    doc = pdfTestDocument();
    // One reference to a figure that is not in the memo: it must print as broken, not as a number.
    doc.content.push({
      type: 'paragraph',
      content: [
        { type: 'text', text: 'See also ' },
        { type: 'figureRef', attrs: { figureId: 'gone' } },
        { type: 'text', text: '.' },
      ],
    });
    const bytes = await renderMemoPdf({ memo: pdfTestMemo(doc), evaluations: evaluate(doc), paper: 'a4', draft: true });
    text = pageTexts(writePdf('memo-figure-refs.pdf', bytes)).join(' ');
  }, 120_000);

  it('prints "Figure n" with the number the caption carries', () => {
    const numbers = documentIndex(doc).figureNumbers;
    expect(text).toContain(`(Figure ${numbers.get('fig-options')})`);
    expect(text).toContain(`Figure ${numbers.get('fig-sun')} shows that over the first year`);
    expect(text).toContain(`Figure ${numbers.get('fig-sun')}.`);
  });

  it('a reference to a removed figure is visibly broken', () => {
    expect(text).toContain('[figure reference broken: the figure was removed]');
    const plain = docPlainText(doc, () => 'x');
    expect(plain).toContain('See also [missing figure].');
    expect(plain).toContain(`(Figure ${documentIndex(doc).figureNumbers.get('fig-options')})`);
  });
});
