import { describe, expect, it } from 'vitest';
import { parseTleList, tleChecksum } from '@/lib/calc/topics/tle';
import { CalcInputError } from '@/lib/calc/types';

/**
 * The example on CelesTrak's "NORAD Two-Line Element Set Format" page (T. S. Kelso,
 * celestrak.com/NORAD/documentation/tle-fmt.php): NOAA 14, checksums 1 and 5.
 * The page as stored lost its column spacing; the checksum does not depend on it
 * (blanks count 0), and the columns here are set by the page's own column table.
 */
const NOAA_14 = [
  'NOAA 14',
  '1 23455U 94089A   97320.90946019  .00000140  00000-0  10191-3 0  2621',
  '2 23455  99.0090 272.6745 0008546 223.1686 136.8816 14.11711747148495',
].join('\n');

/** Satellite 00005 of Vallado et al. 2006 (AIAA 2006-6753), the first case of its verification set SGP4-VER.TLE. */
const SAT_00005 = [
  '1 00005U 58002B   00179.78495062  .00000023  00000-0  28098-4 0  4753',
  '2 00005  34.2682 348.7242 1859667 331.7664  19.3264 10.82419157413667',
];

function errorOf(text: string): string {
  try {
    parseTleList(text);
  } catch (e) {
    expect(e).toBeInstanceOf(CalcInputError);
    return (e as Error).message;
  }
  throw new Error('expected a refusal');
}

describe('TLE checksum and format (CelesTrak format page)', () => {
  it('the published NOAA 14 example: checksums 1 and 5 as printed in column 69, fields as the page describes them', () => {
    const [l1, l2] = NOAA_14.split('\n').slice(1);
    expect(tleChecksum(l1)).toBe(1);
    expect(tleChecksum(l2)).toBe(5);
    const [set] = parseTleList(NOAA_14);
    expect(set).toMatchObject({
      name: 'NOAA 14',
      satelliteNumber: '23455',
      internationalDesignator: '94089A',
      inclinationDeg: 99.009,
      raanDeg: 272.6745,
      eccentricity: 0.0008546,
      meanMotionRevPerDay: 14.11711747,
    });
    // epoch 97320.90946019: day 320 of 1997 (16 November), 0.90946019 d = 21:49:37.36 UTC
    expect(set.epoch.toISOString()).toBe('1997-11-16T21:49:37.360Z');
    expect(set.bstar).toBeCloseTo(0.10191e-3, 12);
  });

  it('Vallado et al. 2006 satellite 00005: checksums 3 and 7; a two-digit year 00 is 2000', () => {
    expect(tleChecksum(SAT_00005[0])).toBe(3);
    expect(tleChecksum(SAT_00005[1])).toBe(7);
    expect(parseTleList(SAT_00005.join('\n'))[0].epoch.getUTCFullYear()).toBe(2000);
  });

  it('names a wrong checksum: text line, TLE line and set, expected and found', () => {
    expect(errorOf(NOAA_14.replace('2621', '2622'))).toBe(
      'text line 2 (line 1 of TLE set 1): checksum (column 69) is 2, expected 1 from columns 1–68: the line was altered or mistyped',
    );
    // one digit changed in the inclination: the checksum catches it
    expect(errorOf(NOAA_14.replace('99.0090', '99.0190'))).toMatch(
      /^text line 3 \(line 2 of TLE set 1\): checksum \(column 69\) is 5, expected 6/,
    );
  });

  it('names a short line, a misplaced field, a mismatched satellite number and a missing line 2', () => {
    expect(errorOf(NOAA_14.replace('2621', '262'))).toMatch(
      /^text line 2 \(line 1 of TLE set 1\): 68 characters; a TLE line has exactly 69/,
    );
    const shifted = '2 23455 99.0090  272.6745 0008546 223.1686 136.8816 14.11711747148495';
    expect(errorOf(`${NOAA_14.split('\n')[1]}\n${shifted.slice(0, 68)}${tleChecksum(shifted)}`)).toBe(
      'text line 2 (line 2 of TLE set 1): columns 9–16 (inclination, deg) read "99.0090 ", expected a decimal number',
    );
    const other = SAT_00005[1].replace('00005', '00006');
    expect(errorOf(`${SAT_00005[0]}\n${other.slice(0, 68)}${tleChecksum(other)}`)).toMatch(
      /columns 3–7 \(satellite number\) read 00006, but line 1 of the set says 00005/,
    );
    expect(errorOf(SAT_00005[0])).toBe(
      'the end of the text: expected line 2 of TLE set 1 (starting "2 ") after its line 1 on text line 1',
    );
    expect(errorOf('hello')).toMatch(/expected line 1 of TLE set 1/);
    expect(errorOf('')).toMatch(/no TLE/);
  });

  it('reads several sets of one satellite with and without names and blank lines between; refuses two satellites', () => {
    const sets = parseTleList(`\n${SAT_00005.join('\n')}\n\nVANGUARD 1\n${SAT_00005.join('\r\n')}  \n`);
    expect(sets.map((s) => [s.index, s.name])).toEqual([
      [1, null],
      [2, 'VANGUARD 1'],
    ]);
    expect(errorOf(`${SAT_00005.join('\n')}\n${NOAA_14}`)).toBe(
      'TLE set 2 is satellite 23455 but set 1 is 00005: paste the element sets of one satellite',
    );
  });
});
