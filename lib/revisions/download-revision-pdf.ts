import type { Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { noteRevisionOpened } from '@/lib/delivery/note-revision-opened';
import { pdfFileName } from '@/lib/pdf/pdf-file-name';
import { getRevision } from './list-revisions';

export interface PdfFile {
  bytes: Buffer;
  filename: string;
  sha256: string;
}

/**
 * A frozen revision's stored PDF, the one file of that revision: the same
 * bytes every time, whichever page or route asks. Recorded in the audit
 * trail, and as the first opening when a customer it was released to reads it.
 */
export async function downloadRevisionPdf(actor: Actor, memoId: number, letter: string): Promise<PdfFile> {
  const rev = await getRevision(actor, memoId, letter);
  await recordAudit({
    actor,
    action: 'pdf.download',
    memoId,
    revisionLetter: rev.letter,
    details: { pdfSha256: rev.pdfSha256 },
  });
  await noteRevisionOpened(actor, rev, 'pdf');
  return {
    bytes: rev.pdfData,
    filename: pdfFileName({ documentNumber: rev.documentNumber, revisionLetter: rev.letter }),
    sha256: rev.pdfSha256,
  };
}
