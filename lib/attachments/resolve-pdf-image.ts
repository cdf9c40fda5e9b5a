import { Attachment } from '@/models';
import type { ImageResolver } from '@/lib/pdf/memo-pdf-types';

/**
 * Images of one memo for its PDF: `/api/attachments/<id>` of that memo's own
 * attachments, PNG or JPEG (what the PDF library embeds). Anything else is
 * left for the PDF to mark as unavailable.
 */
export function pdfImageResolver(memoId: number): ImageResolver {
  return async (src) => {
    const m = /^\/api\/attachments\/(\d{1,12})$/.exec(src);
    if (!m) return undefined;
    const a = await Attachment.findOne({ where: { id: Number(m[1]), memoId } });
    if (!a) return undefined;
    if (a.contentType === 'image/png') return { data: a.data, format: 'png' };
    if (a.contentType === 'image/jpeg') return { data: a.data, format: 'jpg' };
    return undefined;
  };
}
