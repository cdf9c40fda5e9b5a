import { withActor, parseId } from '@/lib/api/route-handler';
import { downloadRevisionPdf } from '@/lib/revisions/download-revision-pdf';
import { pdfDownloadResponse } from '@/lib/pdf/pdf-download-response';

export const dynamic = 'force-dynamic';

/** The frozen revision's stored PDF: the same bytes every time, with their SHA-256. */
export const GET = withActor<{ id: string; letter: string }>(async ({ actor, params }) =>
  pdfDownloadResponse(await downloadRevisionPdf(actor, parseId(params.id, 'id'), params.letter)),
);
