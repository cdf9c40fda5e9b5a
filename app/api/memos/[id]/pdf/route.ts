import { parseId, parseWith, searchParamsObject, withActor } from '@/lib/api/route-handler';
import { exportMemoPdf, pdfQuerySchema } from '@/lib/pdf/export-memo-pdf';
import { PDF_CONTENT_SECURITY_POLICY } from '@/lib/pdf/pdf-content-security-policy';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const GET = withActor<{ id: string }>(async ({ req, actor, params }) => {
  const { bytes, filename } = await exportMemoPdf(actor, parseId(params.id, 'id'), parseWith(pdfQuerySchema, searchParamsObject(req)));
  return new Response(new Uint8Array(bytes), {
    headers: { 'Content-Type': 'application/pdf', 'Content-Disposition': `inline; filename="${filename}"`, 'Cache-Control': 'no-store', 'Content-Security-Policy': PDF_CONTENT_SECURITY_POLICY },
  });
});
