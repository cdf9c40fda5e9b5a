import { describe, expect, it } from 'vitest';
import { runCalc } from '@/lib/calc';
import { evaluateDocument } from '@/lib/documents/evaluate-document';
import { documentIndex } from '@/lib/documents/model/document-index';
import { calc, doc, from, p, typed, value } from '@/lib/templates/build-doc';
import { MEMO_TEMPLATES } from '@/lib/templates';

describe('evaluateDocument (server recomputation of every block, in dependency order)', () => {
  it('feeds one block’s output into another: the chained result equals a direct engine call', () => {
    const d = doc(
      calc('sso', 'sso-inclination', 'SSO', { altitudeKm: from('repeat', 'altitudeKm') }),
      calc('repeat', 'repeat-orbit', 'Repeat', { revolutions: typed('233'), days: typed('16') }),
    );
    const ev = evaluateDocument(d);
    const repeat = ev.get('repeat');
    const sso = ev.get('sso');
    expect(repeat?.status).toBe('ok');
    expect(sso?.status).toBe('ok');
    if (repeat?.status !== 'ok' || sso?.status !== 'ok') return;
    const altitude = repeat.result.outputs.altitudeKm as number;
    // Landsat WRS-2 grid: 233 revolutions in 16 days at about 705 km mean altitude
    // (Landsat 8 Data Users Handbook, USGS, 2019, section 2); our J2 mean altitude is within 10 km of it.
    expect(altitude).toBeGreaterThan(695);
    expect(altitude).toBeLessThan(712);
    const direct = runCalc('sso-inclination', { altitudeKm: altitude });
    expect(direct.ok && direct.result.outputs.inclinationDeg).toBe(sso.result.outputs.inclinationDeg);
  });

  it('reports a cycle on each of its blocks by name, and field errors for bad typed input', () => {
    const d = doc(
      calc('a', 'sso-inclination', 'Loop A', { altitudeKm: from('b', 'semiMajorAxisKm') }),
      calc('b', 'sso-inclination', 'Loop B', { altitudeKm: from('a', 'semiMajorAxisKm') }),
      calc('c', 'sso-inclination', 'Typo', { altitudeKm: typed('seven hundred') }),
      calc('d', 'sso-inclination', 'Too low', { altitudeKm: typed('50 km') }),
    );
    const ev = evaluateDocument(d);
    expect(ev.get('a')).toMatchObject({
      status: 'error',
      error: expect.stringMatching(/“Loop A” → “Loop B” → “Loop A”/),
    });
    expect(ev.get('c')).toMatchObject({
      status: 'error',
      fields: { altitudeKm: expect.stringMatching(/not a number with a unit/) },
    });
    expect(ev.get('d')).toMatchObject({ status: 'error', fields: { altitudeKm: expect.any(String) } });
  });

  it('live values keep pointing at their block; a removed block leaves them detectably broken', () => {
    const d = doc(
      p('Inclination ', value('gone', 'inclinationDeg'), '.'),
      calc('sso', 'sso-inclination', 'SSO', { altitudeKm: typed('700') }),
    );
    const values = documentIndex(d).liveValues;
    const ev = evaluateDocument(d);
    expect(values).toEqual([{ blockId: 'gone', output: 'inclinationDeg' }]);
    expect(ev.has('gone')).toBe(false);
  });

  it('every template computes every block without error', () => {
    for (const t of MEMO_TEMPLATES) {
      const ev = evaluateDocument(t.build());
      const failed = [...ev.values()]
        .filter((e) => e.status !== 'ok')
        .map((e) => `${t.id}/${e.blockId}: ${e.status === 'error' ? e.error : ''}`);
      expect(failed, t.id).toEqual([]);
      // Every live value in a template points at a block and an output that exist.
      for (const v of documentIndex(t.build()).liveValues) {
        const e = ev.get(v.blockId);
        expect(e?.status === 'ok' && v.output in e.result.outputs, `${t.id}: ${v.blockId}.${v.output}`).toBe(true);
      }
    }
  });
});
