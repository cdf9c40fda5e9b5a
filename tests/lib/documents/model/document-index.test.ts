/**
 * The document index: the facts every reader shares, found in one walk.
 * Expected numbers are counted by hand from the documents written out below.
 */
import { describe, expect, it } from 'vitest';
import { buildDocumentIndex, documentIndex } from '@/lib/documents/model/document-index';
import { calc, doc, figure, from, h, p, requirement, table, typed, value } from '@/lib/templates/build-doc';
import { validateMemoContent } from '@/lib/documents/validate-memo-content';
import type { TiptapNode } from '@/lib/memos/memo-schema';

describe('buildDocumentIndex', () => {
  it('numbers headings 1, 1.1, 1.1.1 in document order, restarting the deeper levels', () => {
    const d = doc(
      h(2, 'Before any chapter'),
      h(1, 'Orbit'),
      h(2, 'Altitude'),
      h(3, 'Drag'),
      h(2, 'Inclination'),
      h(1, 'Disposal'),
      h(3, 'Deep'),
    );
    const numbers = [...buildDocumentIndex(d).headings.values()].map((i) => i.number);
    expect(numbers).toEqual(['0.1', '1', '1.1', '1.1.1', '1.2', '2', '2.0.1']);
    expect(buildDocumentIndex(d).headings.get(d.content[2])).toEqual({ id: 'h-1-1', number: '1.1', level: 2 });
  });

  it('numbers figures by document order, a repeated figure id once (first wins), and tables by order', () => {
    const t1 = table(['a'], [['1']]);
    const t2 = table(['b'], [['2']]);
    const d = doc(
      figure('fa', 'altitude-decay', 'x', 'A'),
      t1,
      p('text'),
      figure('fb', 'eclipse-season', 'y', 'B'),
      figure('fa', 'altitude-decay', 'x', 'again'),
      t2,
    );
    const index = buildDocumentIndex(d);
    expect([...index.figureNumbers]).toEqual([
      ['fa', 1],
      ['fb', 2],
    ]);
    expect(index.figures.map((f) => f.caption)).toEqual(['A', 'B']);
    expect(index.tableNumbers.get(t1)).toBe(1);
    expect(index.tableNumbers.get(t2)).toBe(2);
  });

  it('lists calc blocks in document order with their dependencies and evaluation order; reports duplicates and malformed blocks', () => {
    const d = doc(
      calc('sso', 'sso-inclination', 'SSO', { altitudeKm: from('repeat', 'altitudeKm') }),
      calc('repeat', 'repeat-ground-track', 'Repeat', { revolutions: typed('14') }),
      calc('sso', 'sso-inclination', 'Copy', {}),
      { type: 'calcBlock', attrs: { blockId: 'bad id!', kind: 'sso-inclination' } },
      p('The inclination is ', value('sso', 'inclinationDeg'), '.'),
    );
    const index = buildDocumentIndex(d);
    expect(index.calc.blocks.map((b) => b.blockId)).toEqual(['sso', 'repeat']);
    expect(index.calc.duplicates).toEqual(['sso']);
    expect(index.calc.invalid).toHaveLength(1);
    expect(index.calc.invalid[0].index).toBe(3);
    expect(index.blockOrder.order).toEqual(['repeat', 'sso']);
    expect([...(index.blockOrder.dependsOn.get('sso') ?? [])]).toEqual(['repeat']);
    expect(index.liveValues).toEqual([{ blockId: 'sso', output: 'inclinationDeg' }]);
  });

  it('lists requirements by id in document order (a repeated id once, first wins); a save with a repeated id is refused', () => {
    const d = doc(
      requirement('REQ-ORB-002', 'Second stated first', ['b', 'x'], 'le', '1'),
      requirement('REQ-ORB-001', 'First', ['b', 'x'], 'ge', '2'),
      requirement('REQ-ORB-002', 'Copy', ['b', 'x'], 'le', '3'),
    );
    expect(buildDocumentIndex(d).requirements.map((r) => [r.requirementId, r.text])).toEqual([
      ['REQ-ORB-002', 'Second stated first'],
      ['REQ-ORB-001', 'First'],
    ]);
    const checked = validateMemoContent(d, { attachmentUrls: new Set(), linkTargets: 'allow-list' });
    expect(checked.ok).toBe(false);
    expect(checked.ok ? '' : checked.problem.message).toMatch(/id "REQ-ORB-002" at content\[2\] is already used/);
  });

  it('collects image sources once each', () => {
    const img = (src: string): TiptapNode => ({ type: 'image', attrs: { src } });
    expect([...buildDocumentIndex(doc(img('/a.png'), img('/b.png'), img('/a.png'))).imageSources]).toEqual([
      '/a.png',
      '/b.png',
    ]);
  });
});

describe('documentIndex', () => {
  it('builds once per document object and again for a new document', () => {
    const d = doc(h(1, 'One'));
    expect(documentIndex(d)).toBe(documentIndex(d));
    expect(documentIndex(doc(h(1, 'One')))).not.toBe(documentIndex(d));
  });
});
