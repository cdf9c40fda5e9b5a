/** How the PDF prints calc-block inputs: short text as is; a pasted table summarised instead of printed whole. */
import { describe, expect, it } from 'vitest';
import { fingerprint, summariseInputText } from '@/lib/format/summarise-input-text';
import { formatInputValue } from '@/lib/pdf/calc-block-view';

describe('calc block inputs in the PDF', () => {
  it('prints short one-line text and numbers with units unchanged', () => {
    expect(summariseInputText('2027-01-01T00:00:00Z')).toBe('2027-01-01T00:00:00Z');
    expect(formatInputValue(700, 'km')).toBe('700 km');
  });

  it('summarises a pasted table by its data lines, size, first and last rows (comments and blank lines left out)', () => {
    const csv = ['# forecast', 'date,f107,f107Average,ap', '2027-01-01,120,118,10', '', '2027-02-01,130,121,14'].join(
      '\n',
    );
    expect(formatInputValue(csv, null)).toMatch(
      new RegExp(
        `^pasted text, 3 lines \\(${csv.length} characters, fingerprint [0-9a-f]{8}\\); first “date,f107,f107Average,ap”, last “2027-02-01,130,121,14”$`,
      ),
    );
    expect(summariseInputText('x'.repeat(130))).not.toBe(summariseInputText(`${'x'.repeat(129)}y`));
    expect(summariseInputText('x'.repeat(200))).toMatch(
      /^pasted text, 1 line \(200 characters, fingerprint [0-9a-f]{8}\); “x{60}…”$/,
    );
  });

  it('fingerprints with FNV-1a 32-bit: the published test vectors "" → 811c9dc5, "a" → e40c292c, "foobar" → bf9cf968 (from memory; Python recomputation agrees)', () => {
    expect([fingerprint(''), fingerprint('a'), fingerprint('foobar')]).toEqual(['811c9dc5', 'e40c292c', 'bf9cf968']);
  });
});
