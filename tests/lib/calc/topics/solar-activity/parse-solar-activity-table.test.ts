/** The analyst's solar-activity CSV: accepted forms, refusals with line and reason, interpolation. */
import { describe, expect, it } from 'vitest';
import {
  interpolateSolarActivity,
  parseSolarActivityTable,
} from '@/lib/calc/topics/solar-activity/parse-solar-activity-table';

const good = [
  '# forecast issued by the programme',
  'date,f107,f107Average,ap',
  '2027-01-01,120,118.5,10',
  '',
  '2027-02-01T00:00:00Z,130,121,14',
].join('\n');

describe('parseSolarActivityTable', () => {
  it('reads a header, comments, blank lines and both date forms', () => {
    const r = parseSolarActivityTable(good);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.rows).toHaveLength(2);
    expect(r.rows[1]).toEqual({ date: new Date('2027-02-01T00:00:00Z'), f107: 130, f107Average: 121, ap: 14 });
  });

  it('accepts CRLF line ends, no header and the header alias f107_mean', () => {
    expect(parseSolarActivityTable('2027-01-01,120,118,10\r\n2027-01-02,121,118,9\r\n').ok).toBe(true);
    expect(parseSolarActivityTable('Date,F107,F107_mean,Ap\n2027-01-01,120,118,10').ok).toBe(true);
  });

  it.each([
    ['date,f107,flux,ap\n2027-01-01,1,1,1', 1, /header must name the columns/],
    ['2027-01-01,120,118', 1, /expected 4 comma-separated values.*got 3/],
    ['2027-01-01,120,118,10\n2027-13-01,120,118,10', 2, /date "2027-13-01" is not an ISO 8601/],
    ['2027-01-01,12O,118,10', 1, /f107 "12O" is not a number/],
    ['2027-01-01,120,5,10', 1, /f107Average 5 is outside 30–1000/],
    ['2027-01-01,120,118,-1', 1, /ap -1 is outside 0–400/],
    ['2027-01-02,120,118,10\n# note\n2027-01-01,120,118,10', 3, /does not follow the previous row/],
    ['2027-01-01,120,118,10\n2027-01-01,121,118,10', 2, /dates must increase/],
    ['# only a comment\n\n', 3, /no data rows/],
    ['2027-01-01,1e999,118,10', 1, /not a finite number/],
  ])('refuses %j at line %d', (text, line, reason) => {
    const r = parseSolarActivityTable(text);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.line).toBe(line);
    expect(r.reason).toMatch(reason);
  });

  it('interpolates linearly in time and refuses dates outside the table', () => {
    const r = parseSolarActivityTable(good);
    if (!r.ok) throw new Error(r.reason);
    const mid = new Date((Date.parse('2027-01-01T00:00:00Z') + Date.parse('2027-02-01T00:00:00Z')) / 2);
    expect(interpolateSolarActivity(r.rows, mid)).toEqual({ f107: 125, f107Average: 119.75, ap: 12 });
    expect(interpolateSolarActivity(r.rows, new Date('2026-12-31T00:00:00Z'))).toBeUndefined();
    expect(interpolateSolarActivity(r.rows, new Date('2027-02-01T00:00:01Z'))).toBeUndefined();
    expect(interpolateSolarActivity(r.rows, new Date('2027-02-01T00:00:00Z'))).toEqual({
      f107: 130,
      f107Average: 121,
      ap: 14,
    });
  });
});
