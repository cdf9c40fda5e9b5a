import { EARTH_RADIUS_KM, SUN_MEAN_MOTION_RAD_S, TROPICAL_YEAR_DAYS } from '../constants';
import { numberField, stringField } from '../fields';
import { REF } from '../references';
import { defineKind } from '../registry';
import { toRad } from '../topics/angles';
import { transformOrbitPlane } from '../topics/reference-frames';
import { computeNodeLocalTime } from '../topics/sun-and-local-time';
import { julianDate } from '../topics/time';
import { MAX_TLE_SETS, parseTleList, type TleSet } from '../topics/tle';
import { SGP4_EARTH_RADIUS_KM, sgp4AtEpoch } from '../topics/tle-sgp4';
import type { CalcOutputField, OutputRow } from '../types';
import { numOut } from './common';

/** Text room for MAX_TLE_SETS three-line sets (24 + 2 × 69 characters and line ends each). */
export const TLE_TEXT_MAX_CHARS = 20000;

const MINUTES_PER_TROPICAL_YEAR = TROPICAL_YEAR_DAYS * 1440;

/** Local time difference a − b [min], wrapped to ±12 h. */
function localTimeDifferenceMin(aHours: number, bHours: number): number {
  return (((((aHours - bHours + 12) % 24) + 24) % 24) - 12) * 60;
}

interface AsFlown {
  set: TleSet;
  meanSemiMajorAxisKm: number;
  meanAltitudeKm: number;
  raanTodDeg: number;
  ltanHours: number;
  ltanDriftMinPerYear: number;
  deepSpace: boolean;
  positionTemeKm: [number, number, number];
  velocityTemeKmS: [number, number, number];
}

function asFlown(set: TleSet): AsFlown {
  const s = sgp4AtEpoch(set);
  // Local time of the node from the TEME right ascension and GMST: TEME is the frame SGP4 turns into the
  // Earth-fixed one by GMST alone (Vallado et al. 2006), so this is the mean solar time at the node's longitude.
  const local = computeNodeLocalTime(julianDate(set.epoch), toRad(set.raanDeg));
  const tod = transformOrbitPlane(
    { inclinationDeg: set.inclinationDeg, raanDeg: set.raanDeg },
    'TEME',
    'TOD',
    set.epoch,
  );
  // d(LTAN)/dt = (Ω̇ − n☉) in rad → hours (× 12/π) → minutes (× 60), per tropical year.
  const driftRadPerMin = s.nodeRateRadPerMin - SUN_MEAN_MOTION_RAD_S * 60;
  return {
    set,
    meanSemiMajorAxisKm: s.meanSemiMajorAxisKm,
    meanAltitudeKm: s.meanSemiMajorAxisKm - SGP4_EARTH_RADIUS_KM,
    raanTodDeg: tod.raanDeg,
    ltanHours: local.ltanHours,
    ltanDriftMinPerYear: ((driftRadPerMin * 12) / Math.PI) * 60 * MINUTES_PER_TROPICAL_YEAR,
    deepSpace: s.deepSpace,
    positionTemeKm: s.positionTemeKm,
    velocityTemeKmS: s.velocityTemeKmS,
  };
}

const SERIES_COLUMNS: CalcOutputField[] = [
  { name: 'date', label: 'TLE epoch', unit: null, precision: 0, type: 'string' },
  numOut('days', 'Days since the first TLE', 'd', 2),
  numOut('meanAltitudeKm', 'Mean altitude (SGP4)', 'km', 3),
  numOut('inclinationDeg', 'Inclination', 'deg', 4),
  numOut('ltanHours', 'LTAN (mean Sun)', 'h', 4),
];

export const tleCheckKind = defineKind({
  kind: 'tle-check',
  title: 'As-flown check from TLEs',
  summary:
    "Reads one TLE (two lines, or three with a name) or a list of one satellite's TLEs, runs SGP4 at each epoch and compares the flown mean altitude, inclination and local time of the node with the design values.",
  inputs: {
    tle: stringField('TLE (two lines, or three with a name; several sets of one satellite one after another)', {
      maxLength: TLE_TEXT_MAX_CHARS,
      multiline: true,
      help: `Paste as published: 69 columns per line with checksums; up to ${MAX_TLE_SETS} sets of one satellite. The latest epoch is checked against the design; all of them make the series.`,
    }),
    designLtanHours: numberField('Design local time of ascending node (mean Sun)', 'h', {
      min: 0,
      max: 24,
      maxExclusive: true,
      optional: true,
    }),
    designAltitudeKm: numberField('Design mean altitude (mean a − WGS-84 equatorial radius)', 'km', {
      min: 100,
      max: 6000,
      optional: true,
    }),
    designInclinationDeg: numberField('Design inclination', 'deg', { min: 0, max: 180, optional: true }),
  },
  outputs: [
    { name: 'epoch', label: 'TLE epoch (latest)', unit: null, precision: 0, type: 'string' },
    { name: 'satelliteNumber', label: 'Satellite number', unit: null, precision: 0, type: 'string' },
    { name: 'elementSets', label: 'Element sets read', unit: null, precision: 0, type: 'integer' },
    numOut('meanAltitudeKm', 'Mean altitude (SGP4)', 'km', 3),
    numOut('meanSemiMajorAxisKm', 'Mean semi-major axis (SGP4)', 'km', 3),
    numOut('eccentricity', 'Mean eccentricity', null, 7),
    numOut('inclinationDeg', 'Inclination', 'deg', 4),
    numOut('raanDeg', 'RAAN (true of date)', 'deg', 4),
    numOut('ltanHours', 'LTAN (mean Sun)', 'h', 4),
    numOut('ltanDriftMinPerYear', 'LTAN drift per year', 'min', 2),
    numOut('ltanDifferenceMin', 'LTAN − design', 'min', 2),
    numOut('altitudeDifferenceKm', 'Mean altitude − design', 'km', 3),
    numOut('inclinationDifferenceDeg', 'Inclination − design', 'deg', 4),
    numOut('designMeanAltitudeSgp4Km', "Design altitude on SGP4's radius", 'km', 3),
    { name: 'positionTemeKm', label: 'Position at epoch (TEME)', unit: 'km', precision: 3, type: 'vector' },
    { name: 'velocityTemeKmS', label: 'Velocity at epoch (TEME)', unit: 'km/s', precision: 6, type: 'vector' },
    { name: 'series', label: 'As flown, per TLE', unit: null, precision: 0, type: 'rows', columns: SERIES_COLUMNS },
  ],
  model: {
    method:
      "Each TLE is checked (69 columns, checksum modulo 10, field formats) and given to SGP4 (satellite.js, WGS-72) at its epoch: mean altitude = SGP4's Brouwer mean semi-major axis − 6378.135 km (WGS-72 equatorial radius); local time of the node = 12 h + (Ω_TEME − α_mean Sun)/15°, α_mean Sun from GMST (IAU 1982); drift = (Ω̇_SGP4 − 360°/tropical year) in minutes of local time per year; the design differences compare semi-major axes (design altitude + 6378.137 km, WGS-84).",
    assumptions: [
      "TLE mean elements are SGP4's own, fitted to tracking data; they are comparable with the design's Brouwer mean elements only to the accuracy of the fit.",
      "The local-time drift is SGP4's secular J2/J4 node rate at the TLE's elements; drag, Sun and Moon (SDP4 orbits) and later manoeuvres are not in it.",
      'TEME and true of date share the true equator: the inclination is the same in both; the RAAN is given in true of date (equation of the equinoxes applied).',
      'UTC is used for UT1 in GMST (|UT1 − UTC| < 0.9 s: < 0.004° of RAAN, < 1 s of local time).',
    ],
    references: [REF.celestrakTle, REF.hootsRoehrich1980, REF.valladoTeme, REF.valladoGmst],
  },
  compute(v) {
    const sets = parseTleList(v.tle);
    const flown = sets.map(asFlown).sort((a, b) => a.set.epoch.getTime() - b.set.epoch.getTime());
    const latest = flown[flown.length - 1];
    const first = flown[0];
    const warnings: string[] = [];
    if (latest.deepSpace)
      warnings.push(
        'The period is 225 min or more: SGP4 uses its deep-space branch (SDP4), and the node drift here leaves out the Sun and Moon terms.',
      );
    if (latest.set.eccentricity > 0.05)
      warnings.push(
        `Eccentricity ${latest.set.eccentricity} is above 0.05: a mean altitude says little about this orbit.`,
      );
    const outputs: Record<string, string | number | number[] | OutputRow[]> = {
      epoch: latest.set.epoch.toISOString(),
      satelliteNumber: latest.set.satelliteNumber,
      elementSets: flown.length,
      meanAltitudeKm: latest.meanAltitudeKm,
      meanSemiMajorAxisKm: latest.meanSemiMajorAxisKm,
      eccentricity: latest.set.eccentricity,
      inclinationDeg: latest.set.inclinationDeg,
      raanDeg: latest.raanTodDeg,
      ltanHours: latest.ltanHours,
      ltanDriftMinPerYear: latest.ltanDriftMinPerYear,
      positionTemeKm: latest.positionTemeKm,
      velocityTemeKmS: latest.velocityTemeKmS,
      series: flown.map((f) => ({
        date: f.set.epoch.toISOString(),
        days: (f.set.epoch.getTime() - first.set.epoch.getTime()) / 86400000,
        meanAltitudeKm: f.meanAltitudeKm,
        inclinationDeg: f.set.inclinationDeg,
        ltanHours: f.ltanHours,
      })),
    };
    if (v.designLtanHours !== undefined)
      outputs.ltanDifferenceMin = localTimeDifferenceMin(latest.ltanHours, v.designLtanHours);
    if (v.designAltitudeKm !== undefined) {
      const designSemiMajorAxisKm = v.designAltitudeKm + EARTH_RADIUS_KM;
      outputs.altitudeDifferenceKm = latest.meanSemiMajorAxisKm - designSemiMajorAxisKm;
      outputs.designMeanAltitudeSgp4Km = designSemiMajorAxisKm - SGP4_EARTH_RADIUS_KM;
    }
    if (v.designInclinationDeg !== undefined)
      outputs.inclinationDifferenceDeg = latest.set.inclinationDeg - v.designInclinationDeg;
    const name = latest.set.name ? ` (${latest.set.name})` : '';
    return {
      outputs,
      warnings,
      modelNotes: [
        `Satellite ${latest.set.satelliteNumber}${name}: ${flown.length} element set${flown.length === 1 ? '' : 's'}, latest epoch ${latest.set.epoch.toISOString()}.`,
      ],
    };
  },
});
