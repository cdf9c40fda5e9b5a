/**
 * The Content-Security-Policy of PDF responses (a memo's PDF, a revision's
 * stored PDF). Chromium shows a PDF in a generated viewer page that needs
 * inline styles and an embedded plugin of the PDF's own URL; a fetch-directive
 * policy such as the API's `default-src 'none'` (or `sandbox`) leaves it blank
 * or blocked (Chromium issue 271452). The PDFs are rendered by Nodewright
 * itself, so they get the anti-framing directive only, like every page.
 */
export const PDF_CONTENT_SECURITY_POLICY = "frame-ancestors 'none'";
