import { NextResponse } from 'next/server';
import { withActor, parseId } from '@/lib/api/route-handler';
import { badRequest } from '@/lib/api/errors';
import { readMultipartForm } from '@/lib/api/request-body';
import { storeAttachment } from '@/lib/attachments/store-attachment';
import { authoriseAttachmentUpload, MAX_UPLOAD_BODY_BYTES } from '@/lib/attachments/authorise-attachment-upload';

export const dynamic = 'force-dynamic';

/** POST multipart/form-data with one `file`: an image for the memo's text. Authorised before the body is read. */
export const POST = withActor<{ id: string }>(async ({ req, actor, params }) => {
  const memoId = parseId(params.id, 'id');
  await authoriseAttachmentUpload(actor, memoId);
  const form = await readMultipartForm(req, MAX_UPLOAD_BODY_BYTES);
  const file = form.get('file');
  if (!(file instanceof File))
    throw badRequest('Send the image as multipart/form-data with a field named file.', { file: 'missing' });
  const stored = await storeAttachment(actor, memoId, {
    name: file.name,
    type: file.type,
    bytes: Buffer.from(await file.arrayBuffer()),
  });
  return NextResponse.json(stored, { status: 201 });
});
