import crypto from 'node:crypto';
import { Attachment } from '@/models';
import { ApiError, badRequest } from '@/lib/api/errors';
import type { Actor } from '@/lib/auth/permissions';
import { loadMemoFor } from '@/lib/memos/load-memo';
import { attachmentUrl } from './list-attachment-urls';
import { MAX_IMAGE_BYTES } from './upload-limits';

/** Images a memo may carry; SVG is refused because it can carry scripts. */
export const IMAGE_TYPES: Record<string, { magic: (b: Buffer) => boolean }> = {
  'image/png': { magic: (b) => b.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) },
  'image/jpeg': { magic: (b) => b[0] === 0xff && b[1] === 0xd8 && b[2] === 0xff },
  'image/gif': { magic: (b) => b.subarray(0, 4).toString('latin1') === 'GIF8' },
  'image/webp': {
    magic: (b) => b.subarray(0, 4).toString('latin1') === 'RIFF' && b.subarray(8, 12).toString('latin1') === 'WEBP',
  },
};

export { MAX_IMAGE_BYTES };

/** Stores an uploaded image with a memo the actor may edit; checks size, declared type and the file's own signature. */
export async function storeAttachment(
  actor: Actor,
  memoId: number,
  file: { name: string; type: string; bytes: Buffer },
): Promise<{ id: number; url: string; contentType: string; byteSize: number }> {
  await loadMemoFor(actor, memoId, 'memo.edit');
  const kind = IMAGE_TYPES[file.type];
  if (!kind)
    throw badRequest(`Images must be PNG, JPEG, GIF or WebP (got ${file.type || 'an unknown type'}).`, {
      file: 'unsupported type',
    });
  if (file.bytes.length === 0) throw badRequest('The file is empty.', { file: 'empty' });
  if (file.bytes.length > MAX_IMAGE_BYTES)
    throw new ApiError(
      'too_large',
      `Images may be at most ${(MAX_IMAGE_BYTES / 1024 / 1024).toFixed(0)} MB (this one is ${(file.bytes.length / 1024 / 1024).toFixed(1)} MB).`,
      { fields: { file: 'too large' } },
    );
  if (!kind.magic(file.bytes))
    throw badRequest(`The file's content is not a ${file.type} image.`, { file: 'content does not match its type' });
  const row = await Attachment.create({
    memoId,
    filename: file.name.slice(0, 255) || 'image',
    contentType: file.type,
    byteSize: file.bytes.length,
    sha256: crypto.createHash('sha256').update(file.bytes).digest('hex'),
    data: file.bytes,
    uploadedBy: actor.id,
  });
  return { id: row.id, url: attachmentUrl(row.id), contentType: row.contentType, byteSize: row.byteSize };
}
