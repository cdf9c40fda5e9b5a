import type { Actor } from '@/lib/auth/permissions';
import { loadMemoFor } from '@/lib/memos/load-memo';

export { MAX_UPLOAD_BODY_BYTES } from './upload-limits';

/**
 * May this actor add an image to this memo? Asked before the route reads the
 * upload, so a refused upload (404 unknown or hidden memo, 403 role, 409
 * state) is answered at once; what Next takes in from the socket meanwhile is
 * bounded by the server's cut-off (lib/edge/limit-request-body.ts).
 * storeAttachment asks again when storing.
 */
export async function authoriseAttachmentUpload(actor: Actor, memoId: number): Promise<void> {
  await loadMemoFor(actor, memoId, 'memo.edit');
}
