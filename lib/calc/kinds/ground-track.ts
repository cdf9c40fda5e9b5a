import { numberField } from '../fields';
import { REF } from '../references';
import { defineKind } from '../registry';
import { toRad } from '../topics/angles';
import { computeGroundTrack } from '../topics/ground-track';
import { computeRaanFromLtan } from '../topics/sun-and-local-time';
import { semiMajorAxisFromAltitude } from '../topics/sun-synchronous';
import { julianDate } from '../topics/time';
import { CalcInputError } from '../types';
import {
  altitudeKm,
  epoch,
  inclinationDeg,
  ltanHours,
  numOut,
  orbitWarnings,
  rowsOut,
  SECULAR_VALIDITY,
  theory,
  THEORY_OUTPUT,
  theoryNotes,
} from './common';
import { epochDate, epochWarnings } from './node-local-time';

export const MAX_TRACK_POINTS = 20000;

export const groundTrackKind = defineKind({
  kind: 'ground-track',
  title: 'Ground track',
  summary:
    'Sub-satellite latitude and longitude of a circular orbit from an ascending-node crossing, with secular node and argument-of-latitude motion.',
  inputs: {
    altitudeKm: altitudeKm(),
    inclinationDeg: inclinationDeg(),
    ltanHours: ltanHours(),
    startEpoch: epoch('Ascending-node crossing (UTC)'),
    hours: numberField('Span', 'h', { min: 0, max: 24 * 40, minExclusive: true, default: 24 }),
    stepSec: numberField('Sample step', 's', { min: 1, max: 86400, default: 60 }),
    theory: theory(),
  },
  check(v): Record<string, string> {
    const n = Math.floor((v.hours * 3600) / v.stepSec) + 1;
    return n <= MAX_TRACK_POINTS
      ? {}
      : { stepSec: `stepSec: ${n} points exceed the limit of ${MAX_TRACK_POINTS}; use a larger step or fewer hours` };
  },
  outputs: [
    numOut('nodalPeriodMin', 'Nodal period', 'min', 3),
    rowsOut('points', 'Track points', [
      numOut('t', 'Time from start', 's', 0),
      numOut('latDeg', 'Geodetic latitude', 'deg', 3),
      numOut('lonDeg', 'Longitude', 'deg', 3),
    ]),
    rowsOut('ascendingNodes', 'Ascending nodes', [
      numOut('t', 'Time from start', 's', 0),
      numOut('lonDeg', 'Longitude', 'deg', 3),
    ]),
    THEORY_OUTPUT,
  ],
  figures: [{ name: 'track-map', title: 'Ground track', rows: 'points', x: 'lonDeg', y: ['latDeg'] }],
  model: {
    method:
      'Circular orbit, u(t) = (ω̇ + Ṁ) t and Ω(t) = Ω0 + Ω̇ t with the secular rates of the chosen theory; Earth-fixed longitude through GMST (IAU 1982) at the start, advanced at ω⊕ = 7.2921158553e-5 rad/s (the rate the repeat condition uses); geodetic latitude on WGS-84.',
    assumptions: [
      'Starts at an ascending-node crossing at startEpoch with RAAN from the mean-Sun LTAN.',
      'Equator-of-date frame; polar motion, precession and nutation of the frame are neglected (< 0.01° over days).',
      'UTC used for UT1.',
      'Mean (secular) motion only: the osculating track differs by the short-period terms (a few km along track).',
      SECULAR_VALIDITY,
    ],
    references: [REF.valladoGmst, REF.chobotovGeodetic, REF.brouwer1959, REF.kozai1959, REF.wgs84],
  },
  compute(v) {
    const start = epochDate(v.startEpoch);
    const jd0 = julianDate(start);
    const iRad = toRad(v.inclinationDeg);
    if (v.stepSec > v.hours * 3600) throw new CalcInputError('stepSec', 'stepSec: the step is longer than the span');
    const track = computeGroundTrack(
      semiMajorAxisFromAltitude(v.altitudeKm),
      iRad,
      computeRaanFromLtan(jd0, v.ltanHours, 'mean'),
      jd0,
      v.hours * 3600,
      v.stepSec,
      v.theory,
    );
    return {
      outputs: {
        nodalPeriodMin: track.nodalPeriodS / 60,
        points: track.points,
        ascendingNodes: track.ascendingNodes,
        theory: v.theory,
      },
      warnings: [...orbitWarnings(v), ...epochWarnings(start)],
      modelNotes: theoryNotes(v.theory),
    };
  },
});
