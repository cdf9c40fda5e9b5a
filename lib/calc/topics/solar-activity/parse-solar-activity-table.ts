/**
 * The analyst's own solar-activity table: CSV text with one row per date,
 *   date, f107, f107Average, ap
 * date ISO 8601 UTC (2027-03-01 or 2027-03-01T00:00:00Z); F10.7 daily and 81-day mean in sfu; daily Ap.
 * A header line naming the four columns in this order is allowed (names compared case-insensitively,
 * f107Average may also be written f107_average, f107a or f107_mean); blank lines and lines starting with #
 * are skipped. Dates must increase strictly. Anything else is refused with the line number and the reason.
 * Values between rows are interpolated linearly in time; dates outside the table are refused.
 */
import { parseUtcEpoch } from '../../fields';
import type { SpaceWeather } from '../atmosphere/density-at-epoch';

export interface SolarActivityRow extends SpaceWeather {
  date: Date;
}

export type SolarTableParse = { ok: true; rows: SolarActivityRow[] } | { ok: false; line: number; reason: string };

export const SOLAR_TABLE_MAX_ROWS = 50_000;
/** Longest table text a calc input accepts [characters] (about 3000 rows; a memo holds at most 2 MiB). */
export const SOLAR_TABLE_MAX_CHARS = 100_000;
const F107_RANGE: [number, number] = [30, 1000];
const AP_RANGE: [number, number] = [0, 400];
const HEADER_NAMES = [['date'], ['f107'], ['f107average', 'f107_average', 'f107a', 'f107_mean', 'f107mean'], ['ap']];
const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

function isHeader(cells: string[]): boolean {
  return cells.length === 4 && cells.every((c, k) => HEADER_NAMES[k].includes(c.toLowerCase()));
}

function parseValue(cell: string, name: string, [lo, hi]: [number, number]): number | string {
  if (!NUMBER.test(cell)) return `${name} "${cell}" is not a number`;
  const v = Number(cell);
  if (!Number.isFinite(v)) return `${name} "${cell}" is not a finite number`;
  if (v < lo || v > hi) return `${name} ${cell} is outside ${lo}–${hi}`;
  return v;
}

/** Parse and check a solar-activity CSV table (pure; never throws). */
export function parseSolarActivityTable(text: string): SolarTableParse {
  const lines = text.split(/\r\n|\n|\r/);
  const rows: SolarActivityRow[] = [];
  let seenContent = false;
  for (let k = 0; k < lines.length; k++) {
    const line = k + 1;
    const raw = lines[k].trim();
    if (raw === '' || raw.startsWith('#')) continue;
    const cells = raw.split(',').map((c) => c.trim());
    if (!seenContent) {
      seenContent = true;
      if (isHeader(cells)) continue;
      if (cells.length === 4 && !/^\d/.test(cells[0])) {
        return {
          ok: false,
          line,
          reason: `header must name the columns date, f107, f107Average, ap (got ${cells.join(', ')})`,
        };
      }
    }
    if (cells.length !== 4)
      return {
        ok: false,
        line,
        reason: `expected 4 comma-separated values (date, f107, f107Average, ap), got ${cells.length}`,
      };
    const date = parseUtcEpoch(cells[0]);
    if (!date)
      return { ok: false, line, reason: `date "${cells[0]}" is not an ISO 8601 UTC date between 1900 and 2100` };
    const f107 = parseValue(cells[1], 'f107', F107_RANGE);
    if (typeof f107 === 'string') return { ok: false, line, reason: f107 };
    const f107Average = parseValue(cells[2], 'f107Average', F107_RANGE);
    if (typeof f107Average === 'string') return { ok: false, line, reason: f107Average };
    const ap = parseValue(cells[3], 'ap', AP_RANGE);
    if (typeof ap === 'string') return { ok: false, line, reason: ap };
    const previous = rows[rows.length - 1];
    if (previous && date.getTime() <= previous.date.getTime()) {
      return {
        ok: false,
        line,
        reason: `date ${cells[0]} does not follow the previous row's ${previous.date.toISOString()} (dates must increase)`,
      };
    }
    if (rows.length >= SOLAR_TABLE_MAX_ROWS)
      return { ok: false, line, reason: `more than ${SOLAR_TABLE_MAX_ROWS} rows` };
    rows.push({ date, f107, f107Average, ap });
  }
  if (rows.length === 0) return { ok: false, line: lines.length, reason: 'the table has no data rows' };
  return { ok: true, rows };
}

/** Space weather at a date from a parsed table, linear in time between rows; undefined outside the table. */
export function interpolateSolarActivity(rows: readonly SolarActivityRow[], date: Date): SpaceWeather | undefined {
  const t = date.getTime();
  if (rows.length === 0 || t < rows[0].date.getTime() || t > rows[rows.length - 1].date.getTime()) return undefined;
  let lo = 0;
  let hi = rows.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (rows[mid].date.getTime() <= t) lo = mid;
    else hi = mid;
  }
  const a = rows[lo];
  const b = rows[hi];
  const span = b.date.getTime() - a.date.getTime();
  const w = span > 0 ? (t - a.date.getTime()) / span : 0;
  const mix = (x: number, y: number) => x + (y - x) * w;
  return { f107: mix(a.f107, b.f107), f107Average: mix(a.f107Average, b.f107Average), ap: mix(a.ap, b.ap) };
}
