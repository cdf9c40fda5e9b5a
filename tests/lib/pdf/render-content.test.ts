/**
 * The content walker: every node and mark type of the shared schema has a
 * handler, an unknown one stops the render with its name, and small
 * documents (frozen revision on US Letter, a photo, a failing block) come
 * out as they should.
 */
import { describe, expect, it } from 'vitest';
import { MEMO_MARK_TYPES, MEMO_NODE_TYPES } from '@/lib/documents/model/memo-extensions';
import { evaluateDocument } from '@/lib/documents/evaluate-document';
import type { TiptapDoc } from '@/lib/memos/memo-schema';
import { renderMemoPdf } from '@/lib/pdf/render-memo-pdf';
import { NODE_HANDLERS } from '@/lib/pdf/render-content';
import { MARK_HANDLERS } from '@/lib/pdf/render-inline';
import { calc, h, p, text, typed, value } from '@/lib/templates/build-doc';
import { pdfTestMemo } from './support/pdf-test-memo';
import { listImages, pageTexts, pdfInfo, writePdf } from './support/pdf-tools';

/** A 2 × 2 px red PNG (made with Python's zlib; IHDR, one IDAT, IEND). */
const PNG_2X2 =
  'data:image/png;base64,iVBORw0KGgoAAAANSUhEUgAAAAIAAAACCAIAAAD91JpzAAAAEElEQVR4nGP4z8AARAwQCgAf7gP9i18U1AAAAABJRU5ErkJggg==';

const render = (content: TiptapDoc, options: { draft?: boolean; revision?: string; paper?: 'a4' | 'letter' } = {}) =>
  renderMemoPdf({
    memo: pdfTestMemo(content),
    evaluations: evaluateDocument(content),
    paper: options.paper ?? 'a4',
    draft: options.draft ?? true,
    revision: options.revision,
  });

describe('handlers', () => {
  it('exist for exactly the node and mark types of the shared schema', () => {
    expect(Object.keys(NODE_HANDLERS).sort()).toEqual([...MEMO_NODE_TYPES].sort());
    expect(Object.keys(MARK_HANDLERS).sort()).toEqual([...MEMO_MARK_TYPES].sort());
  });

  it('refuse an unknown node type with an error naming it', async () => {
    const doc: TiptapDoc = { type: 'doc', content: [p('Before'), { type: 'mathBlock', attrs: { latex: 'x' } }] };
    await expect(render(doc)).rejects.toThrow(/node of type "mathBlock", which the PDF renderer does not know/);
  });

  it('refuse an unknown mark with an error naming it', async () => {
    const doc: TiptapDoc = {
      type: 'doc',
      content: [{ type: 'paragraph', content: [{ type: 'text', text: 'lit', marks: [{ type: 'highlight' }] }] }],
    };
    await expect(render(doc)).rejects.toThrow(/mark of type "highlight"/);
  });
});

describe('small documents', () => {
  it('keeps http(s), mailto and #anchor links as link annotations; any other scheme becomes plain text without a target', async () => {
    const linked = (label: string, href: string) => ({
      type: 'text',
      text: label,
      marks: [{ type: 'link', attrs: { href } }],
    });
    const doc: TiptapDoc = {
      type: 'doc',
      content: [
        {
          type: 'paragraph',
          content: [
            linked('Script link', 'javascript:alert(1)'),
            text(' · '),
            linked('Data link', 'data:text/html,<b>x</b>'),
            text(' · '),
            linked('Spaced', ' javascript:alert(2)'),
            text(' · '),
            linked('ESA', 'https://www.esa.int/'),
            text(' · '),
            linked('Mail', 'mailto:ilse.marrow@brightwater.example'),
          ],
        },
      ],
    };
    const bytes = await render(doc);
    // PDFKit writes link annotations as uncompressed dictionaries: /URI (target)
    const raw = bytes.toString('latin1');
    expect(raw).toMatch(/\/URI \(https:\/\/www\.esa\.int\/\)/);
    expect(raw).toMatch(/\/URI \(mailto:ilse\.marrow@brightwater\.example\)/);
    expect(raw).not.toMatch(/javascript:/i);
    expect(raw).not.toMatch(/\/URI \(data:/i);
    const texts = pageTexts(writePdf('links.pdf', bytes)).join(' ');
    expect(texts).toContain('Script link · Data link · Spaced · ESA · Mail');
  });

  it('a frozen revision on US Letter: revision letter in the header, no DRAFT anywhere', async () => {
    const doc: TiptapDoc = {
      type: 'doc',
      content: [
        h(1, 'Orbit'),
        calc('sso', 'sso-inclination', 'SSO at 700 km', { altitudeKm: typed('700 km') }),
        p('Inclination ', value('sso', 'inclinationDeg'), '.'),
      ],
    };
    const file = writePdf(
      'memo-letter-revision-b.pdf',
      await render(doc, { draft: false, revision: 'B', paper: 'letter' }),
    );
    expect(pdfInfo(file)['Page size']).toMatch(/^612 x 792 pts/);
    const pages = pageTexts(file);
    for (const [i, page] of pages.entries()) {
      expect(page).toContain('BWO-TL1-DM-001 · Revision B');
      expect(page).toContain(`page ${i + 1} of ${pages.length}`);
      expect(page).not.toMatch(/DRAFT/);
    }
    expect(pages[1]).toContain(
      'Revision record Revision Date Description Author Reviewed by Released by B 2027-06-01 Frozen revision. Ilse Marrow',
    );
  });

  it('embeds photos (data URLs) as raster images with their captions, never a file name, and marks an unresolvable one', async () => {
    const doc: TiptapDoc = {
      type: 'doc',
      content: [
        { type: 'image', attrs: { src: PNG_2X2, alt: 'Test card' } },
        { type: 'image', attrs: { src: '/api/attachments/999', alt: 'Missing' } },
        // A caption wins over the alternative text; a file name (the alt of images added before captions) is never printed.
        {
          type: 'image',
          attrs: { src: PNG_2X2, alt: 'card.png', caption: 'Imager test card under the solar simulator' },
        },
        { type: 'image', attrs: { src: PNG_2X2, alt: 'IMG_0042.JPG' } },
      ],
    };
    const file = writePdf('memo-image.pdf', await render(doc));
    expect(listImages(file)).toHaveLength(3);
    const all = pageTexts(file).join(' ');
    expect(all).toContain('[image unavailable: /api/attachments/999]');
    expect(all).toContain('Imager test card under the solar simulator');
    expect(all).not.toMatch(/card\.png|IMG_0042/);
  });

  it('shows a failing calc block with its stored inputs and the engine error', async () => {
    const doc: TiptapDoc = {
      type: 'doc',
      content: [
        calc('low', 'sso-inclination', 'Too low', { altitudeKm: typed('50 km') }),
        p(text('Value: '), value('low', 'inclinationDeg')),
      ],
    };
    const all = pageTexts(writePdf('memo-failed-block.pdf', await render(doc))).join(' ');
    // The engine's refusal and the stored inputs are named by the fields' labels, not their internal names.
    expect(all).toMatch(
      /\[calculation unavailable: Mean altitude \(mean semi-major axis − equatorial radius\): [^\]]*100[^\]]*\]/,
    );
    expect(all).toContain('INPUTS AS STORED Mean altitude (mean semi-major axis − equatorial radius) 50 km');
    expect(all).not.toContain('altitudeKm');
    expect(all).toContain('Value: [value unavailable: Too low has no result]');
  });
});
