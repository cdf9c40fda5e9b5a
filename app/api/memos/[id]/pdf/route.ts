import { parseId, parseWith, searchParamsObject, withActor } from '@/lib/api/route-handler';
import { pdfQuerySchema } from '@/lib/pdf/export-memo-pdf';
import { downloadMemoPdf } from '@/lib/pdf/download-memo-pdf';
import { pdfDownloadResponse } from '@/lib/pdf/pdf-download-response';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

/** A frozen memo: its latest revision's stored file. Otherwise a draft rendered now, marked with its version. */
export const GET = withActor<{ id: string }>(async ({ req, actor, params }) =>
  pdfDownloadResponse(
    await downloadMemoPdf(actor, parseId(params.id, 'id'), parseWith(pdfQuerySchema, searchParamsObject(req))),
  ),
);
