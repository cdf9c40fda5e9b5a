import crypto from 'node:crypto';
import { Revision } from '@/models';
import type { Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { loadMemoFor } from '@/lib/memos/load-memo';
import { downloadRevisionPdf, type PdfFile } from '@/lib/revisions/download-revision-pdf';
import { exportMemoPdf, type PdfQuery } from './export-memo-pdf';

/**
 * The memo's PDF as offered on the memo page (GET /api/memos/:id/pdf).
 * A frozen memo has exactly one file per revision: this answers with the
 * latest revision's stored bytes, never a fresh render (the paper choice
 * does not apply; the stored file is what was frozen). Anything else is a
 * draft rendered now, marked DRAFT with its version on every page and in the
 * file name. Both are recorded in the audit trail.
 */
export async function downloadMemoPdf(actor: Actor, memoId: number, query: PdfQuery): Promise<PdfFile> {
  const { memo } = await loadMemoFor(actor, memoId, 'memo.view');
  if (memo.status === 'frozen') {
    const latest = await Revision.findOne({ where: { memoId }, order: [['id', 'DESC']], attributes: ['letter'] });
    if (latest) return downloadRevisionPdf(actor, memoId, latest.letter);
  }
  const { bytes, filename, version } = await exportMemoPdf(actor, memoId, query);
  const sha256 = crypto.createHash('sha256').update(bytes).digest('hex');
  await recordAudit({
    actor,
    action: 'pdf.download',
    memoId,
    details: { draft: true, version, paper: query.paper, pdfSha256: sha256 },
  });
  return { bytes, filename, sha256 };
}
