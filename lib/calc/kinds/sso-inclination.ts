import { REF } from '../references';
import { defineKind } from '../registry';
import { toDeg } from '../topics/angles';
import { semiMajorAxisFromAltitude, solveSsoInclination, summariseOrbitRates } from '../topics/sun-synchronous';
import {
  ALTITUDE_CONVENTION_NOTES,
  ALTITUDE_CONVENTION_OUTPUTS,
  altitudeConventionOutputs,
  altitudeKm,
  eccentricity,
  numOut,
  orbitWarnings,
  SECULAR_VALIDITY,
  SHARED_OUTPUTS,
  theory,
  THEORY_OUTPUT,
  theoryNotes,
} from './common';

export const ssoInclinationKind = defineKind({
  kind: 'sso-inclination',
  title: 'Sun-synchronous inclination',
  summary:
    "Inclination at which the secular node rate (J2², J4, J6 by default) matches the Sun's mean motion, for a given mean altitude and eccentricity.",
  inputs: { altitudeKm: altitudeKm(), eccentricity: eccentricity(), theory: theory() },
  outputs: [
    numOut('inclinationDeg', 'Sun-synchronous inclination', 'deg', 3),
    numOut('semiMajorAxisKm', 'Mean semi-major axis', 'km', 3),
    ...ALTITUDE_CONVENTION_OUTPUTS,
    SHARED_OUTPUTS.nodalPeriodMin,
    SHARED_OUTPUTS.revsPerDay,
    SHARED_OUTPUTS.nodeRateDegPerDay,
    THEORY_OUTPUT,
  ],
  model: {
    method:
      'Secular node rate Ω̇(a, e, i) of the chosen theory set equal to 360° per tropical year and solved for cos i (zonal: Newton iteration from the first-order J2 value Ω̇ = −(3/2) n J2 (R/p)² cos i).',
    assumptions: [
      'Mean (not osculating) elements; altitude is mean semi-major axis minus the WGS-84 equatorial radius.',
      'The zonal theory (J2², J4, J6) gives an inclination about 0.018° higher than first-order J2 at 700 km; flying the first-order value drifts the node by about 3 min of local time per year.',
      'Nodal period 2π/(ω̇ + Ṁ) with the same secular rates.',
      ...ALTITUDE_CONVENTION_NOTES,
      SECULAR_VALIDITY,
    ],
    references: [REF.brouwer1959, REF.kozai1959, REF.wertzOrbitDesign, REF.egm96, REF.wgs84],
  },
  compute(v) {
    const a = semiMajorAxisFromAltitude(v.altitudeKm);
    const inc = solveSsoInclination(a, v.eccentricity, v.theory);
    const s = summariseOrbitRates(a, v.eccentricity, inc, v.theory);
    return {
      outputs: {
        inclinationDeg: toDeg(inc),
        semiMajorAxisKm: a,
        ...altitudeConventionOutputs(a, v.eccentricity, inc),
        nodalPeriodMin: s.nodalPeriodMin,
        revsPerDay: s.revsPerDay,
        nodeRateDegPerDay: s.nodeRateDegPerDay,
        theory: v.theory,
      },
      warnings: orbitWarnings({ ...v, inclinationDeg: s.inclinationDeg }),
      modelNotes: theoryNotes(v.theory),
    };
  },
});
