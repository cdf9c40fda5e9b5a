import { describe, expect, it } from 'vitest';
import { pdfFileName } from '@/lib/pdf/pdf-file-name';

/** The one file-name pattern of memo PDFs (README, "One file per revision"); names must be safe inside a quoted Content-Disposition filename (RFC 6266 §4.1). */
describe('pdfFileName', () => {
  it('names a revision by document number and letter, a draft by document number and version', () => {
    expect(pdfFileName({ documentNumber: 'DM-2026-014', revisionLetter: 'B' })).toBe('DM-2026-014-rev-B.pdf');
    expect(pdfFileName({ documentNumber: 'DM-2026-014', revisionLetter: 'AA' })).toBe('DM-2026-014-rev-AA.pdf');
    expect(pdfFileName({ documentNumber: 'DM-2026-014', draftVersion: 12 })).toBe('DM-2026-014-draft-v12.pdf');
  });

  it('turns quotes, slashes, spaces and other unsafe characters of a document number into single hyphens', () => {
    expect(pdfFileName({ documentNumber: 'BWO/TL1 "DM" 001', draftVersion: 1 })).toBe('BWO-TL1-DM-001-draft-v1.pdf');
    expect(pdfFileName({ documentNumber: 'ÄX\r\n;01', revisionLetter: 'A' })).toBe('-X-01-rev-A.pdf');
  });
});
