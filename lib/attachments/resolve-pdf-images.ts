import type { TiptapNode } from '@/lib/memos/memo-schema';
import type { PdfImage } from '@/lib/pdf/memo-pdf-types';
import { documentIndex } from '@/lib/documents/model/document-index';
import { pdfImageResolver } from './resolve-pdf-image';

/**
 * The bytes of every image of a memo's document that the PDF reads from the
 * database (its own attachments), by src: fetched on the request thread so
 * a PDF worker needs no database. Data URLs are left to the renderer.
 */
export async function resolvePdfImages(memoId: number, doc: TiptapNode): Promise<Map<string, PdfImage | undefined>> {
  const resolve = pdfImageResolver(memoId);
  const images = new Map<string, PdfImage | undefined>();
  for (const src of documentIndex(doc).imageSources) {
    if (!src.startsWith('data:')) images.set(src, await resolve(src));
  }
  return images;
}
