import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import type { JSONContent } from '@tiptap/core';
import { build } from 'esbuild';
import { openBrowser } from '../support/browser';

/**
 * Every attribute of every custom memo node survives the trip through HTML
 * that copy, cut and paste take: getHTML() from one editor, setContent() of
 * that HTML in another, the same JSON back. Tiptap needs a DOM, so the memo
 * schema (lib/documents/model/memo-extensions.ts, without React views) is bundled
 * and run in Chromium. The expected documents are written out by hand.
 */

let context: BrowserContext;
let close: () => Promise<void>;
let page: Page;

beforeAll(async () => {
  ({ context, close } = await openBrowser());
  const bundle = await build({
    entryPoints: [path.resolve('tests/browser/support/round-trip-entry.ts')],
    bundle: true,
    write: false,
    format: 'iife',
    platform: 'browser',
    logLevel: 'error',
    define: { 'process.env.NODE_ENV': '"production"' },
  });
  page = await context.newPage();
  await page.setContent('<!doctype html><html><body></body></html>');
  await page.addScriptTag({ content: bundle.outputFiles[0].text });
});
afterAll(async () => close());

const roundTrip = (doc: JSONContent) =>
  page.evaluate(
    (d) =>
      (
        window as unknown as { roundTrip: (x: JSONContent) => { html: string; first: JSONContent; again: JSONContent } }
      ).roundTrip(d),
    doc,
  );

const para = (...content: JSONContent[]): JSONContent => ({ type: 'paragraph', content });
// Each document ends with a paragraph, as a memo does: setContent() adds one after a closing
// block node (StarterKit's trailing node), which is not what these tests are about.
const doc = (...content: JSONContent[]): JSONContent => ({
  type: 'doc',
  content: [...content, para({ type: 'text', text: 'End of memo.' })],
});

describe('custom nodes keep every attribute through getHTML() / setContent()', () => {
  it('calc block: blockId, kind, label and inputs (typed text and a reference)', async () => {
    const block: JSONContent = {
      type: 'calcBlock',
      attrs: {
        blockId: 'sso',
        kind: 'sso-inclination',
        label: 'Sun-synchronous inclination',
        inputs: { altitudeKm: { ref: { blockId: 'repeat', output: 'altitudeKm' } }, eccentricity: { text: '0.0011' } },
      },
    };
    const out = await roundTrip(doc(block));
    expect(out.html).toContain('data-block-id="sso"');
    expect(out.first).toEqual(doc(block));
    expect(out.again).toEqual(doc(block));
  });

  it('live value: blockId and output', async () => {
    const d = doc(
      para(
        { type: 'text', text: 'The orbit needs ' },
        { type: 'liveValue', attrs: { blockId: 'sso', output: 'inclinationDeg' } },
        { type: 'text', text: '.' },
      ),
    );
    const out = await roundTrip(d);
    expect(out.first).toEqual(d);
    expect(out.again).toEqual(d);
  });

  it('figure: figureId, figureKind, blockId and caption', async () => {
    const d = doc({
      type: 'figure',
      attrs: {
        figureId: 'fdecay1',
        figureKind: 'altitude-decay',
        blockId: 'decay',
        caption: 'Altitude over the mission, moderate solar activity',
      },
    });
    const out = await roundTrip(d);
    expect(out.first).toEqual(d);
    expect(out.again).toEqual(d);
  });

  it('figure reference: figureId', async () => {
    const d = doc(
      para(
        { type: 'text', text: 'See ' },
        { type: 'figureRef', attrs: { figureId: 'fdecay1' } },
        { type: 'text', text: ' for the decay.' },
      ),
    );
    const out = await roundTrip(d);
    expect(out.first).toEqual(d);
    expect(out.again).toEqual(d);
  });

  it('requirement: requirementId, text, blockId, output, comparison, threshold, tolerance; compliance table', async () => {
    const d = doc(
      {
        type: 'requirement',
        attrs: {
          requirementId: 'REQ-ORB-002',
          text: 'Descending node at 10:30 ± 15 min.',
          blockId: 'ltan',
          output: 'ltdnHours',
          comparison: 'within',
          threshold: '10.5 h',
          tolerance: '15 min',
        },
      },
      { type: 'complianceTable' },
    );
    const out = await roundTrip(d);
    expect(out.html).toContain('data-requirement-id="REQ-ORB-002"');
    expect(out.first).toEqual(d);
    expect(out.again).toEqual(d);
  });

  it('stock nodes and marks with attributes: heading level, list start, code language, image, table cells, link', async () => {
    const d = doc(
      { type: 'heading', attrs: { level: 2 }, content: [{ type: 'text', text: 'Disposal' }] },
      {
        type: 'orderedList',
        attrs: { start: 3, type: null },
        content: [{ type: 'listItem', content: [para({ type: 'text', text: 'Third step' })] }],
      },
      { type: 'codeBlock', attrs: { language: 'json' }, content: [{ type: 'text', text: '{"altitudeKm": 692.8}' }] },
      {
        type: 'image',
        attrs: {
          src: '/api/attachments/7',
          alt: 'Ground track',
          title: 'Ground track, day 1',
          caption: 'Ground track over the first day',
          width: null,
          height: null,
        },
      },
      {
        type: 'table',
        content: [
          {
            type: 'tableRow',
            content: [
              {
                type: 'tableHeader',
                attrs: { colspan: 2, rowspan: 1, colwidth: null, align: null },
                content: [para({ type: 'text', text: 'Candidates' })],
              },
            ],
          },
          {
            type: 'tableRow',
            content: [
              {
                type: 'tableCell',
                attrs: { colspan: 1, rowspan: 1, colwidth: null, align: null },
                content: [para({ type: 'text', text: '692.8 km' })],
              },
              {
                type: 'tableCell',
                attrs: { colspan: 1, rowspan: 1, colwidth: null, align: 'right' },
                content: [para({ type: 'text', text: '98.16°' })],
              },
            ],
          },
        ],
      },
      para({
        type: 'text',
        text: 'Source',
        marks: [
          {
            type: 'link',
            attrs: {
              href: 'https://www.ccsds.org',
              target: '_blank',
              rel: 'noopener noreferrer nofollow',
              class: null,
              title: null,
            },
          },
        ],
      }),
    );
    const out = await roundTrip(d);
    expect(out.first).toEqual(d);
    expect(out.again).toEqual(d);
  });

  it('all of them together, with the block the others point at, keep their ids (nothing renumbered)', async () => {
    const d = doc(
      {
        type: 'calcBlock',
        attrs: {
          blockId: 'decay',
          kind: 'altitude-decay',
          label: 'Decay',
          inputs: { altitudeKm: { text: '692.8 km' } },
        },
      },
      para(
        { type: 'text', text: 'Decay is shown in ' },
        { type: 'figureRef', attrs: { figureId: 'fdecay1' } },
        { type: 'text', text: '; lifetime ' },
        { type: 'liveValue', attrs: { blockId: 'decay', output: 'lifetimeYears' } },
      ),
      {
        type: 'figure',
        attrs: { figureId: 'fdecay1', figureKind: 'altitude-decay', blockId: 'decay', caption: 'Decay' },
      },
    );
    const out = await roundTrip(d);
    expect(out.again).toEqual(d);
  });
});
