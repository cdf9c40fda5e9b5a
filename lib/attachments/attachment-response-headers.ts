import type { Attachment } from '@/models';

/**
 * A stored image is user-supplied bytes: opened on its own it must not run
 * anything or reach anything. `sandbox` gives it a unique opaque origin with
 * scripts, forms and plugins off; `default-src 'none'` with `img-src 'self'`
 * lets the browser show the image itself and nothing else (CSP Level 3,
 * "sandbox" and fetch directives). Images in a memo's text are <img> elements
 * of the memo page and are not affected by this policy.
 */
export const ATTACHMENT_CONTENT_SECURITY_POLICY =
  "sandbox; default-src 'none'; img-src 'self'; style-src 'unsafe-inline'";

/** A filename safe inside a quoted header parameter: the last path segment, reduced to letters, digits, dot, dash, underscore; the extension follows the type. */
export function safeAttachmentFilename(filename: string, contentType: string): string {
  const ext =
    { 'image/png': 'png', 'image/jpeg': 'jpg', 'image/gif': 'gif', 'image/webp': 'webp' }[contentType] ?? 'bin';
  const base = filename
    .replace(/^.*[/\\]/, '')
    .replace(/\.[^.]*$/, '')
    .normalize('NFKD')
    .replace(/[^A-Za-z0-9._-]+/g, '-')
    .replace(/^[-.]+|[-.]+$/g, '')
    .slice(0, 100);
  return `${base || 'image'}.${ext}`;
}

/** Headers for `GET /api/attachments/:id`: the bytes inline under a safe name, never sniffed, sandboxed. */
export function attachmentResponseHeaders(
  a: Pick<Attachment, 'filename' | 'contentType' | 'byteSize' | 'sha256'>,
): Record<string, string> {
  return {
    'content-type': a.contentType,
    'content-length': String(a.byteSize),
    'content-disposition': `inline; filename="${safeAttachmentFilename(a.filename, a.contentType)}"`,
    'content-security-policy': ATTACHMENT_CONTENT_SECURITY_POLICY,
    'cache-control': 'private, max-age=31536000, immutable',
    'x-content-type-options': 'nosniff',
    etag: `"${a.sha256}"`,
  };
}
