import { describe, expect, it } from 'vitest';
import { attachmentResponseHeaders, safeAttachmentFilename } from '@/lib/attachments/attachment-response-headers';

/**
 * Attachment response headers: the filename must survive as one quoted
 * parameter of Content-Disposition (RFC 6266 §4.1; RFC 9110 §5.6.4 quoted-string)
 * whatever the uploader named the file, so only a safe subset of ASCII is kept.
 */

describe('safeAttachmentFilename', () => {
  it.each([
    ['orbit plot.png', 'image/png', 'orbit-plot.png'],
    ['"quoted"\r\nX-Injected: 1; <script>.png', 'image/png', 'quoted-X-Injected-1-script.png'],
    ['Bahnhöhe über Grund.jpeg', 'image/jpeg', 'Bahnho-he-u-ber-Grund.jpg'],
    ['../../etc/passwd', 'image/gif', 'passwd.gif'],
    ['C:\\Users\\ilse\\plot.png', 'image/png', 'plot.png'],
    ['', 'image/webp', 'image.webp'],
    ['пример.png', 'image/png', 'image.png'],
    ['name.svg', 'image/png', 'name.png'],
  ])('%j → %s', (name, type, expected) => {
    expect(safeAttachmentFilename(name, type)).toBe(expected);
  });
});

describe('attachmentResponseHeaders', () => {
  it('serves inline under the safe name, sandboxed, not sniffed', () => {
    const h = attachmentResponseHeaders({ filename: 'a"b.png', contentType: 'image/png', byteSize: 10, sha256: 'ab' });
    expect(h['content-disposition']).toBe('inline; filename="a-b.png"');
    expect(h['content-security-policy']).toMatch(/^sandbox; default-src 'none'/);
    expect(h['x-content-type-options']).toBe('nosniff');
  });
});
