import { SECONDS_PER_DAY, TWO_PI } from '../constants';
import { enumField, integerField, numberField } from '../fields';
import { REF } from '../references';
import { defineKind } from '../registry';
import { toRad } from '../topics/angles';
import { MAX_HISTORY_ROWS, runPropagationCheck } from '../topics/propagation/propagation-check';
import { computeMeanMotion } from '../topics/secular-rates';
import { semiMajorAxisFromAltitude } from '../topics/sun-synchronous';
import { MAX_ZONAL_DEGREE, MIN_ZONAL_DEGREE } from '../topics/propagation/zonal-force';
import {
  altitudeKm,
  inclinationDeg,
  intOut,
  numOut,
  orbitWarnings,
  rowsOut,
  theory,
  THEORY_OUTPUT,
  theoryNotes,
} from './common';

/** Largest relative energy error accepted without a warning (issue-level requirement for a trustworthy drift). */
export const ENERGY_ERROR_WARNING = 1e-7;
/** relTol × revolutions above which the tolerance is too loose for the span (common practice, no source). */
export const TOLERANCE_BUDGET = 1e-6;

export const propagationCheckKind = defineKind({
  kind: 'propagation-check',
  title: 'Numerical check of the secular node drift',
  summary:
    'Cowell propagation from mean elements under zonal harmonics J2…J6 with RK4, DOPRI5 or DOP853, compared with the analytic secular node rate of the same field.',
  inputs: {
    altitudeKm: altitudeKm(3000),
    inclinationDeg: inclinationDeg(),
    days: numberField('Span', 'd', { min: 0.1, max: 400, default: 30 }),
    integrator: enumField('Integrator', ['rk4', 'dopri5', 'dop853'] as const, 'dop853'),
    relTol: numberField('Relative tolerance', null, {
      min: 1e-13,
      max: 1e-3,
      default: 1e-10,
      help: 'rk4: sets the fixed step (see model note)',
    }),
    zonalDegree: integerField('Zonal harmonics in the force model (J2 … J_N)', null, {
      min: MIN_ZONAL_DEGREE,
      max: MAX_ZONAL_DEGREE,
      default: MAX_ZONAL_DEGREE,
      help: '2 = J2 only; 6 = J2 to J6',
    }),
    theory: theory(),
  },
  outputs: [
    numOut('raanDriftNumericDeg', 'RAAN drift, numerical (mean)', 'deg', 5),
    numOut('raanDriftAnalyticDeg', 'RAAN drift, analytic secular (same zonal degree)', 'deg', 5),
    numOut('raanDriftDifferencePercent', 'Numerical − analytic', '%', 4),
    numOut('smaDriftKm', 'Mean semi-major axis drift', 'km', 4),
    numOut('startOsculatingSmaKm', 'Osculating semi-major axis at the start', 'km', 3),
    numOut('energyRelError', 'Largest relative energy error', null, 15),
    intOut('steps', 'Accepted steps'),
    intOut('rejectedSteps', 'Rejected steps'),
    intOut('evaluations', 'Force evaluations'),
    rowsOut('history', `Osculating elements (≤ ${MAX_HISTORY_ROWS} samples)`, [
      numOut('tDays', 'Time', 'd', 3),
      numOut('smaKm', 'Semi-major axis (osculating)', 'km', 3),
      numOut('smaAnalyticKm', 'Semi-major axis (analytic secular, mean)', 'km', 3),
      numOut('inclinationDeg', 'Inclination (osculating)', 'deg', 4),
      numOut('inclinationAnalyticDeg', 'Inclination (analytic secular, mean)', 'deg', 4),
      numOut('raanDeg', 'RAAN (osculating)', 'deg', 4),
      numOut('raanAnalyticDeg', 'RAAN (analytic secular)', 'deg', 4),
    ]),
    THEORY_OUTPUT,
  ],
  heavy: true,
  costInputs: { days: 'a shorter span', relTol: 'a larger relative tolerance', integrator: 'the dop853 integrator' },
  figures: [
    {
      name: 'raan-drift',
      title: 'RAAN: numerical vs analytic',
      rows: 'history',
      x: 'tDays',
      y: ['raanDeg', 'raanAnalyticDeg'],
    },
  ],
  model: {
    method:
      'Cowell integration of two-body + zonal harmonics J2…J_N (EGM-96) from the osculating state of the input mean elements (mean → osculating, first-order short-period terms) at the ascending node (RAAN 0); numerical RAAN drift = slope of a time-weighted least-squares line through the osculating RAAN at every accepted step; analytic drift = secular node rate of the chosen theory at the input mean elements, with the even zonals up to N only.',
    assumptions: [
      'Only two-body + zonal harmonics up to J_N; no drag, third bodies, tesseral harmonics or Earth-orientation effects.',
      'DOPRI5 and DOP853 with adaptive steps (atol = rtol in km and km/s; Hairer et al. step control); RK4 with a fixed step of T/N, N = clamp(⌈5·relTol^(−1/4)⌉, 20, 1000) per Keplerian period (common practice, no source).',
      'Osculating short-period terms (≈ 0.01° in RAAN, ≈ 10 km in a at 700 km) average out of the line fit over several revolutions; short spans leave a residual of order amplitude × period / span.',
      'The energy error is the largest |E − E0|/|E0| with E including the zonal potential; above 1e-7 the drift is not trustworthy and a warning is given.',
      'Valid as a check for near-circular orbits above about 300 km over days to a year; the odd zonals J3, J5 add long-period terms that a span shorter than the perigee period does not average out.',
    ],
    references: [REF.dormandPrince1980, REF.hairer, REF.montenbruck, REF.brouwer1959, REF.kozai1959, REF.egm96],
  },
  compute(v) {
    const r = runPropagationCheck({
      altitudeKm: v.altitudeKm,
      iRad: toRad(v.inclinationDeg),
      days: v.days,
      integrator: v.integrator,
      relTol: v.relTol,
      zonalDegree: v.zonalDegree,
      theory: v.theory,
    });
    const warnings = orbitWarnings(v);
    if (v.days < 1) warnings.push('Spans under a day leave short-period terms in the mean drift; use several days.');
    if (r.energyRelError > ENERGY_ERROR_WARNING) {
      warnings.push(
        `The relative energy error reached ${r.energyRelError.toExponential(1)} (above ${ENERGY_ERROR_WARNING}): the integration is not accurate enough and the drifts (including a spurious change of a) are not trustworthy; tighten relTol.`,
      );
    }
    const revolutions =
      (v.days * SECONDS_PER_DAY * computeMeanMotion(semiMajorAxisFromAltitude(v.altitudeKm))) / TWO_PI;
    if (v.relTol * revolutions > TOLERANCE_BUDGET) {
      warnings.push(
        `relTol ${v.relTol} is too loose for ${revolutions.toFixed(0)} revolutions (relTol × revolutions should stay below ${TOLERANCE_BUDGET}); use relTol ≤ ${(TOLERANCE_BUDGET / revolutions).toExponential(0)}.`,
      );
    }
    return {
      outputs: {
        raanDriftNumericDeg: r.raanDriftNumericDeg,
        raanDriftAnalyticDeg: r.raanDriftAnalyticDeg,
        raanDriftDifferencePercent: r.raanDriftDifferencePercent,
        smaDriftKm: r.smaDriftKm,
        energyRelError: r.energyRelError,
        steps: r.steps,
        rejectedSteps: r.rejectedSteps,
        evaluations: r.evaluations,
        startOsculatingSmaKm: r.startOsculatingSmaKm,
        history: r.history.map((h) => ({ ...h })),
        theory: v.theory,
      },
      warnings,
      modelNotes: theoryNotes(v.theory),
    };
  },
});
