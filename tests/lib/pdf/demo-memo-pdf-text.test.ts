/**
 * What a customer reads in the demo memo's PDF (the design-rationale template as seeded, rendered as the app does),
 * read back with poppler: no citation "from memory" and no personal web page, no internal block or kind ids, no raw
 * field names of the engine, no floating-point noise, and an outline a reader can navigate (sections nested by level,
 * the lists of figures and tables, the appendices with their tables), with the same entries in the contents.
 */
import fs from 'node:fs';
import { beforeAll, describe, expect, it } from 'vitest';
import { listCalcKinds } from '@/lib/calc';
import { DEMO_MEMO, demoMemoContent } from '@/lib/demo/demo-memo';
import { evaluateDocument } from '@/lib/documents/evaluate-document';
import { documentIndex } from '@/lib/documents/model/document-index';
import { renderMemoPdf } from '@/lib/pdf/render-memo-pdf';
import { pageTexts, pdfInfo, writePdf } from './support/pdf-tools';

/** Outline entries of a PDF as written by react-pdf (pdfkit: one uncompressed object per entry, with /Title and /Parent). */
function outline(file: string): { title: string; parent?: string }[] {
  const raw = fs.readFileSync(file).toString('latin1');
  const objects = new Map<string, string>();
  for (const m of raw.matchAll(/(\d+) 0 obj\s*<<([\s\S]*?)>>\s*endobj/g)) objects.set(m[1], m[2]);
  const titleOf = (body: string | undefined) => (body ? /\/Title \(((?:\\.|[^\\)])*)\)/.exec(body)?.[1] : undefined);
  const entries: { title: string; parent?: string }[] = [];
  for (const body of objects.values()) {
    const title = titleOf(body);
    if (title === undefined) continue;
    const parentId = /\/Parent (\d+) 0 R/.exec(body)?.[1];
    entries.push({ title, parent: titleOf(parentId ? objects.get(parentId) : undefined) });
  }
  return entries;
}

describe('demo memo PDF as a customer reads it', () => {
  const doc = demoMemoContent();
  let file = '';
  let all = '';
  let pages: string[] = [];

  beforeAll(async () => {
    const memo = {
      ...DEMO_MEMO,
      version: 4,
      owner: { id: 1, name: 'Ilse Marrow' },
      reviewers: [{ id: 2, name: 'Tobias Quenby' }],
      content: doc,
      updatedAt: '2027-06-01T09:30:00.000Z',
    };
    file = writePdf(
      'demo-memo.pdf',
      await renderMemoPdf({ memo, evaluations: evaluateDocument(doc), paper: 'a4', draft: true }),
    );
    pages = pageTexts(file);
    all = pages.join(' ');
  }, 120_000);

  it('cites no source "from memory" and no personal web page', () => {
    expect(all).not.toMatch(/from memory/i);
    expect(all).not.toMatch(/braeunig/i);
  });

  it('names calc blocks by their label, never by internal block or kind id', () => {
    // Kind ids read like trade terms ("ground-track"): what must not appear is an id printed as an id, in a block's
    // title line ("repeat-options · options") or after a method's title ("… (repeat-options)").
    for (const { kind } of listCalcKinds()) {
      expect(all, kind).not.toContain(`${kind} ·`);
      expect(all, kind).not.toContain(`(${kind})`);
    }
    for (const block of documentIndex(doc).calc.blocks)
      expect(all, block.blockId).not.toMatch(new RegExp(`· ${block.blockId}\\b`));
    for (const block of documentIndex(doc).calc.blocks) expect(all).toContain(block.label);
  });

  it('prints no raw field name of the engine (camelCase input and output names)', () => {
    const names = new Set<string>();
    for (const k of listCalcKinds())
      for (const f of [...k.inputs, ...k.outputs, ...k.outputs.flatMap((o) => o.columns ?? [])])
        if (/[a-z][A-Z]/.test(f.name)) names.add(f.name);
    expect(names.size).toBeGreaterThan(20);
    const found = [...names].filter((n) => new RegExp(`\\b${n}\\b`).test(all));
    expect(found).toEqual([]);
  });

  it('prints no floating-point noise: no number with 13 or more significant digits (a double printed in full has 15 to 17)', () => {
    // Pasted two-line element sets are printed verbatim; their epoch field (YYDDD.DDDDDDDD, line 1 columns 19–32) is not a computed number.
    const withoutTles = all.replace(/\b1 [0-9A-Z]{5}[A-Z ] ?\S* \d{5}\.\d{8}\b/g, '');
    const long = [...withoutTles.matchAll(/\d[\d.]*\d/g)]
      .map((m) => m[0])
      .filter((n) => n.replace('.', '').replace(/^0+/, '').length >= 13);
    expect(long).toEqual([]);
  });

  it('has an outline nested by heading level, with the lists of figures and tables and the appendices with their tables', () => {
    const entries = outline(file);
    const parentOf = (title: string) => entries.find((e) => e.title === title)?.parent;
    const titles = entries.map((e) => e.title);
    expect(titles).toEqual(
      expect.arrayContaining([
        'Contents',
        'List of figures',
        'List of tables',
        '1  Purpose and scope',
        'Appendix A  Full series tables',
        'Appendix B  Constants and models',
      ]),
    );
    expect(parentOf('3.1  Coverage')).toBe('3  Repeat ground track');
    expect(parentOf('Constants')).toBe('Appendix B  Constants and models');
    expect(entries.filter((e) => e.parent === 'Appendix A  Full series tables').length).toBeGreaterThan(0);
    expect(parentOf('1  Purpose and scope')).toBeUndefined();
  });

  it('lists the lists of figures and tables and the appendices in the contents, with pages, and captions every table', () => {
    const contents = pages.find((p) => p.includes('Contents')) ?? '';
    expect(contents).toMatch(/List of figures \d+ List of tables \d+/);
    expect(contents).toMatch(/Appendix A Full series tables \d+ Appendix B Constants and models \d+/);
    expect(all).toMatch(
      /Table 1\. Repeat cycles in the altitude band: repeat options \(first 8 of (\d+) rows; all rows in Table A-1\)\./,
    );
    expect(all).toMatch(
      /Table A-1\. Repeat cycles in the altitude band: repeat options \(all \d+ rows; cut in Table 1\)/,
    );
  });

  it('carries the document number in its metadata', () => {
    const info = pdfInfo(file);
    expect(info.Title).toBe(`${DEMO_MEMO.documentNumber} ${DEMO_MEMO.title}`);
    expect(info.Subject).toContain(DEMO_MEMO.documentNumber);
    expect(info.Keywords).toContain(DEMO_MEMO.documentNumber);
    expect(info.Author).toBe('Ilse Marrow');
  });
});
