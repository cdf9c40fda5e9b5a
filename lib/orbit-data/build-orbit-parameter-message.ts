import {
  OrbitMessageError,
  type KvnEntry,
  type KvnItem,
  type OpmKeplerianElements,
  type OpmSpacecraftParameters,
  type OrbitMessageEncoding,
  type OrbitParameterMessage,
} from './orbit-message-types';
import { collectKeywords, requireEntry, type KeywordSection } from './collect-keywords';
import { checkVersionFirst, HEADER_KEYWORDS, readMessageHeader } from './read-message-header';
import { METADATA_KEYWORDS, readOrbitMetadata } from './read-orbit-metadata';
import { readOpmState } from './read-epoch-state';
import { readKvnNumber, type NumberRule } from './read-kvn-number';
import { parseCcsdsEpoch } from './parse-ccsds-epoch';

const STATE = ['EPOCH', 'X', 'Y', 'Z', 'X_DOT', 'Y_DOT', 'Z_DOT'];
const KEPLER = [
  'SEMI_MAJOR_AXIS',
  'ECCENTRICITY',
  'INCLINATION',
  'RA_OF_ASC_NODE',
  'ARG_OF_PERICENTER',
  'TRUE_ANOMALY',
  'MEAN_ANOMALY',
  'GM',
];
const SPACECRAFT = ['MASS', 'SOLAR_RAD_AREA', 'SOLAR_RAD_COEFF', 'DRAG_AREA', 'DRAG_COEFF'];
const COV_ROWS = ['X', 'Y', 'Z', 'X_DOT', 'Y_DOT', 'Z_DOT'];
/** The 21 lower-triangle covariance keywords CX_X … CZ_DOT_Z_DOT (502.0-B-3 table 3-3). */
const COVARIANCE = COV_ROWS.flatMap((row, i) => COV_ROWS.slice(0, i + 1).map((col) => `C${row}_${col}`));
const MANOEUVRE = [
  'MAN_EPOCH_IGNITION',
  'MAN_DURATION',
  'MAN_DELTA_MASS',
  'MAN_REF_FRAME',
  'MAN_DV_1',
  'MAN_DV_2',
  'MAN_DV_3',
];

const ANGLE: NumberRule = { unit: 'deg', min: -360, max: 360 };
const MASS_AREA = (unit: string): NumberRule => ({ unit, min: 0 });

/**
 * Builds and checks an OPM from its items (KVN lines or XML elements mapped to them):
 * header, metadata and the data blocks of 502.0-B-3 table 3-3. The state vector is
 * mandatory; the Keplerian elements come all or none (TRUE_ANOMALY or MEAN_ANOMALY);
 * spacecraft parameters are optional, MASS mandatory when manoeuvres are given
 * (§3.2.4.9); covariance all 21 terms or none; each manoeuvre repeats its 7 keywords
 * (§3.2.4.8). Covariance, manoeuvres and user-defined parameters are checked for
 * form and listed in `notUsed`: the engine does not apply them.
 */
export function buildOrbitParameterMessage(items: KvnItem[], encoding: OrbitMessageEncoding): OrbitParameterMessage {
  checkVersionFirst(items, 'CCSDS_OPM_VERS');
  const [header, metadata, data] = collectKeywords(
    items,
    [
      { name: 'header', keywords: HEADER_KEYWORDS('CCSDS_OPM_VERS') },
      { name: 'metadata', keywords: new Set(METADATA_KEYWORDS) },
      {
        name: 'data',
        keywords: new Set([...STATE, ...KEPLER, ...SPACECRAFT, 'COV_REF_FRAME', ...COVARIANCE, ...MANOEUVRE]),
        repeatable: new Set(MANOEUVRE),
        prefix: 'USER_DEFINED_',
      },
    ],
    'OPM',
  );
  const get = (k: string) => requireEntry(data, k, 'OPM');
  // Checked in reading order: header, metadata, then the data blocks.
  const messageHeader = readMessageHeader(header, 'CCSDS_OPM_VERS', 'OPM');
  const messageMetadata = readOrbitMetadata(metadata, 'OPM');
  const state = readOpmState(get);
  const keplerian = readKeplerian(data);
  const spacecraft = readSpacecraft(data);
  const notUsed: string[] = [];
  const covariance = readCovariance(data);
  if (covariance) notUsed.push(covariance);
  const manoeuvres = readManoeuvres(data);
  if (manoeuvres > 0) {
    requireEntry({ ...data, name: 'spacecraft parameters (mandatory with manoeuvres)' }, 'MASS', 'OPM');
    notUsed.push(`${manoeuvres} manoeuvre${manoeuvres === 1 ? '' : 's'} (not applied)`);
  }
  const userDefined = [...data.entries.keys()].filter((k) => k.startsWith('USER_DEFINED_'));
  if (userDefined.length) notUsed.push(`user-defined parameters ${userDefined.join(', ')}`);
  return {
    type: 'OPM',
    encoding,
    header: messageHeader,
    metadata: messageMetadata,
    state,
    keplerian,
    spacecraft,
    notUsed,
  };
}

function readKeplerian(data: KeywordSection): OpmKeplerianElements | null {
  const present = KEPLER.filter((k) => data.entries.has(k));
  if (present.length === 0) return null;
  const first = data.entries.get(present[0]) as KvnEntry;
  const trueAnomaly = data.entries.get('TRUE_ANOMALY');
  const meanAnomaly = data.entries.get('MEAN_ANOMALY');
  if (trueAnomaly && meanAnomaly)
    throw new OrbitMessageError(
      meanAnomaly.line,
      'MEAN_ANOMALY',
      'only one of TRUE_ANOMALY and MEAN_ANOMALY may be given',
    );
  const needed = ['SEMI_MAJOR_AXIS', 'ECCENTRICITY', 'INCLINATION', 'RA_OF_ASC_NODE', 'ARG_OF_PERICENTER', 'GM'];
  const missing = needed.filter((k) => !data.entries.has(k));
  if (!trueAnomaly && !meanAnomaly) missing.push('TRUE_ANOMALY or MEAN_ANOMALY');
  if (missing.length)
    throw new OrbitMessageError(
      first.line,
      missing[0],
      `is missing: the Keplerian elements are given all or none (from line ${first.line}; missing ${missing.join(', ')})`,
    );
  const e = (k: string) => data.entries.get(k) as KvnEntry;
  const anomaly = (trueAnomaly ?? meanAnomaly) as KvnEntry;
  return {
    semiMajorAxisKm: readKvnNumber(e('SEMI_MAJOR_AXIS'), { unit: 'km', min: 0, minExclusive: true }),
    eccentricity: readKvnNumber(e('ECCENTRICITY'), { unit: null, min: 0, max: 1, maxExclusive: true }),
    inclinationDeg: readKvnNumber(e('INCLINATION'), { unit: 'deg', min: 0, max: 180 }),
    raanDeg: readKvnNumber(e('RA_OF_ASC_NODE'), ANGLE),
    argPericenterDeg: readKvnNumber(e('ARG_OF_PERICENTER'), ANGLE),
    anomaly: { kind: trueAnomaly ? 'true' : 'mean', deg: readKvnNumber(anomaly, ANGLE) },
    gmKm3S2: readKvnNumber(e('GM'), { unit: 'km**3/s**2', min: 0, minExclusive: true }),
  };
}

function readSpacecraft(data: KeywordSection): OpmSpacecraftParameters {
  const read = (k: string, rule: NumberRule) => {
    const entry = data.entries.get(k);
    return entry ? readKvnNumber(entry, rule) : undefined;
  };
  return {
    massKg: read('MASS', MASS_AREA('kg')),
    solarRadAreaM2: read('SOLAR_RAD_AREA', MASS_AREA('m**2')),
    solarRadCoeff: read('SOLAR_RAD_COEFF', { unit: null, min: 0 }),
    dragAreaM2: read('DRAG_AREA', MASS_AREA('m**2')),
    dragCoeff: read('DRAG_COEFF', { unit: null, min: 0 }),
  };
}

/** All 21 covariance terms or none; their values are numbers. Returns a note, or null without covariance. */
function readCovariance(data: KeywordSection): string | null {
  const present = COVARIANCE.filter((k) => data.entries.has(k));
  const frame = data.entries.get('COV_REF_FRAME');
  if (present.length === 0) {
    if (frame) throw new OrbitMessageError(frame.line, 'COV_REF_FRAME', 'is given without the covariance matrix');
    return null;
  }
  const missing = COVARIANCE.filter((k) => !data.entries.has(k));
  const first = data.entries.get(present[0]) as KvnEntry;
  if (missing.length)
    throw new OrbitMessageError(
      first.line,
      missing[0],
      `is missing: the covariance matrix is given with all 21 terms or none (${missing.length} missing)`,
    );
  for (const k of COVARIANCE) readKvnNumber(data.entries.get(k) as KvnEntry, { unit: covarianceUnit(k) });
  return 'position/velocity covariance (not used)';
}

/** km**2, km**2/s or km**2/s**2 by how many of the row and column are velocities. */
function covarianceUnit(keyword: string): string {
  const dots = (keyword.match(/_DOT/g) ?? []).length;
  return ['km**2', 'km**2/s', 'km**2/s**2'][dots];
}

/** Each manoeuvre has all seven keywords; returns the number of manoeuvres. */
function readManoeuvres(data: KeywordSection): number {
  const counts = MANOEUVRE.map((k) => data.repeated.get(k)?.length ?? 0);
  const n = Math.max(...counts);
  if (n === 0) return 0;
  MANOEUVRE.forEach((k, i) => {
    if (counts[i] !== n) {
      const anyEntry = data.repeated.get(MANOEUVRE[counts.indexOf(n)])?.[0] as KvnEntry;
      throw new OrbitMessageError(
        anyEntry.line,
        k,
        `appears ${counts[i]} times for ${n} manoeuvres: each manoeuvre gives all of ${MANOEUVRE.join(', ')}`,
      );
    }
  });
  for (const entry of data.repeated.get('MAN_EPOCH_IGNITION') ?? [])
    parseCcsdsEpoch(entry.value, entry.line, 'MAN_EPOCH_IGNITION');
  for (const entry of data.repeated.get('MAN_DURATION') ?? []) readKvnNumber(entry, { unit: 's', min: 0 });
  for (const entry of data.repeated.get('MAN_DELTA_MASS') ?? []) readKvnNumber(entry, { unit: 'kg', max: 0 });
  for (const k of ['MAN_DV_1', 'MAN_DV_2', 'MAN_DV_3'])
    for (const entry of data.repeated.get(k) ?? []) readKvnNumber(entry, { unit: 'km/s' });
  return n;
}
