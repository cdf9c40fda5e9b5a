import { inFrame, integerField, numberField } from '../fields';
import { REF } from '../references';
import { defineKind } from '../registry';
import { toDeg, toRad } from '../topics/angles';
import { gcd, solveRepeatOrbit } from '../topics/repeat-ground-track';
import {
  ALTITUDE_CONVENTION_NOTES,
  ALTITUDE_CONVENTION_OUTPUTS,
  altitudeConventionOutputs,
  eccentricity,
  numOut,
  orbitWarnings,
  SECULAR_VALIDITY,
  theory,
  THEORY_OUTPUT,
  theoryNotes,
} from './common';

export const REPEAT_MODEL_ASSUMPTIONS = [
  'Days are nodal days 2π/(ω⊕ − Ω̇), the time for Earth to turn once relative to the orbit plane; for a sun-synchronous orbit a nodal day equals the mean solar day.',
  'Secular rates of node, perigee and mean anomaly in the chosen theory (mean elements); altitude is mean semi-major axis minus the WGS-84 equatorial radius.',
  'Earth rotation ω⊕ = 7.2921158553e-5 rad/s, the rate of GMST (IAU 1982), the same rate the ground track uses, so the solved track closes on itself.',
  'Solved by fixed-point iteration on the mean motion (stops when a step is below 1e-6 km; the iteration contracts about a thousandfold per step, leaving about 1e-9 km); a sun-synchronous inclination is iterated jointly with a.',
  SECULAR_VALIDITY,
];

export const optionalInclination = () =>
  inFrame(
    numberField('Inclination (leave empty for sun-synchronous)', 'deg', { min: 0, max: 180, optional: true }),
    'TOD',
  );

export const repeatOrbitKind = defineKind({
  kind: 'repeat-orbit',
  title: 'Repeat ground-track orbit',
  summary:
    'Semi-major axis (and sun-synchronous inclination) of an orbit whose ground track repeats after a whole number of revolutions in a whole number of days.',
  inputs: {
    revolutions: integerField('Revolutions per repeat cycle', null, { min: 1, max: 2000, default: 233 }),
    days: integerField('Repeat cycle', 'd', { min: 1, max: 100, default: 16, help: 'Nodal days' }),
    eccentricity: eccentricity(),
    inclinationDeg: optionalInclination(),
    theory: theory(),
  },
  check(v): Record<string, string> {
    const k = gcd(v.revolutions, v.days);
    return k === 1
      ? {}
      : {
          revolutions: `revolutions: ${v.revolutions} and days ${v.days} share the factor ${k}; the same track repeats with ${v.revolutions / k} revolutions in ${v.days / k} days`,
        };
  },
  outputs: [
    numOut('semiMajorAxisKm', 'Mean semi-major axis', 'km', 3),
    numOut('altitudeKm', 'Mean altitude (a − equatorial radius)', 'km', 3),
    ...ALTITUDE_CONVENTION_OUTPUTS.slice(1),
    numOut('inclinationDeg', 'Inclination', 'deg', 3),
    numOut('nodalPeriodMin', 'Nodal period', 'min', 4),
    numOut('revsPerDay', 'Revolutions per nodal day', null, 5),
    numOut('nodalDayHours', 'Nodal day', 'h', 5),
    numOut('equatorSpacingKm', 'Track spacing at the equator (full cycle)', 'km', 2),
    numOut('nodeShiftDeg', 'Westward shift between successive ascending nodes', 'deg', 4),
    { name: 'sunSynchronous', label: 'Sun-synchronous', unit: null, precision: 0, type: 'boolean' },
    THEORY_OUTPUT,
  ],
  model: {
    method:
      'Repeat condition R·T_N = D·T_ND with T_N = 2π/(ω̇ + Ṁ) and T_ND = 2π/(ω⊕ − Ω̇), secular rates of the chosen theory (zonal: Brouwer J2² + J4 + J6; j2: first order).',
    assumptions: [...REPEAT_MODEL_ASSUMPTIONS, ...ALTITUDE_CONVENTION_NOTES],
    references: [REF.wertzOrbitDesign, REF.brouwer1959, REF.kozai1959, REF.valladoGmst, REF.egm96],
  },
  compute(v) {
    const inc = v.inclinationDeg === undefined ? undefined : toRad(v.inclinationDeg);
    const s = solveRepeatOrbit(v.revolutions, v.days, v.eccentricity, inc, v.theory);
    const c = altitudeConventionOutputs(s.semiMajorAxisKm, v.eccentricity, s.inclinationRad);
    return {
      outputs: {
        semiMajorAxisKm: s.semiMajorAxisKm,
        altitudeKm: s.altitudeKm,
        altitudeAtAscendingNodeKm: c.altitudeAtAscendingNodeKm,
        meanAltitudeAboveEllipsoidKm: c.meanAltitudeAboveEllipsoidKm,
        inclinationDeg: toDeg(s.inclinationRad),
        nodalPeriodMin: s.nodalPeriodS / 60,
        revsPerDay: v.revolutions / v.days,
        nodalDayHours: s.nodalDayS / 3600,
        equatorSpacingKm: s.equatorSpacingKm,
        nodeShiftDeg: toDeg(s.nodeShiftRad),
        sunSynchronous: inc === undefined,
        theory: v.theory,
      },
      warnings: orbitWarnings({
        altitudeKm: s.altitudeKm,
        eccentricity: v.eccentricity,
        inclinationDeg: toDeg(s.inclinationRad),
      }),
      modelNotes: theoryNotes(v.theory),
    };
  },
});
