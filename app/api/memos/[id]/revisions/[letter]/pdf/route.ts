import { withActor, parseId } from '@/lib/api/route-handler';
import { getRevision } from '@/lib/revisions/list-revisions';
import { recordAudit } from '@/lib/audit/record-audit';
import { noteRevisionOpened } from '@/lib/delivery/note-revision-opened';
import { PDF_CONTENT_SECURITY_POLICY } from '@/lib/pdf/pdf-content-security-policy';

export const dynamic = 'force-dynamic';

/** The frozen revision's stored PDF: the same bytes every time, with their SHA-256. */
export const GET = withActor<{ id: string; letter: string }>(async ({ actor, params }) => {
  const memoId = parseId(params.id, 'id');
  const rev = await getRevision(actor, memoId, params.letter);
  await recordAudit({ actor, action: 'pdf.download', memoId, revisionLetter: rev.letter, details: { pdfSha256: rev.pdfSha256 } });
  await noteRevisionOpened(actor, rev, 'pdf');
  return new Response(new Uint8Array(rev.pdfData), {
    headers: {
      'content-type': 'application/pdf',
      'content-length': String(rev.pdfData.length),
      'content-disposition': `inline; filename="${rev.documentNumber}-rev-${rev.letter}.pdf"`,
      'x-content-sha256': rev.pdfSha256,
      'cache-control': 'private, no-store',
      'content-security-policy': PDF_CONTENT_SECURITY_POLICY,
    },
  });
});
