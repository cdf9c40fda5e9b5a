/**
 * A realistic memo for the PDF tests: the SSO design-rationale template
 * (TERNLIGHT-1, our invented mission) with figures bound to its blocks,
 * a ground-track block, and every other node and mark type the schema has.
 */
import { evaluateDocument } from '@/lib/documents/evaluate-document';
import type { TiptapDoc, TiptapNode } from '@/lib/memos/memo-schema';
import type { MemoPdfSource } from '@/lib/pdf/memo-pdf-types';
import { calc, p, typed, value, text } from '@/lib/templates/build-doc';
import { ssoDesignRationale } from '@/lib/templates/sso-design-rationale';

export const figure = (figureId: string, figureKind: string, blockId: string, caption: string): TiptapNode => ({
  type: 'figure',
  attrs: { figureId, figureKind, blockId, caption },
});
const marked = (t: string, ...marks: string[]): TiptapNode => ({
  type: 'text',
  text: t,
  marks: marks.map((type) =>
    type === 'link' ? { type, attrs: { href: 'https://www.naturalearthdata.com/' } } : { type },
  ),
});
const cell = (type: 'tableHeader' | 'tableCell', ...parts: (string | TiptapNode)[]): TiptapNode => ({
  type,
  content: [p(...parts)],
});
const li = (...content: TiptapNode[]): TiptapNode => ({ type: 'listItem', content });

/** Figures added after the block they draw, by block id. */
export const TEST_FIGURES: Record<string, TiptapNode> = {
  options: figure(
    'fOptions',
    'repeat-options',
    'options',
    'Exact repeat cycles of at most 16 days between 600 km and 800 km.',
  ),
  sso: figure(
    'fSso',
    'sso-inclination-altitude',
    'sso',
    'Sun-synchronous inclination across the altitude band, selected orbit marked.',
  ),
  sun: figure('fSun', 'beta-eclipse-year', 'sun', 'Beta angle and eclipse duration over the first year.'),
  drag: figure('fDrag', 'altitude-decay', 'drag', 'Altitude without manoeuvres at moderate solar activity.'),
  inject: figure('fInject', 'local-time-drift', 'inject', 'Drift of the node local time from launcher dispersions.'),
};

function extras(): TiptapNode[] {
  return [
    { type: 'heading', attrs: { level: 1 }, content: [text('Ground track and checks')] },
    calc('trackDay', 'ground-track', 'Ground track over one day', {
      altitudeKm: typed('700 km'),
      inclinationDeg: typed('98.2 deg'),
      ltanHours: typed('22.5'),
      startEpoch: typed('2027-09-15T00:00:00Z'),
      hours: typed('24'),
      stepSec: typed('60'),
    }),
    figure('fTrack', 'ground-track-map', 'trackDay', 'Ground track over the first day with the ascending nodes.'),
    { type: 'heading', attrs: { level: 2 }, content: [text('Summary table')] },
    {
      type: 'table',
      content: [
        {
          type: 'tableRow',
          content: [cell('tableHeader', 'Parameter'), cell('tableHeader', 'Value'), cell('tableHeader', 'Source')],
        },
        {
          type: 'tableRow',
          content: [
            cell('tableCell', 'Inclination'),
            cell('tableCell', value('sso', 'inclinationDeg')),
            cell('tableCell', 'Sun-synchronous condition'),
          ],
        },
        {
          type: 'tableRow',
          content: [
            cell('tableCell', 'Altitude'),
            cell('tableCell', value('repeat', 'altitudeKm')),
            cell('tableCell', 'Repeat orbit'),
          ],
        },
      ],
    },
    { type: 'heading', attrs: { level: 3 }, content: [text('Review notes')] },
    {
      type: 'orderedList',
      attrs: { start: 1 },
      content: [
        li(p('Confirm the launch window with the provider.')),
        li(p('Check the propellant budget.'), {
          type: 'bulletList',
          content: [li(p('Drag make-up')), li(p('Inclination trim'))],
        }),
      ],
    },
    { type: 'blockquote', content: [p('Coastlines: Natural Earth 1:110m land, public domain.')] },
    { type: 'codeBlock', content: [text('altitudeKm = 700\ninclinationDeg = 98.2')] },
    { type: 'horizontalRule' },
    {
      type: 'paragraph',
      content: [
        marked('Bold', 'bold'),
        text(', '),
        marked('italic', 'italic'),
        text(', '),
        marked('struck', 'strike'),
        text(', '),
        marked('underlined', 'underline'),
        text(', '),
        marked('mono', 'code'),
        text(' and a '),
        marked('link', 'link'),
        { type: 'hardBreak' },
        text('A broken reference: '),
        value('gone', 'altitudeKm'),
        text('.'),
      ],
    },
  ];
}

/** The test document: the template, a figure for each listed block the template does not already draw, extras before the conclusion. */
export function pdfTestDocument(): TiptapDoc {
  const base = ssoDesignRationale.build();
  const drawn = new Set(base.content.filter((n) => n.type === 'figure').map((n) => String(n.attrs?.blockId)));
  const content: TiptapNode[] = [];
  for (const node of base.content) {
    if (node.type === 'heading' && node.content?.[0]?.text === 'Conclusion') content.push(...extras());
    content.push(node);
    const id = node.type === 'calcBlock' ? String(node.attrs?.blockId) : '';
    if (TEST_FIGURES[id] && !drawn.has(id)) content.push(TEST_FIGURES[id]);
  }
  return { type: 'doc', content };
}

export function pdfTestMemo(content: TiptapDoc = pdfTestDocument()): MemoPdfSource {
  return {
    documentNumber: 'BWO-TL1-DM-001',
    title: 'TERNLIGHT-1 orbit design rationale',
    version: 7,
    owner: { id: 1, name: 'Ilse Marrow' },
    reviewers: [{ id: 2, name: 'Tobias Quenby' }],
    content,
    updatedAt: '2027-06-01T09:30:00.000Z',
  };
}

export const evaluate = (doc: TiptapDoc) => evaluateDocument(doc);
