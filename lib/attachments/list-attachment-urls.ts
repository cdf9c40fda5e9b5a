import type { Transaction } from 'sequelize';
import { Attachment } from '@/models';

/** The URL an attachment is served at (GET /api/attachments/:id). */
export const attachmentUrl = (id: number): string => `/api/attachments/${id}`;

/** URLs of a memo's own attachments: the only image sources its content may use. */
export async function listAttachmentUrls(memoId: number, transaction?: Transaction): Promise<Set<string>> {
  const rows = await Attachment.findAll({ where: { memoId }, attributes: ['id'], transaction });
  return new Set(rows.map((r) => attachmentUrl(r.id)));
}
