import { REF } from '../references';
import { defineKind } from '../registry';
import { toRad } from '../topics/angles';
import { semiMajorAxisFromAltitude, summariseOrbitRates } from '../topics/sun-synchronous';
import {
  altitudeKm,
  eccentricity,
  inclinationDeg,
  numOut,
  orbitWarnings,
  SECULAR_VALIDITY,
  SHARED_OUTPUTS,
  theory,
  THEORY_OUTPUT,
  theoryNotes,
} from './common';

export const nodeRateKind = defineKind({
  kind: 'node-rate',
  title: 'Node and perigee rates',
  summary:
    "Secular drift of the ascending node and perigee, the nodal period, and the drift of the node's local time against the mean Sun.",
  inputs: {
    altitudeKm: altitudeKm(),
    inclinationDeg: inclinationDeg(),
    eccentricity: eccentricity(),
    theory: theory(),
  },
  outputs: [
    SHARED_OUTPUTS.nodeRateDegPerDay,
    numOut('perigeeRateDegPerDay', 'Perigee rate', 'deg/d', 5),
    SHARED_OUTPUTS.nodalPeriodMin,
    SHARED_OUTPUTS.revsPerDay,
    SHARED_OUTPUTS.localTimeDriftMinPerYear,
    THEORY_OUTPUT,
  ],
  model: {
    method:
      'Secular rates of the chosen theory — zonal: Brouwer (1959) J2 to second order plus first-order J4 and J6; j2: Ω̇ = −(3/2) n J2 (R/p)² cos i, ω̇ = (3/4) n J2 (R/p)² (4 − 5 sin² i); local-time drift (Ω̇ − 360°/tropical year) × 4 min/deg.',
    assumptions: [
      'Mean elements (Brouwer mean semi-major axis = time average of the osculating one); altitude is mean semi-major axis minus the equatorial radius.',
      'Positive local-time drift means the node moves to later local times.',
      SECULAR_VALIDITY,
    ],
    references: [REF.brouwer1959, REF.kozai1959, REF.egm96],
  },
  compute(v) {
    const s = summariseOrbitRates(
      semiMajorAxisFromAltitude(v.altitudeKm),
      v.eccentricity,
      toRad(v.inclinationDeg),
      v.theory,
    );
    const warnings = orbitWarnings(v);
    return {
      outputs: {
        nodeRateDegPerDay: s.nodeRateDegPerDay,
        perigeeRateDegPerDay: s.perigeeRateDegPerDay,
        nodalPeriodMin: s.nodalPeriodMin,
        revsPerDay: s.revsPerDay,
        localTimeDriftMinPerYear: s.localTimeDriftMinPerYear,
        theory: v.theory,
      },
      warnings,
      modelNotes: theoryNotes(v.theory),
    };
  },
});
