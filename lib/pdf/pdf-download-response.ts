import { PDF_CONTENT_SECURITY_POLICY } from './pdf-content-security-policy';

/** The HTTP answer of every PDF download: the bytes, their file name (`pdfFileName`) and their SHA-256. */
export function pdfDownloadResponse(file: { bytes: Buffer; filename: string; sha256: string }): Response {
  return new Response(new Uint8Array(file.bytes), {
    headers: {
      'content-type': 'application/pdf',
      'content-length': String(file.bytes.length),
      'content-disposition': `inline; filename="${file.filename}"`,
      'x-content-sha256': file.sha256,
      'cache-control': 'private, no-store',
      'content-security-policy': PDF_CONTENT_SECURITY_POLICY,
    },
  });
}
