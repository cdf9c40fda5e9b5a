import { numberField } from '../fields';
import { REF } from '../references';
import { defineKind } from '../registry';
import { toRad } from '../topics/angles';
import { computeInjectionSensitivity, semiMajorAxisFromAltitude } from '../topics/sun-synchronous';
import {
  altitudeKm,
  inclinationDeg,
  numOut,
  orbitWarnings,
  SECULAR_VALIDITY,
  SHARED_OUTPUTS,
  theory,
  THEORY_OUTPUT,
  theoryNotes,
} from './common';

export const injectionSensitivityKind = defineKind({
  kind: 'injection-sensitivity',
  title: 'Injection errors and local-time drift',
  summary:
    'Drift of the node local time caused by inclination and altitude injection errors, and the plane-change ΔV that removes the inclination error.',
  inputs: {
    altitudeKm: altitudeKm(),
    inclinationDeg: inclinationDeg(),
    inclinationErrorDeg: numberField('Inclination error', 'deg', { min: -2, max: 2, default: 0.05 }),
    altitudeErrorKm: numberField('Altitude error', 'km', { min: -100, max: 100, default: 5 }),
    theory: theory(),
  },
  outputs: [
    numOut('driftFromInclinationMinPerYear', 'Local-time drift from the inclination error', 'min/yr', 2),
    numOut('driftFromAltitudeMinPerYear', 'Local-time drift from the altitude error', 'min/yr', 2),
    { ...SHARED_OUTPUTS.localTimeDriftMinPerYear, label: 'Local-time drift from both errors' },
    numOut('nominalDriftMinPerYear', 'Local-time drift of the nominal orbit', 'min/yr', 2),
    numOut('planeChangeDeltaVMps', 'Plane-change ΔV to remove the inclination error', 'm/s', 2),
    THEORY_OUTPUT,
  ],
  model: {
    method:
      'Differences of secular node rates of the chosen theory (actual − nominal) converted to local time at 4 min per degree; plane change Δv = 2 v sin(Δi/2) with circular speed v = √(μ/a).',
    assumptions: [
      "Drifts are the change relative to the nominal orbit; the nominal orbit's own drift is reported separately.",
      'Errors are exact rate differences (not linearised); combined drift applies both errors together.',
      'Plane change performed at a node, impulsive, at circular speed.',
      SECULAR_VALIDITY,
    ],
    references: [REF.brouwer1959, REF.kozai1959, REF.batePlaneChange],
  },
  check(v): Record<string, string> {
    return v.altitudeKm + v.altitudeErrorKm >= 100
      ? {}
      : { altitudeErrorKm: 'altitudeErrorKm: the altitude with this error falls below 100 km' };
  },
  compute(v) {
    const aKm = semiMajorAxisFromAltitude(v.altitudeKm);
    const s = computeInjectionSensitivity(
      aKm,
      toRad(v.inclinationDeg),
      toRad(v.inclinationErrorDeg),
      v.altitudeErrorKm,
      v.theory,
    );
    const warnings = orbitWarnings(v);
    if (Math.abs(s.nominalDriftMinPerYear) > 1)
      warnings.push(
        `The nominal orbit is not sun-synchronous: its own node drifts ${s.nominalDriftMinPerYear.toFixed(1)} min/yr against the mean Sun.`,
      );
    return {
      outputs: {
        driftFromInclinationMinPerYear: s.driftFromInclinationMinPerYear,
        driftFromAltitudeMinPerYear: s.driftFromAltitudeMinPerYear,
        localTimeDriftMinPerYear: s.combinedDriftMinPerYear,
        nominalDriftMinPerYear: s.nominalDriftMinPerYear,
        planeChangeDeltaVMps: s.planeChangeDeltaVMps,
        theory: v.theory,
      },
      warnings,
      modelNotes: theoryNotes(v.theory),
    };
  },
});
