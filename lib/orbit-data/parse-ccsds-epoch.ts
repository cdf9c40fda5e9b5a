import { OrbitMessageError } from './orbit-message-types';

/** YYYY-MM-DDThh:mm:ss[.d…][Z] or YYYY-DDDThh:mm:ss[.d…][Z] (CCSDS 502.0-B-3 §7.5.10, as quoted in its annex F6; ASCII time codes A and B of CCSDS 301.0-B, from memory). */
const CALENDAR = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2}):(\d{2})(?:\.(\d{1,12}))?Z?$/;
const DAY_OF_YEAR = /^(\d{4})-(\d{3})T(\d{2}):(\d{2}):(\d{2})(?:\.(\d{1,12}))?Z?$/;

/** Years the engine's time functions accept (as lib/calc/fields EPOCH_MIN_YEAR…EPOCH_MAX_YEAR). */
const MIN_YEAR = 1900;
const MAX_YEAR = 2100;

/**
 * Reads a CCSDS epoch (UTC) as a Date, to the millisecond (finer digits are kept
 * by the caller in the text). A leap second (ss = 60) is refused: JavaScript
 * dates have none, and a state at a leap second would land one second off.
 * Throws OrbitMessageError naming the line and keyword.
 */
export function parseCcsdsEpoch(text: string, line: number, keyword: string): Date {
  const t = text.trim();
  let year: number;
  let month0: number;
  let day: number;
  let hh: number;
  let mm: number;
  let ss: number;
  let frac: string | undefined;
  const cal = CALENDAR.exec(t);
  const doy = cal ? null : DAY_OF_YEAR.exec(t);
  if (cal) {
    [year, month0, day, hh, mm, ss] = [
      Number(cal[1]),
      Number(cal[2]) - 1,
      Number(cal[3]),
      Number(cal[4]),
      Number(cal[5]),
      Number(cal[6]),
    ];
    frac = cal[7];
  } else if (doy) {
    [year, hh, mm, ss] = [Number(doy[1]), Number(doy[3]), Number(doy[4]), Number(doy[5])];
    const dayOfYear = Number(doy[2]);
    const leap = (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
    if (dayOfYear < 1 || dayOfYear > (leap ? 366 : 365))
      throw new OrbitMessageError(line, keyword, `day of year ${doy[2]} does not exist in ${year}`);
    month0 = 0;
    day = dayOfYear;
    frac = doy[6];
  } else {
    throw new OrbitMessageError(
      line,
      keyword,
      `"${t.slice(0, 40)}" is not a CCSDS epoch (YYYY-MM-DDThh:mm:ss[.d…] or YYYY-DDDThh:mm:ss[.d…], UTC)`,
    );
  }
  if (year < MIN_YEAR || year > MAX_YEAR)
    throw new OrbitMessageError(line, keyword, `year ${year} is outside ${MIN_YEAR}–${MAX_YEAR}`);
  if (ss === 60) throw new OrbitMessageError(line, keyword, 'a leap second (ss = 60) is not accepted');
  if (hh > 23 || mm > 59 || ss > 59)
    throw new OrbitMessageError(line, keyword, `"${t.slice(0, 40)}" has an hour, minute or second out of range`);
  const ms = Date.UTC(year, month0, day, hh, mm, ss) + (frac ? Number(`${frac}00`.slice(0, 3)) : 0);
  const date = new Date(ms);
  if (cal && (date.getUTCMonth() !== month0 || date.getUTCDate() !== day))
    throw new OrbitMessageError(line, keyword, `${t.slice(0, 10)} is not a calendar date`);
  return date;
}
