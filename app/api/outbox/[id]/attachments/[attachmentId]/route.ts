import { withActor, parseId } from '@/lib/api/route-handler';
import { readOutboxAttachment } from '@/lib/mail/read-outbox-attachment';

export const dynamic = 'force-dynamic';

/** An attachment's bytes as received, with its SHA-256. */
export const GET = withActor<{ id: string; attachmentId: string }>(async ({ actor, params }) => {
  const a = await readOutboxAttachment(actor, parseId(params.id, 'id'), parseId(params.attachmentId, 'attachmentId'));
  const name = (a.filename ?? `attachment-${a.id}`).replace(/[^A-Za-z0-9._-]+/g, '-');
  return new Response(new Uint8Array(a.content), {
    headers: {
      'content-type': a.contentType,
      'content-length': String(a.content.length),
      'content-disposition': `attachment; filename="${name}"`,
      'x-content-sha256': a.sha256,
      'cache-control': 'private, no-store',
    },
  });
});
