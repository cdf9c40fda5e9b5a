import { withActor, parseId } from '@/lib/api/route-handler';
import { readAttachment } from '@/lib/attachments/read-attachment';

export const dynamic = 'force-dynamic';

export const GET = withActor<{ id: string }>(async ({ actor, params }) => {
  const a = await readAttachment(actor, parseId(params.id, 'id'));
  return new Response(new Uint8Array(a.data), {
    headers: {
      'content-type': a.contentType,
      'content-length': String(a.byteSize),
      'cache-control': 'private, max-age=31536000, immutable',
      'x-content-type-options': 'nosniff',
      etag: `"${a.sha256}"`,
    },
  });
});
