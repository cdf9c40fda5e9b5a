import { NextResponse } from 'next/server';
import { withActor, parseId } from '@/lib/api/route-handler';
import { badRequest } from '@/lib/api/errors';
import { storeAttachment } from '@/lib/attachments/store-attachment';

export const dynamic = 'force-dynamic';

/** POST multipart/form-data with one `file`: an image for the memo's text. */
export const POST = withActor<{ id: string }>(async ({ req, actor, params }) => {
  const memoId = parseId(params.id, 'id');
  let form: FormData;
  try {
    form = await req.formData();
  } catch {
    throw badRequest('Send the image as multipart/form-data with a field named file.', { file: 'missing' });
  }
  const file = form.get('file');
  if (!(file instanceof File)) throw badRequest('Send the image as multipart/form-data with a field named file.', { file: 'missing' });
  const stored = await storeAttachment(actor, memoId, { name: file.name, type: file.type, bytes: Buffer.from(await file.arrayBuffer()) });
  return NextResponse.json(stored, { status: 201 });
});
