import { ApiError } from '@/lib/api/errors';
import { resolvePdfImages } from '@/lib/attachments/resolve-pdf-images';
import type { BlockEvaluation } from '@/lib/documents/evaluate-document';
import type { MemoPdfJobInput } from './heavy-job';
import { heavyJobConfig } from './heavy-job-config';
import { runHeavyJob } from './run-heavy-job';

/**
 * A memo's PDF rendered in the worker pool for a person: its calc blocks are
 * recomputed and laid out there (renderMemoPdf, the same bytes as on the
 * request thread); its images are read from the database here first. With
 * `requireAllResults` the job stops before layout when a block has no
 * result (no `pdf`), so a freeze can refuse the memo.
 */
export async function renderMemoPdfJob(
  userId: number,
  memoId: number,
  input: Omit<MemoPdfJobInput, 'images'>,
): Promise<{ evaluations: Map<string, BlockEvaluation>; pdf?: Buffer }> {
  const images = await resolvePdfImages(memoId, input.memo.content);
  const { pdfBudgetSeconds } = heavyJobConfig();
  const out = await runHeavyJob(
    userId,
    { type: 'memo-pdf', input: { ...input, images } },
    {
      budgetSeconds: pdfBudgetSeconds,
      overBudget: () =>
        new ApiError(
          'unavailable',
          `Rendering the PDF took longer than ${pdfBudgetSeconds} s and was stopped; the server may be busy. Try again later.`,
          { retryAfterSeconds: pdfBudgetSeconds },
        ),
      crashed: (reason) =>
        new ApiError(
          'unprocessable',
          `The PDF renderer failed on this memo (${reason}), as it does on very deeply nested lists or quotes; simplify them and try again. The renderer was restarted; other PDFs are not affected.`,
        ),
    },
  );
  return {
    evaluations: out.evaluations,
    pdf: out.pdf && Buffer.from(out.pdf.buffer, out.pdf.byteOffset, out.pdf.byteLength),
  };
}
