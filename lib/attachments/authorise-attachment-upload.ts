import type { Actor } from '@/lib/auth/permissions';
import { loadMemoFor } from '@/lib/memos/load-memo';
import { MAX_IMAGE_BYTES } from './store-attachment';

/** Room for the multipart boundaries and part headers around one image. */
const MULTIPART_OVERHEAD_BYTES = 64 * 1024;

/** The most an upload request may carry: one image at its limit plus multipart framing. */
export const MAX_UPLOAD_BODY_BYTES = MAX_IMAGE_BYTES + MULTIPART_OVERHEAD_BYTES;

/**
 * May this actor add an image to this memo? Asked before a byte of the upload
 * is read, so a refused upload (404 unknown or hidden memo, 403 role, 409
 * state) costs the server nothing; storeAttachment asks again when storing.
 */
export async function authoriseAttachmentUpload(actor: Actor, memoId: number): Promise<void> {
  await loadMemoFor(actor, memoId, 'memo.edit');
}
