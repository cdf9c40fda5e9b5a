/**
 * The link allow-list shared by the save-time check and the PDF's link handler.
 * The disguised forms follow the WHATWG URL Standard's basic URL parser, which
 * strips leading and trailing C0 controls and spaces and removes tab and newline
 * anywhere before reading the scheme (so " javascript:" and "java\tscript:" are
 * javascript: URLs to a browser).
 */
import { describe, expect, it } from 'vitest';
import { isAllowedLinkHref } from '@/lib/documents/is-allowed-link-href';

describe('isAllowedLinkHref', () => {
  it('allows http, https, mailto and anchors inside the document', () => {
    for (const href of [
      'https://www.esa.int/',
      'http://example.org/a?b=c#d',
      'HTTPS://EXAMPLE.ORG/',
      'mailto:ilse.marrow@brightwater.example',
      '#figures',
      '#section-2',
    ]) {
      expect(isAllowedLinkHref(href), href).toBe(true);
    }
  });

  it('refuses every other scheme, disguised schemes, relative paths, empty targets and non-strings', () => {
    for (const href of [
      'javascript:alert(1)',
      'JaVaScRiPt:alert(1)',
      ' javascript:alert(1)',
      'java\tscript:alert(1)',
      'java\nscript:alert(1)',
      'javascript\u0000:alert(1)',
      'data:text/html,<b>x</b>',
      'vbscript:x',
      'file:///etc/passwd',
      'ftp://example.org/',
      '//evil.example/',
      '/memos/3',
      'memos/3',
      'http://',
      'mailto:',
      '#',
      '',
      'x'.repeat(2049),
    ]) {
      expect(isAllowedLinkHref(href), JSON.stringify(href)).toBe(false);
    }
    for (const value of [null, undefined, 7, {}, ['https://www.esa.int/']])
      expect(isAllowedLinkHref(value)).toBe(false);
  });
});
