/**
 * A frozen revision's approval block and revision record, read back with
 * poppler: each electronic signature prints the signer's printed name, role,
 * the meaning of the signature and its date and time in UTC (the items
 * 21 CFR 11.50(a) lists for the human-readable form of a signed record),
 * and the revision record names the author (the analyst), the reviewers and
 * who released each revision — not the configuration manager as author.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { evaluateDocument } from '@/lib/documents/evaluate-document';
import type { TiptapDoc } from '@/lib/memos/memo-schema';
import { renderMemoPdf } from '@/lib/pdf/render-memo-pdf';
import { h, p } from '@/lib/templates/build-doc';
import { pdfTestMemo } from './support/pdf-test-memo';
import { pageTexts, pageToPng, writePdf } from './support/pdf-tools';

describe('signed front matter of a frozen revision', () => {
  let pages: string[] = [];

  beforeAll(async () => {
    const doc: TiptapDoc = { type: 'doc', content: [h(1, 'Orbit'), p('The orbit is sun-synchronous.')] };
    const bytes = await renderMemoPdf({
      memo: pdfTestMemo(doc),
      evaluations: evaluateDocument(doc),
      paper: 'a4',
      draft: false,
      revision: 'B',
      approvals: {
        author: { name: 'Ilse Marrow', date: '2027-05-30T08:00:00.000Z' },
        signatures: [
          {
            role: 'Reviewer',
            name: 'Tobias Quenby',
            meaning: 'Reviewed and approved',
            signedAt: '2027-05-31T10:15:42.000Z',
          },
          {
            role: 'Reviewer',
            name: 'Ada Brenn',
            meaning: 'Reviewed and approved with comments',
            signedAt: '2027-05-31T16:02:00.000Z',
          },
          {
            role: 'Configuration manager',
            name: 'Ruth Okafor-Lind',
            meaning: 'Released as baseline',
            signedAt: '2027-06-01T09:30:00.000Z',
          },
        ],
      },
      revisionRecord: [
        {
          revision: 'A',
          date: '2027-03-02',
          description: 'First issue.',
          author: 'Ilse Marrow',
          reviewers: 'Tobias Quenby',
          releasedBy: 'Ruth Okafor-Lind',
        },
        {
          revision: 'B',
          date: '2027-06-01',
          description: 'Drag budget added.',
          author: 'Ilse Marrow',
          reviewers: 'Tobias Quenby, Ada Brenn',
          releasedBy: 'Ruth Okafor-Lind',
        },
      ],
    });
    const file = writePdf('memo-signed-revision-b.pdf', bytes);
    pages = pageTexts(file);
    pageToPng(file, 1, 'memo-signed-revision-b-approval', 100);
    pageToPng(file, 2, 'memo-signed-revision-b-record', 100);
  }, 120_000);

  it('prints each signature with name, role, meaning and UTC time, after the author’s submission', () => {
    const title = pages[0];
    expect(title).toContain('Approval Role Name Meaning of signature Date and time');
    expect(title).toContain('Author Ilse Marrow Author; submitted for review 2027-05-30 08:00 UTC');
    expect(title).toContain('Reviewer Tobias Quenby Reviewed and approved 2027-05-31 10:15 UTC');
    expect(title).toContain('Reviewer Ada Brenn Reviewed and approved with comments 2027-05-31 16:02 UTC');
    expect(title).toContain('Configuration manager Ruth Okafor-Lind Released as baseline 2027-06-01 09:30 UTC');
    expect(title).toMatch(/Signed electronically in Nodewright/);
  });

  it('names author, reviewers and who released each revision in the revision record', () => {
    expect(pages[1]).toContain('Revision record Revision Date Description Author Reviewed by Released by');
    expect(pages[1]).toContain('A 2027-03-02 First issue. Ilse Marrow Tobias Quenby Ruth Okafor-Lind');
    expect(pages[1]).toContain('B 2027-06-01 Drag budget added. Ilse Marrow Tobias Quenby, Ada Brenn Ruth Okafor-Lind');
  });
});
