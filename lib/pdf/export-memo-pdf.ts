import { z } from 'zod';
import type { Actor } from '@/lib/auth/permissions';
import { renderMemoPdfJob } from '@/lib/jobs/render-memo-pdf-job';
import { loadMemoFor, toMemoDetail } from '@/lib/memos/load-memo';
import { checkMemoContent } from '@/lib/memos/check-memo-content';
import { Revision } from '@/models';
import { getOrganisation } from '@/lib/organisation/get-organisation';
import { pdfFileName } from './pdf-file-name';

export const pdfQuerySchema = z.strictObject({ paper: z.enum(['a4', 'letter']).default('a4') });
export type PdfQuery = z.infer<typeof pdfQuerySchema>;

/**
 * The memo as it stands, as a PDF: every number recomputed now from the
 * stored inputs, in the worker pool (see renderMemoPdfJob). Anything short
 * of frozen is marked DRAFT; a frozen memo is labelled with its latest
 * revision letter.
 */
export async function exportMemoPdf(
  actor: Actor,
  memoId: number,
  query: PdfQuery,
): Promise<{ bytes: Buffer; filename: string; version: number }> {
  const { memo, facts } = await loadMemoFor(actor, memoId, 'memo.versions');
  // A row stored before saves were checked may hold content that would break the renderer: 409 naming it.
  await checkMemoContent(memoId, memo.content, 'render');
  const detail = await toMemoDetail(actor, memo, facts);
  const draft = memo.status !== 'frozen';
  const latest = draft
    ? null
    : await Revision.findOne({ where: { memoId }, order: [['frozenAt', 'DESC']], attributes: ['letter'] });
  const organisation = await getOrganisation();
  const input = {
    memo: detail,
    paper: query.paper,
    draft,
    revision: latest?.letter,
    organisation: organisation.name,
    distribution: organisation.distributionStatement,
  };
  const { pdf } = await renderMemoPdfJob(actor.id, memoId, input);
  const filename = latest
    ? pdfFileName({ documentNumber: memo.documentNumber, revisionLetter: latest.letter })
    : pdfFileName({ documentNumber: memo.documentNumber, draftVersion: memo.version });
  // Without requireAllResults the job always returns the PDF bytes.
  if (!pdf) throw new Error('PDF render job returned no PDF');
  return { bytes: pdf, filename, version: memo.version };
}
