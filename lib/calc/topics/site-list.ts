/**
 * A list of ground sites (stations or targets) as CSV text: one header line naming
 * the columns, then one site per line. Columns (any order, case and spaces
 * ignored): name; latitude and longitude [deg, geodetic, WGS-84]; altitude above the
 * ellipsoid [m, or km when the header says "(km)"]; minimum elevation [deg].
 * Fields are separated by commas; a field may be quoted ("…", "" for a quote).
 * Every problem is a CalcInputError on `field` naming the line and column.
 */
import { CalcInputError } from '../types';

export interface Site {
  name: string;
  latDeg: number;
  lonDeg: number;
  altitudeKm: number;
  minElevationDeg: number;
  /** Line of the CSV text (1-based). */
  line: number;
}

export const SITE_LIST_LIMITS = { maxChars: 20_000, maxSites: 50, maxNameChars: 60 } as const;

const COLUMNS: Record<string, 'name' | 'lat' | 'lon' | 'alt' | 'minEl'> = {
  name: 'name',
  site: 'name',
  station: 'name',
  latitude: 'lat',
  lat: 'lat',
  latitudedeg: 'lat',
  longitude: 'lon',
  lon: 'lon',
  long: 'lon',
  longitudedeg: 'lon',
  altitude: 'alt',
  alt: 'alt',
  altitudem: 'alt',
  altitudekm: 'alt',
  height: 'alt',
  minimumelevation: 'minEl',
  minelevation: 'minEl',
  minelevationdeg: 'minEl',
  elevationmask: 'minEl',
  minimumelevationdeg: 'minEl',
};
const LABEL = { name: 'name', lat: 'latitude', lon: 'longitude', alt: 'altitude', minEl: 'minimum elevation' } as const;

/** Splits one CSV line (RFC 4180 quoting, no line breaks inside fields). */
function splitCsvLine(text: string, line: number, field: string): string[] {
  const out: string[] = [];
  let cur = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') {
        cur += '"';
        i++;
      } else if (c === '"') quoted = false;
      else cur += c;
    } else if (c === '"' && cur.trim() === '') {
      quoted = true;
      cur = '';
    } else if (c === ',') {
      out.push(cur.trim());
      cur = '';
    } else cur += c;
  }
  if (quoted) throw new CalcInputError(field, `line ${line}: a quoted field is not closed`);
  out.push(cur.trim());
  return out;
}

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

export function parseSiteList(text: string, field = 'sites'): Site[] {
  if (text.length > SITE_LIST_LIMITS.maxChars)
    throw new CalcInputError(
      field,
      `the site list has ${text.length} characters; at most ${SITE_LIST_LIMITS.maxChars} are accepted`,
    );
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\r|\n/);
  const first = lines.findIndex((l) => l.trim() !== '' && !l.trim().startsWith('#'));
  if (first < 0)
    throw new CalcInputError(
      field,
      'the site list is empty: give a header line (name, latitude, longitude, altitude, minimum elevation) and one line per site',
    );
  const header = splitCsvLine(lines[first], first + 1, field);
  const index: Partial<Record<keyof typeof LABEL, number>> = {};
  let altitudeInKm = false;
  header.forEach((h, i) => {
    const key = h
      .toLowerCase()
      .replace(/\(km\)/, 'km')
      .replace(/\(m\)/, 'm')
      .replace(/\(deg\)|\(°\)/, 'deg')
      .replace(/[\s_()-]+/g, '');
    const col = COLUMNS[key];
    if (!col)
      throw new CalcInputError(
        field,
        `line ${first + 1}: column "${h.slice(0, 30)}" is not one of name, latitude, longitude, altitude, minimum elevation`,
      );
    if (index[col] !== undefined)
      throw new CalcInputError(field, `line ${first + 1}: column ${LABEL[col]} appears twice`);
    index[col] = i;
    if (col === 'alt') altitudeInKm = key.endsWith('km');
  });
  for (const col of Object.keys(LABEL) as (keyof typeof LABEL)[]) {
    if (index[col] === undefined)
      throw new CalcInputError(field, `line ${first + 1}: the header has no ${LABEL[col]} column`);
  }
  const sites: Site[] = [];
  const names = new Map<string, number>();
  for (let k = first + 1; k < lines.length; k++) {
    const raw = lines[k].trim();
    if (raw === '' || raw.startsWith('#')) continue;
    const line = k + 1;
    const cells = splitCsvLine(raw, line, field);
    if (cells.length !== header.length)
      throw new CalcInputError(field, `line ${line}: ${cells.length} fields where the header has ${header.length}`);
    const num = (col: 'lat' | 'lon' | 'alt' | 'minEl', min: number, max: number, unit: string): number => {
      const i = index[col];
      if (i === undefined) throw new Error(`site list: no index for column ${col}`);
      const t = cells[i];
      if (!NUMBER.test(t))
        throw new CalcInputError(field, `line ${line}, ${LABEL[col]}: "${t.slice(0, 30)}" is not a number`);
      const v = Number(t);
      if (v < min || v > max)
        throw new CalcInputError(field, `line ${line}, ${LABEL[col]}: ${t} ${unit} is outside ${min} … ${max} ${unit}`);
      return v;
    };
    if (index.name === undefined) throw new Error('site list: no index for column name');
    const name = cells[index.name];
    if (name === '' || name.length > SITE_LIST_LIMITS.maxNameChars)
      throw new CalcInputError(
        field,
        `line ${line}, name: a site needs a name of 1 to ${SITE_LIST_LIMITS.maxNameChars} characters`,
      );
    if (names.has(name))
      throw new CalcInputError(field, `line ${line}, name: "${name}" is already the site of line ${names.get(name)}`);
    names.set(name, line);
    const altitude = altitudeInKm ? num('alt', -0.5, 9, 'km') : num('alt', -500, 9000, 'm');
    sites.push({
      name,
      latDeg: num('lat', -90, 90, 'deg'),
      lonDeg: num('lon', -180, 360, 'deg'),
      altitudeKm: altitudeInKm ? altitude : altitude / 1000,
      minElevationDeg: num('minEl', 0, 85, 'deg'),
      line,
    });
    if (sites.length > SITE_LIST_LIMITS.maxSites)
      throw new CalcInputError(field, `line ${line}: more than ${SITE_LIST_LIMITS.maxSites} sites`);
  }
  if (sites.length === 0) throw new CalcInputError(field, 'the site list has a header but no site');
  return sites;
}
