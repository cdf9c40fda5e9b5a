import { REF } from '../references';
import { defineKind } from '../registry';
import { toDeg } from '../topics/angles';
import { semiMajorAxisFromAltitude, solveSsoInclination, summariseOrbitRates } from '../topics/sunSynchronous';
import { altitudeKm, eccentricity, numOut, orbitWarnings, SHARED_OUTPUTS } from './common';

export const ssoInclinationKind = defineKind({
  kind: 'sso-inclination',
  title: 'Sun-synchronous inclination',
  summary: 'Inclination at which the J2 node rate matches the Sun\'s mean motion, for a given altitude and eccentricity.',
  inputs: { altitudeKm: altitudeKm(), eccentricity: eccentricity() },
  outputs: [
    numOut('inclinationDeg', 'Sun-synchronous inclination', 'deg', 3),
    numOut('semiMajorAxisKm', 'Semi-major axis', 'km', 3),
    SHARED_OUTPUTS.nodalPeriodMin,
    SHARED_OUTPUTS.revsPerDay,
    SHARED_OUTPUTS.nodeRateDegPerDay,
  ],
  model: {
    method: 'First-order J2 secular node rate Ω̇ = −(3/2) n J2 (R/p)² cos i set equal to 360° per tropical year; solved for cos i.',
    assumptions: [
      'Mean (not osculating) elements; altitude is semi-major axis minus the WGS-84 equatorial radius.',
      'Only J2 is modelled; J2² and higher zonal terms change the inclination by about 0.001°.',
      'Nodal period 2π/(ω̇ + Ṁ) with first-order J2 rates.',
    ],
    references: [REF.kozai1959, REF.valladoDesign, REF.smad, REF.egm96, REF.wgs84],
  },
  compute(v) {
    const a = semiMajorAxisFromAltitude(v.altitudeKm);
    const inc = solveSsoInclination(a, v.eccentricity);
    const s = summariseOrbitRates(a, v.eccentricity, inc);
    return {
      outputs: {
        inclinationDeg: toDeg(inc),
        semiMajorAxisKm: a,
        nodalPeriodMin: s.nodalPeriodMin,
        revsPerDay: s.revsPerDay,
        nodeRateDegPerDay: s.nodeRateDegPerDay,
      },
      warnings: orbitWarnings(v),
    };
  },
});
