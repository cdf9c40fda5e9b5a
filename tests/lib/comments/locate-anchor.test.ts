import { describe, expect, it } from 'vitest';
import { locateAnchor } from '@/lib/comments/locate-anchor';
import { buildAnchor } from '@/lib/comments/build-anchor';
import { findApproximateMatches } from '@/lib/comments/find-approximate-matches';
import { editDistance, measureSimilarity } from '@/lib/comments/measure-similarity';

/**
 * Re-attaching a thread to its passage after the memo is edited. The text
 * is from the invented TERNLIGHT-1 demo memo; each case edits it the way
 * an analyst would and states where the passage must be found.
 */

const MEMO = [
  'Repeat ground track',
  'Exact repeat cycles between 600 km and 800 km with at most 16 days are listed first; the design adopts the 12-day cycle of 175 revolutions.',
  'Coverage',
  'With the 240 km swath the sidelap at the equator is 9.3 %; the smallest gap-free swath would be 219 km.',
  'Drag and maintenance',
  'The orbit decays by 2.1 m/day without manoeuvres; holding it costs about 3.4 m/s per year.',
].join('\n');

const QUOTE = 'the design adopts the 12-day cycle of 175 revolutions';

function anchorOn(text: string, quote: string, occurrence = 0) {
  let at = -1;
  for (let i = 0; i <= occurrence; i++) at = text.indexOf(quote, at + 1);
  if (at < 0) throw new Error(`quote not in text: ${quote}`);
  const built = buildAnchor(text, { from: at, to: at + quote.length });
  if (!built.ok) throw new Error(built.reason);
  return built.anchor;
}

const slice = (text: string, r: { from: number; to: number } | null) => (r ? text.slice(r.from, r.to) : null);

describe('edit distance (Wagner–Fischer)', () => {
  it('counts insertions, deletions and substitutions', () => {
    // kitten → sitting: 2 substitutions and 1 insertion (the textbook example).
    expect(editDistance('kitten', 'sitting')).toBe(3);
    expect(editDistance('', 'orbit')).toBe(5);
    expect(editDistance('node', 'node')).toBe(0);
    expect(measureSimilarity('abcd', 'abcf')).toBe(0.75);
    expect(measureSimilarity('', '')).toBe(1);
  });
});

describe('approximate matching (Sellers with Ukkonen cut-off)', () => {
  it('finds the edited passage with its start, end and number of edits', () => {
    const text = 'the orbit has a nodal period of 98.8 min and a repeat';
    const m = findApproximateMatches(text, 'nodal periods of', 2);
    expect(m).toEqual([{ from: 16, to: 31, distance: 1 }]);
    expect(text.slice(16, 31)).toBe('nodal period of');
  });
  it('finds nothing beyond the allowed edits', () => {
    expect(findApproximateMatches('ascending node at 22:30', 'descending orbit', 3)).toEqual([]);
  });
  it('reports, for each match, the fewest edits of any substring ending there (checked by brute force)', () => {
    // The cut-off must not change any distance ≤ k (Ukkonen 1985): compare with every substring.
    const text = 'abracadabra cadabra abracad';
    const pattern = 'cadabr';
    const bestEndingAt = (j: number) =>
      Math.min(...Array.from({ length: j + 1 }, (_, i) => editDistance(text.slice(i, j), pattern)));
    for (let k = 0; k <= 3; k++) {
      const got = findApproximateMatches(text, pattern, k);
      const ends = Array.from({ length: text.length }, (_, j) => j + 1).filter((j) => bestEndingAt(j) <= k);
      expect(got.length > 0, `k=${k}`).toBe(ends.length > 0);
      for (const g of got) {
        expect(ends, `k=${k}`).toContain(g.to);
        expect(g.distance, `k=${k} end ${g.to}`).toBe(bestEndingAt(g.to));
        expect(editDistance(text.slice(g.from, g.to), pattern), `k=${k} start of ${g.to}`).toBe(g.distance);
      }
    }
    // k = 0 is exact search: both occurrences of "cadabr".
    expect(findApproximateMatches(text, pattern, 0).map((g) => g.from)).toEqual([4, 12]);
  });
});

describe('locateAnchor', () => {
  const anchor = anchorOn(MEMO, QUOTE);

  it('builds an anchor with 40 characters of context on each side', () => {
    expect(anchor.quote).toBe(QUOTE);
    expect(anchor.prefix).toBe(' with at most 16 days are listed first; ');
    expect(anchor.suffix).toBe('.\nCoverage\nWith the 240 km swath the sid');
    expect(anchor.prefix).toHaveLength(40);
    expect(anchor.suffix).toHaveLength(40);
  });

  it('finds the passage where it was, unchanged', () => {
    const r = locateAnchor(MEMO, anchor);
    expect(r).toEqual({ from: MEMO.indexOf(QUOTE), to: MEMO.indexOf(QUOTE) + QUOTE.length });
  });

  it('follows the passage after text is added before it', () => {
    const edited = 'Purpose and scope\nThis memo records the choice of the operational orbit.\n' + MEMO;
    const r = locateAnchor(edited, anchor);
    expect(r?.from).toBe(MEMO.indexOf(QUOTE) + 73);
    expect(slice(edited, r)).toBe(QUOTE);
  });

  it('follows the passage when the context around it was edited', () => {
    const edited = MEMO.replace('are listed first; ', 'are compared in the table below; ').replace(
      'Coverage',
      'Swath coverage',
    );
    const r = locateAnchor(edited, anchor);
    expect(slice(edited, r)).toBe(QUOTE);
  });

  it('tolerates a small edit inside the quote and covers the edited passage', () => {
    const edited = MEMO.replace('the 12-day cycle of 175 revolutions', 'the 12-day cycle of 176 revolutions');
    expect(slice(edited, locateAnchor(edited, anchor))).toBe('the design adopts the 12-day cycle of 176 revolutions');
    const reworded = MEMO.replace('the design adopts the', 'the design retains the');
    expect(slice(reworded, locateAnchor(reworded, anchor))).toBe(
      'the design retains the 12-day cycle of 175 revolutions',
    );
  });

  it('detaches when the quoted text is deleted', () => {
    const edited = MEMO.replace(' the design adopts the 12-day cycle of 175 revolutions.', '');
    expect(edited).not.toContain('12-day');
    expect(locateAnchor(edited, anchor)).toBeNull();
  });

  it('detaches when the passage is rewritten beyond a quarter of its characters', () => {
    const edited = MEMO.replace(QUOTE, 'the 14-day cycle of 203 revolutions is preferred instead');
    expect(locateAnchor(edited, anchor)).toBeNull();
  });

  it('a short quote must match exactly', () => {
    const km = anchorOn(MEMO, '219 km');
    expect(slice(MEMO, locateAnchor(MEMO, km))).toBe('219 km');
    expect(locateAnchor(MEMO.replace('219 km', '218 km'), km)).toBeNull();
  });

  it('chooses among repeated quotes by context: the second "240 km swath"', () => {
    const text = `${MEMO}\nConclusion\nThe 240 km swath closes the gaps at the equator every 12 days.`;
    const second = anchorOn(text, '240 km swath', 1);
    const first = anchorOn(text, '240 km swath', 0);
    const at1 = text.indexOf('240 km swath');
    const at2 = text.indexOf('240 km swath', at1 + 1);
    expect(locateAnchor(text, second)).toEqual({ from: at2, to: at2 + 12 });
    expect(locateAnchor(text, first)).toEqual({ from: at1, to: at1 + 12 });
    // …and still after the text before both has grown and the context next to the second was touched.
    const edited = 'Revision note.\n' + text.replace('closes the gaps', 'closes all gaps');
    const shift = 'Revision note.\n'.length;
    expect(locateAnchor(edited, second)).toEqual({ from: at2 + shift, to: at2 + shift + 12 });
  });

  it('an empty document or quote is never matched', () => {
    expect(locateAnchor('', anchor)).toBeNull();
    expect(locateAnchor(MEMO, { quote: '', prefix: '', suffix: '' })).toBeNull();
  });

  it('buildAnchor trims white space and refuses an empty selection', () => {
    const at = MEMO.indexOf('Coverage');
    const built = buildAnchor(MEMO, { from: at - 1, to: at + 'Coverage'.length + 1 });
    expect(built.ok && built.anchor.quote).toBe('Coverage');
    expect(buildAnchor(MEMO, { from: at - 1, to: at })).toEqual({
      ok: false,
      reason: 'Select some text to comment on.',
    });
  });
});
