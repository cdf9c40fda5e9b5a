import { describe, expect, it } from 'vitest';
import { compareBlocks, compareUnits } from '@/lib/revisions/compare-blocks';
import type { TiptapDoc, TiptapNode } from '@/lib/memos/memo-schema';

/**
 * The part-by-part comparison of two memos: edited paragraphs word by word,
 * tables cell by cell, images as old and new picture, parts inserted or
 * deleted whole. Expected results written by hand from the two documents.
 */
const p = (text: string): TiptapNode => ({ type: 'paragraph', content: [{ type: 'text', text }] });
const cell = (type: string, text: string): TiptapNode => ({ type, content: [p(text)] });
const table = (rows: string[][]): TiptapNode => ({
  type: 'table',
  content: rows.map((r, i) => ({
    type: 'tableRow',
    content: r.map((c) => cell(i === 0 ? 'tableHeader' : 'tableCell', c)),
  })),
});
const image = (src: string, alt: string): TiptapNode => ({ type: 'image', attrs: { src, alt } });
const doc = (...content: TiptapNode[]): TiptapDoc => ({ type: 'doc', content });
const quote = () => '98.206°';
const compare = (a: TiptapDoc, b: TiptapDoc) => compareBlocks(compareUnits(a, quote), compareUnits(b, quote));

describe('compareBlocks', () => {
  it('keeps unchanged paragraphs and diffs an edited one word by word', () => {
    const changes = compare(
      doc(p('Mission drivers'), p('The orbit repeats every 12 days.')),
      doc(p('Mission drivers'), p('The orbit repeats every 13 days.')),
    );
    expect(changes[0]).toEqual({ op: 'equal', unit: { kind: 'text', text: 'Mission drivers' } });
    expect(changes[1]).toEqual({
      op: 'change',
      kind: 'text',
      segments: [
        { op: 'equal', text: 'The orbit repeats every ' },
        { op: 'delete', text: '12' },
        { op: 'insert', text: '13' },
        { op: 'equal', text: ' days.' },
      ],
    });
  });

  it('reads changes a space apart as one: old words, then new words', () => {
    const [change] = compare(doc(p('Mean altitude to be computed.')), doc(p('Mean altitude 668.4 km.')));
    expect(change).toEqual({
      op: 'change',
      kind: 'text',
      segments: [
        { op: 'equal', text: 'Mean altitude ' },
        { op: 'delete', text: 'to be computed' },
        { op: 'insert', text: '668.4 km' },
        { op: 'equal', text: '.' },
      ],
    });
  });

  it('shows a live value by its displayed text', () => {
    const withValue = doc({
      type: 'paragraph',
      content: [
        { type: 'text', text: 'Inclination ' },
        { type: 'liveValue', attrs: { blockId: 'sso', output: 'inclinationDeg' } },
      ],
    });
    expect(compareUnits(withValue, quote)).toEqual([{ kind: 'text', text: 'Inclination 98.206°' }]);
  });

  it('compares a table cell by cell and row by row', () => {
    const before = table([
      ['Cycle', 'Revolutions'],
      ['12 d', '175'],
      ['13 d', '189'],
    ]);
    const after = table([
      ['Cycle', 'Revolutions'],
      ['12 d', '175'],
      ['13 d', '190'],
      ['16 d', '233'],
    ]);
    const [change] = compare(doc(before), doc(after));
    expect(change.op === 'change' && change.kind === 'table').toBe(true);
    if (change.op !== 'change' || change.kind !== 'table') return;
    expect(change.rows.map((r) => r.op)).toEqual(['equal', 'equal', 'change', 'insert']);
    expect(change.rows[0].header).toBe(true);
    expect(change.rows[2].cells).toEqual([
      [{ op: 'equal', text: '13 d' }],
      [
        { op: 'delete', text: '189' },
        { op: 'insert', text: '190' },
      ],
    ]);
    expect(change.rows[3].cells).toEqual([[{ op: 'insert', text: '16 d' }], [{ op: 'insert', text: '233' }]]);
  });

  it('shows a replaced image as its old and new picture, and a new one as inserted', () => {
    const changes = compare(
      doc(image('/api/attachments/1', 'Ground track')),
      doc(image('/api/attachments/2', 'Ground track, 13-day cycle'), p('New note.')),
    );
    expect(changes).toEqual([
      {
        op: 'change',
        kind: 'image',
        from: { kind: 'image', src: '/api/attachments/1', alt: 'Ground track' },
        to: { kind: 'image', src: '/api/attachments/2', alt: 'Ground track, 13-day cycle' },
      },
      { op: 'insert', unit: { kind: 'text', text: 'New note.' } },
    ]);
  });

  it('lists a deleted part as deleted when nothing of its kind replaces it', () => {
    expect(compare(doc(p('Keep.'), table([['A'], ['1']])), doc(p('Keep.')))).toEqual([
      { op: 'equal', unit: { kind: 'text', text: 'Keep.' } },
      {
        op: 'delete',
        unit: {
          kind: 'table',
          rows: [
            { header: true, cells: ['A'] },
            { header: false, cells: ['1'] },
          ],
        },
      },
    ]);
  });
});
