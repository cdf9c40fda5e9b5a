import { withActor, parseId } from '@/lib/api/route-handler';
import { readAttachment } from '@/lib/attachments/read-attachment';
import { attachmentResponseHeaders } from '@/lib/attachments/attachment-response-headers';

export const dynamic = 'force-dynamic';

export const GET = withActor<{ id: string }>(async ({ actor, params }) => {
  const a = await readAttachment(actor, parseId(params.id, 'id'));
  return new Response(new Uint8Array(a.data), { headers: attachmentResponseHeaders(a) });
});
