import { REF } from '../references';
import { defineKind } from '../registry';
import { toRad } from '../topics/angles';
import { semiMajorAxisFromAltitude, summariseOrbitRates } from '../topics/sunSynchronous';
import { altitudeKm, eccentricity, inclinationDeg, numOut, orbitWarnings, SHARED_OUTPUTS } from './common';

export const nodeRateKind = defineKind({
  kind: 'node-rate',
  title: 'Node and perigee rates',
  summary: 'J2 secular drift of the ascending node and perigee, the nodal period, and the drift of the node\'s local time against the mean Sun.',
  inputs: { altitudeKm: altitudeKm(), inclinationDeg: inclinationDeg(), eccentricity: eccentricity() },
  outputs: [
    SHARED_OUTPUTS.nodeRateDegPerDay,
    numOut('perigeeRateDegPerDay', 'Perigee rate', 'deg/d', 5),
    SHARED_OUTPUTS.nodalPeriodMin,
    SHARED_OUTPUTS.revsPerDay,
    SHARED_OUTPUTS.localTimeDriftMinPerYear,
  ],
  model: {
    method: 'First-order J2 secular rates Ω̇ = −(3/2) n J2 (R/p)² cos i, ω̇ = (3/4) n J2 (R/p)² (4 − 5 sin² i); local-time drift (Ω̇ − 360°/tropical year) × 4 min/deg.',
    assumptions: ['Mean elements; only J2 is modelled (SGP4-type theories with J2², J4 differ by about 0.5 %).', 'Positive local-time drift means the node moves to later local times.'],
    references: [REF.kozai1959, REF.brouwer1959, REF.valladoSecular, REF.egm96],
  },
  compute(v) {
    const s = summariseOrbitRates(semiMajorAxisFromAltitude(v.altitudeKm), v.eccentricity, toRad(v.inclinationDeg));
    const warnings = orbitWarnings(v);
    return {
      outputs: {
        nodeRateDegPerDay: s.nodeRateDegPerDay,
        perigeeRateDegPerDay: s.perigeeRateDegPerDay,
        nodalPeriodMin: s.nodalPeriodMin,
        revsPerDay: s.revsPerDay,
        localTimeDriftMinPerYear: s.localTimeDriftMinPerYear,
      },
      warnings,
    };
  },
});
