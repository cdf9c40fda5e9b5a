/**
 * Reading two-line element sets (TLEs), with every format and checksum error
 * named by text line, TLE line, columns and field.
 *
 * Format and checksum rule: T. S. Kelso, CelesTrak, "NORAD Two-Line Element Set
 * Format" (celestrak.com/NORAD/documentation/tle-fmt.php): 69 columns per line;
 * column 69 is the sum of the digits of columns 1–68 modulo 10, a minus sign
 * counting 1 and letters, blanks, periods and plus signs 0. An optional name
 * line (up to 24 characters, sometimes written "0 NAME") may precede line 1.
 * Two-digit epoch years: 57–99 → 1957–1999, 00–56 → 2000–2056 (the rule of
 * Spacetrack Report #3, as in Vallado et al. 2006).
 *
 * Pure: no SGP4 here. `tle-check` hands the two lines to satellite.js.
 */
import { CalcInputError } from '../types';

export interface TleSet {
  /** 1-based position of the set in the pasted text */
  index: number;
  /** name line, when one preceded line 1 */
  name: string | null;
  satelliteNumber: string;
  internationalDesignator: string;
  epoch: Date;
  inclinationDeg: number;
  raanDeg: number;
  eccentricity: number;
  argPerigeeDeg: number;
  meanAnomalyDeg: number;
  meanMotionRevPerDay: number;
  /** B* drag term [1/earth radii] */
  bstar: number;
  line1: string;
  line2: string;
}

/** Most element sets read from one input (a list of one satellite's TLEs over its life). */
export const MAX_TLE_SETS = 200;
const LINE_LENGTH = 69;
const MAX_NAME_LENGTH = 24;

/** The TLE checksum of a line's first 68 columns (CelesTrak's rule). */
export function tleChecksum(line: string): number {
  let sum = 0;
  for (const ch of line.slice(0, LINE_LENGTH - 1)) {
    if (ch >= '0' && ch <= '9') sum += ch.charCodeAt(0) - 48;
    else if (ch === '-') sum += 1;
  }
  return sum % 10;
}

interface TextLine {
  /** 1-based line number in the pasted text */
  at: number;
  text: string;
}

class LineReader {
  constructor(
    private readonly line: TextLine,
    private readonly tleLine: 1 | 2,
    private readonly setIndex: number,
  ) {}

  where(): string {
    return `text line ${this.line.at} (line ${this.tleLine} of TLE set ${this.setIndex})`;
  }

  fail(message: string): never {
    throw new CalcInputError('tle', `${this.where()}: ${message}`);
  }

  /** Columns first…last (1-based, inclusive) checked against a pattern; the field named in the error. */
  field(first: number, last: number, name: string, pattern: RegExp, expected: string): string {
    const raw = this.line.text.slice(first - 1, last);
    if (!pattern.test(raw))
      this.fail(`columns ${first}–${last} (${name}) read ${JSON.stringify(raw)}, expected ${expected}`);
    return raw;
  }

  number(first: number, last: number, name: string, min: number, max: number, maxInclusive = true): number {
    const raw = this.field(first, last, name, /^ *[0-9]+(\.[0-9]*)?$|^ *\.[0-9]+$/, 'a decimal number');
    const value = Number(raw.trim());
    if (!(value >= min && (maxInclusive ? value <= max : value < max)))
      this.fail(`columns ${first}–${last} (${name}) is ${value}, outside ${min}–${max}`);
    return value;
  }
}

/** "+12345-4" style (assumed leading decimal point, signed exponent) → number. */
function assumedDecimal(raw: string): number {
  const sign = raw[0] === '-' ? -1 : 1;
  const mantissa = Number(`0.${raw.slice(1, 6)}`);
  const exponent = Number(raw.slice(6, 8));
  return sign * mantissa * 10 ** exponent;
}

function checkLine(reader: LineReader, line: TextLine, number: '1' | '2'): void {
  if (line.text.length !== LINE_LENGTH)
    reader.fail(
      `${line.text.length} characters; a TLE line has exactly ${LINE_LENGTH} (columns 1–69, the checksum last)`,
    );
  if (line.text[0] !== number)
    reader.fail(`column 1 is ${JSON.stringify(line.text[0])}, expected the line number ${number}`);
  const found = line.text[LINE_LENGTH - 1];
  if (!/[0-9]/.test(found)) reader.fail(`column 69 (checksum) is ${JSON.stringify(found)}, expected a digit`);
  const expected = tleChecksum(line.text);
  if (Number(found) !== expected)
    reader.fail(
      `checksum (column 69) is ${found}, expected ${expected} from columns 1–68: the line was altered or mistyped`,
    );
}

function readSet(name: TextLine | null, l1: TextLine, l2: TextLine, index: number): TleSet {
  const r1 = new LineReader(l1, 1, index);
  const r2 = new LineReader(l2, 2, index);
  checkLine(r1, l1, '1');
  checkLine(r2, l2, '2');
  const satelliteNumber = r1
    .field(3, 7, 'satellite number', /^[0-9A-Z ][0-9 ]{3}[0-9]$/, 'a catalogue number of 5 characters')
    .trim();
  r1.field(8, 8, 'classification', /^[UCS ]$/, 'U, C or S');
  const designator = r1
    .field(10, 17, 'international designator', /^[0-9A-Z ]{8}$/, 'launch year, number and piece')
    .trim();
  const yy = Number(r1.field(19, 20, 'epoch year', /^[0-9]{2}$/, 'two digits'));
  const dayOfYear = Number(r1.field(21, 32, 'epoch day of year', /^[ 0-9]{3}\.[0-9]{8}$/, 'ddd.dddddddd').trim());
  if (!(dayOfYear >= 1 && dayOfYear < 367))
    r1.fail(`columns 21–32 (epoch day of year) is ${dayOfYear}, outside 1–366.99999999`);
  r1.field(34, 43, 'first derivative of mean motion', /^[ +-]\.[0-9]{8}$/, '±.dddddddd');
  r1.field(45, 52, 'second derivative of mean motion', /^[ +-][0-9]{5}[+-][0-9]$/, '±ddddd±d (assumed decimal point)');
  const bstar = assumedDecimal(
    r1.field(54, 61, 'B* drag term', /^[ +-][0-9]{5}[+-][0-9]$/, '±ddddd±d (assumed decimal point)'),
  );
  r1.field(63, 63, 'ephemeris type', /^[0-9 ]$/, 'a digit');
  r1.field(65, 68, 'element set number', /^ *[0-9]+$/, 'digits');

  const satelliteNumber2 = r2
    .field(3, 7, 'satellite number', /^[0-9A-Z ][0-9 ]{3}[0-9]$/, 'a catalogue number of 5 characters')
    .trim();
  if (satelliteNumber2 !== satelliteNumber)
    r2.fail(`columns 3–7 (satellite number) read ${satelliteNumber2}, but line 1 of the set says ${satelliteNumber}`);
  const inclinationDeg = r2.number(9, 16, 'inclination, deg', 0, 180);
  const raanDeg = r2.number(18, 25, 'right ascension of the ascending node, deg', 0, 360, false);
  const eccentricity = Number(
    `0.${r2.field(27, 33, 'eccentricity', /^[0-9]{7}$/, 'seven digits (assumed leading decimal point)')}`,
  );
  const argPerigeeDeg = r2.number(35, 42, 'argument of perigee, deg', 0, 360, false);
  const meanAnomalyDeg = r2.number(44, 51, 'mean anomaly, deg', 0, 360, false);
  const meanMotionRevPerDay = r2.number(53, 63, 'mean motion, rev/day', 0.05, 20);
  r2.field(64, 68, 'revolution number at epoch', /^ *[0-9]+$/, 'digits');

  const year = yy < 57 ? 2000 + yy : 1900 + yy;
  const epoch = new Date(Date.UTC(year, 0, 1) + (dayOfYear - 1) * 86400000);
  if (epoch.getUTCFullYear() !== year)
    r1.fail(`columns 21–32 (epoch day of year) ${dayOfYear} is past the end of ${year}`);
  const nameText = name ? name.text.replace(/^0 /, '').trim() : null;
  return {
    index,
    name: nameText,
    satelliteNumber,
    internationalDesignator: designator,
    epoch,
    inclinationDeg,
    raanDeg,
    eccentricity,
    argPerigeeDeg,
    meanAnomalyDeg,
    meanMotionRevPerDay,
    bstar,
    line1: l1.text,
    line2: l2.text,
  };
}

const isLine1 = (t: string) => t.startsWith('1 ');
const isLine2 = (t: string) => t.startsWith('2 ');

/**
 * Reads one or more TLEs (two lines, or three with a name line) pasted one
 * after another; blank lines and trailing spaces are ignored. Throws
 * CalcInputError('tle', …) naming the first problem: which text line, which
 * line of which set, which columns and field; checksum expected vs found.
 */
export function parseTleList(text: string): TleSet[] {
  const lines: TextLine[] = text
    .split(/\r\n|\r|\n/)
    .map((t, i) => ({ at: i + 1, text: t.replace(/\s+$/, '') }))
    .filter((l) => l.text !== '');
  if (lines.length === 0)
    throw new CalcInputError('tle', 'no TLE: paste two lines (or three with a name line) starting "1 " and "2 "');
  const sets: TleSet[] = [];
  let k = 0;
  while (k < lines.length) {
    const index = sets.length + 1;
    let name: TextLine | null = null;
    if (!isLine1(lines[k].text) && !isLine2(lines[k].text)) {
      name = lines[k];
      if (name.text.length > MAX_NAME_LENGTH + 2) {
        throw new CalcInputError(
          'tle',
          `text line ${name.at}: neither a TLE line (starting "1 " or "2 ") nor a name line of at most ${MAX_NAME_LENGTH} characters`,
        );
      }
      k++;
    }
    const l1 = lines[k];
    if (!l1 || !isLine1(l1.text)) {
      const at = l1 ? `text line ${l1.at}` : 'the end of the text';
      throw new CalcInputError(
        'tle',
        `${at}: expected line 1 of TLE set ${index} (starting "1 ")${name ? ` after its name on text line ${name.at}` : ''}`,
      );
    }
    const l2 = lines[k + 1];
    if (!l2 || !isLine2(l2.text)) {
      const at = l2 ? `text line ${l2.at}` : 'the end of the text';
      throw new CalcInputError(
        'tle',
        `${at}: expected line 2 of TLE set ${index} (starting "2 ") after its line 1 on text line ${l1.at}`,
      );
    }
    sets.push(readSet(name, l1, l2, index));
    if (sets.length > MAX_TLE_SETS)
      throw new CalcInputError('tle', `more than ${MAX_TLE_SETS} element sets; paste at most ${MAX_TLE_SETS}`);
    k += 2;
  }
  const first = sets[0];
  const other = sets.find((s) => s.satelliteNumber !== first.satelliteNumber);
  if (other) {
    throw new CalcInputError(
      'tle',
      `TLE set ${other.index} is satellite ${other.satelliteNumber} but set 1 is ${first.satelliteNumber}: paste the element sets of one satellite`,
    );
  }
  return sets;
}
