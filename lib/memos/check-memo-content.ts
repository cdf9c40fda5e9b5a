import type { Transaction } from 'sequelize';
import { ApiError, badRequest, describeFields } from '@/lib/api/errors';
import { listAttachmentUrls } from '@/lib/attachments/list-attachment-urls';
import { validateMemoContent, type ContentRules } from '@/lib/documents/validate-memo-content';
import type { TiptapDoc } from './memo-schema';

/**
 * Checks a memo's content against the one document schema
 * (lib/documents/validate-memo-content.ts), with the memo's own attachments
 * as the only image sources.
 * - `save`: content arriving from a client, a template or a restored version;
 *   a problem is a 400 whose `fields.content` says what and where.
 * - `render`: content already stored (rows written before the check existed)
 *   about to be rendered or frozen; a problem is a 409 naming it, so that the
 *   renderer never sees a document that could break it. Link targets and
 *   image sources are left to the renderer here: it prints a link outside the
 *   allow-list as plain text and embeds only the memo's own attachments.
 */
export async function checkMemoContent(
  memoId: number | null,
  raw: unknown,
  use: 'save' | 'render',
  transaction?: Transaction,
): Promise<TiptapDoc> {
  const rules: ContentRules =
    use === 'save'
      ? {
          attachmentUrls: memoId === null ? new Set() : await listAttachmentUrls(memoId, transaction),
          linkTargets: 'allow-list',
        }
      : { attachmentUrls: 'any', linkTargets: 'any' };
  const out = validateMemoContent(raw, rules);
  if (out.ok) return out.doc;
  const { message } = out.problem;
  if (use === 'save') throw badRequest(describeFields({ content: message }), { content: message });
  throw new ApiError(
    'conflict',
    `The stored content of this memo cannot be rendered — ${message}. Restore an earlier version (Saved versions) or correct the memo, then try again.`,
    {
      fields: { content: message },
    },
  );
}
