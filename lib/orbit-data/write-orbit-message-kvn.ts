import type { OrbitMessageFrame, Vec3 } from './orbit-message-types';

/** What Nodewright writes into an OPM or OEM header and metadata. */
export interface OrbitMessageIdentity {
  originator: string;
  creationDate: Date;
  objectName: string;
  objectId: string;
  refFrame: OrbitMessageFrame;
  /** Free text written as COMMENT lines at the start of the data (one per entry; line breaks become separate lines). */
  comments: string[];
}

export interface StateToWrite {
  epoch: Date;
  positionKm: Vec3;
  velocityKmS: Vec3;
}

/** Osculating Keplerian elements at the state's epoch, in the message's frame. */
export interface KeplerianToWrite {
  semiMajorAxisKm: number;
  eccentricity: number;
  inclinationDeg: number;
  raanDeg: number;
  argPericenterDeg: number;
  meanAnomalyDeg: number;
  gmKm3S2: number;
}

/**
 * Printed precision of what we write: positions to 1 mm, velocities to 1 µm/s,
 * the semi-major axis to 1 mm, angles to 1e-9 deg (about 0.1 mm along a LEO orbit).
 * A message read back gives the same numbers to these decimals.
 */
export const WRITTEN_DECIMALS = {
  positionKm: 6,
  velocityKmS: 9,
  semiMajorAxisKm: 6,
  eccentricity: 12,
  angleDeg: 9,
  gm: 4,
} as const;

/** A CCSDS epoch as written (502.0-B-3 §7.5.10, calendar form, UTC, milliseconds). */
export function formatCcsdsEpoch(date: Date): string {
  return date.toISOString().slice(0, 23);
}

/** KVN keeps a value on one line and COMMENT text free of line breaks. */
const oneLine = (s: string) =>
  s
    .replace(/[\r\n\t]+/g, ' ')
    .replace(/[^\x20-\x7e]/g, '?')
    .trim();
const kv = (keyword: string, value: string, unit?: string) =>
  `${keyword.padEnd(20)} = ${value}${unit ? ` [${unit}]` : ''}`;
const comments = (lines: string[]) => lines.flatMap((c) => c.split(/\r?\n/)).map((c) => `COMMENT ${oneLine(c)}`);

function headerLines(versionKeyword: string, id: OrbitMessageIdentity): string[] {
  return [
    kv(versionKeyword, '2.0'),
    kv('CREATION_DATE', formatCcsdsEpoch(id.creationDate)),
    kv('ORIGINATOR', oneLine(id.originator) || 'NODEWRIGHT'),
  ];
}

function metadataLines(id: OrbitMessageIdentity): string[] {
  return [
    kv('OBJECT_NAME', oneLine(id.objectName) || 'UNNAMED'),
    kv('OBJECT_ID', oneLine(id.objectId) || 'UNKNOWN'),
    kv('CENTER_NAME', 'EARTH'),
    kv('REF_FRAME', id.refFrame),
    kv('TIME_SYSTEM', 'UTC'),
  ];
}

/**
 * An Orbit Parameter Message in KVN (CCSDS 502.0-B-2 §3, version 2.0, which
 * readers of issues 2 and 3 accept): state vector with units, optionally the
 * osculating Keplerian elements (with MEAN_ANOMALY and GM); no covariance,
 * spacecraft parameters or manoeuvres.
 */
export function writeOpmKvn(id: OrbitMessageIdentity, state: StateToWrite, keplerian?: KeplerianToWrite): string {
  const d = WRITTEN_DECIMALS;
  const lines = [
    ...headerLines('CCSDS_OPM_VERS', id),
    '',
    ...metadataLines(id),
    '',
    ...comments(id.comments),
    kv('EPOCH', formatCcsdsEpoch(state.epoch)),
    ...(['X', 'Y', 'Z'] as const).map((k, i) => kv(k, state.positionKm[i].toFixed(d.positionKm), 'km')),
    ...(['X_DOT', 'Y_DOT', 'Z_DOT'] as const).map((k, i) => kv(k, state.velocityKmS[i].toFixed(d.velocityKmS), 'km/s')),
  ];
  if (keplerian) {
    lines.push(
      '',
      'COMMENT Osculating Keplerian elements at EPOCH in REF_FRAME',
      kv('SEMI_MAJOR_AXIS', keplerian.semiMajorAxisKm.toFixed(d.semiMajorAxisKm), 'km'),
      kv('ECCENTRICITY', keplerian.eccentricity.toFixed(d.eccentricity)),
      kv('INCLINATION', keplerian.inclinationDeg.toFixed(d.angleDeg), 'deg'),
      kv('RA_OF_ASC_NODE', keplerian.raanDeg.toFixed(d.angleDeg), 'deg'),
      kv('ARG_OF_PERICENTER', keplerian.argPericenterDeg.toFixed(d.angleDeg), 'deg'),
      kv('MEAN_ANOMALY', keplerian.meanAnomalyDeg.toFixed(d.angleDeg), 'deg'),
      kv('GM', keplerian.gmKm3S2.toFixed(d.gm), 'km**3/s**2'),
    );
  }
  return `${lines.join('\n')}\n`;
}

/** An Orbit Ephemeris Message in KVN (CCSDS 502.0-B-2 §5, version 2.0): one segment, epoch and six numbers per line. */
export function writeOemKvn(id: OrbitMessageIdentity, states: StateToWrite[]): string {
  if (states.length === 0) throw new Error('writeOemKvn: no states');
  const d = WRITTEN_DECIMALS;
  const lines = [
    ...headerLines('CCSDS_OEM_VERS', id),
    '',
    'META_START',
    ...metadataLines(id),
    kv('START_TIME', formatCcsdsEpoch(states[0].epoch)),
    kv('STOP_TIME', formatCcsdsEpoch(states[states.length - 1].epoch)),
    'META_STOP',
    '',
    ...comments(id.comments),
    ...states.map((s) =>
      [
        formatCcsdsEpoch(s.epoch),
        ...s.positionKm.map((x) => x.toFixed(d.positionKm)),
        ...s.velocityKmS.map((v) => v.toFixed(d.velocityKmS)),
      ].join(' '),
    ),
  ];
  return `${lines.join('\n')}\n`;
}
