import { integerField, numberField } from '../fields';
import { REF } from '../references';
import { defineKind } from '../registry';
import { toDeg, toRad } from '../topics/angles';
import { computeInjectionDispersion, P997 } from '../topics/injection-dispersion';
import { semiMajorAxisFromAltitude, solveSsoInclination } from '../topics/sun-synchronous';
import {
  altitudeKm,
  intOut,
  numOut,
  orbitWarnings,
  rowsOut,
  SECULAR_VALIDITY,
  theory,
  THEORY_OUTPUT,
  theoryNotes,
} from './common';

/** Most samples one call may draw (memory ≈ 6 arrays × 8 bytes × samples; about 60 ms at the maximum). */
export const MAX_DISPERSION_SAMPLES = 100_000;
const HISTOGRAM_BINS = 41;
/** The lowest sampled altitude (nominal − 6σ) must stay above this [km]. */
const LOWEST_SAMPLED_ALTITUDE_KM = 150;

export const injectionDispersionKind = defineKind({
  kind: 'injection-dispersion',
  title: 'Injection dispersion (Monte-Carlo)',
  summary:
    'Spread of the node local-time drift caused by Gaussian altitude and inclination injection errors, its 99.73 % value, and the ΔV that corrects the 99.73 % case; seeded, so a revision reproduces its numbers.',
  inputs: {
    altitudeKm: altitudeKm(),
    inclinationDeg: numberField('Nominal inclination', 'deg', {
      min: 0,
      max: 180,
      optional: true,
      help: 'empty ⇒ sun-synchronous at the altitude (secular theory below)',
    }),
    sigmaAltitudeKm: numberField('Altitude injection error (1σ)', 'km', { min: 0, max: 50, default: 2 }),
    sigmaInclinationDeg: numberField('Inclination injection error (1σ)', 'deg', { min: 0, max: 1, default: 0.02 }),
    sigmaLtanMin: numberField('Local-time injection error (1σ)', 'min', {
      min: 0,
      max: 120,
      optional: true,
      help: 'empty ⇒ none; enters only the one-year local-time deviation',
    }),
    samples: integerField('Monte-Carlo samples', null, {
      min: 1000,
      max: MAX_DISPERSION_SAMPLES,
      default: MAX_DISPERSION_SAMPLES,
      help: `at most ${MAX_DISPERSION_SAMPLES.toLocaleString('en-US')}; the 99.73 % value rests on the 0.27 % tail (270 samples at 100 000)`,
    }),
    seed: integerField('Random seed', null, {
      min: 0,
      max: 4_294_967_295,
      default: 1,
      help: 'the same seed gives the same numbers bit for bit',
    }),
    theory: theory(),
  },
  check(v): Record<string, string> {
    const lowest = v.altitudeKm - 6 * v.sigmaAltitudeKm;
    return lowest >= LOWEST_SAMPLED_ALTITUDE_KM
      ? {}
      : {
          sigmaAltitudeKm: `sigmaAltitudeKm: altitude − 6σ = ${lowest.toFixed(1)} km falls below ${LOWEST_SAMPLED_ALTITUDE_KM} km; lower σ or raise the altitude`,
        };
  },
  outputs: [
    numOut('ltanDriftP997MinPerYear', 'Local-time drift, 99.73 % of |drift|', 'min/yr', 2),
    numOut('ltanDriftSigmaMinPerYear', 'Local-time drift, standard deviation', 'min/yr', 3),
    numOut('meanDriftMinPerYear', 'Local-time drift, sample mean', 'min/yr', 3),
    numOut('ltanDeviationOneYearP997Min', 'Local-time deviation after one year uncorrected, 99.73 %', 'min', 2),
    numOut('planeChangeDeltaVP997Mps', 'Plane-change ΔV, 99.73 %', 'm/s', 2),
    numOut('altitudeDeltaVP997Mps', 'Altitude-correction ΔV (Hohmann), 99.73 %', 'm/s', 2),
    numOut('correctionDeltaVP997Mps', 'Correction ΔV (plane change + Hohmann), 99.73 %', 'm/s', 2),
    numOut('nominalDriftMinPerYear', 'Local-time drift of the nominal orbit', 'min/yr', 2),
    numOut('inclinationDeg', 'Nominal inclination', 'deg', 4),
    intOut('samples', 'Samples drawn'),
    rowsOut('histogram', 'Distribution of the local-time drift', [
      numOut('driftMinPerYear', 'Drift (bin centre)', 'min/yr', 3),
      numOut('binLowMinPerYear', 'Bin from', 'min/yr', 3),
      numOut('binHighMinPerYear', 'Bin to', 'min/yr', 3),
      intOut('count', 'Samples'),
    ]),
    THEORY_OUTPUT,
  ],
  figures: [
    {
      name: 'histogram',
      title: 'Distribution of the local-time drift',
      rows: 'histogram',
      x: 'driftMinPerYear',
      y: ['count'],
    },
  ],
  heavy: true,
  costInputs: { samples: 'fewer samples (e.g. 20 000)' },
  model: {
    method:
      'Monte-Carlo over independent zero-mean Gaussian injection errors in mean altitude and inclination (and, if given, local time of the node); each sample’s local-time drift is the exact difference of secular node rates of the chosen theory against the nominal orbit, at 4 min of local time per degree of node. Pseudo-random numbers: xoshiro128** seeded through SplitMix64 from the seed, normal deviates by Marsaglia’s polar method; the 99.73 % values are sample quantiles (Hyndman & Fan definition 7).',
    assumptions: [
      '99.73 % is the two-sided 3σ coverage of a normal distribution: for small errors the drift is linear in them and Gaussian, so the 99.73 % value of |drift| equals 3 × the root-sum-square of the injection-sensitivity drifts at 1σ (checked within 3 % at 100 000 samples).',
      'Correction ΔV of a sample: an inclination-only plane change at a node, 2 v sin(|Δi|/2), plus a separate two-impulse Hohmann transfer back to the nominal circular altitude; a combined manoeuvre costs less, so the sum is an upper bound. The 99.73 % values of the three ΔV outputs are each taken over the samples separately (the total is not the sum of the two quantiles). The local-time offset is not corrected by a manoeuvre.',
      'Errors are independent and unbiased; a launcher’s correlated or biased dispersions need its own covariance. The drift is a secular rate; third-body (solar) inclination drift and drag are left out.',
      `Reproducible: the same seed and inputs give identical numbers; the sample scatter of the 99.73 % value is about 0.6 % at 100 000 samples and grows as 1/√samples. P = ${P997}.`,
      SECULAR_VALIDITY,
    ],
    references: [
      REF.kozai1959,
      REF.brouwer1959,
      'D. A. Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013): Hohmann transfer and inclination-only plane change Δv = 2 v sin(Δi/2)',
      'D. Blackman and S. Vigna, Scrambled linear pseudorandom number generators, ACM Transactions on Mathematical Software (2021); authors’ reference code xoshiro128starstar.c, prng.di.unimi.it (xoshiro128**)',
      'G. L. Steele Jr., D. Lea and C. H. Flood, Fast splittable pseudorandom number generators, OOPSLA 2014, 453–472, doi:10.1145/2660193.2660195 (SplitMix64 seeding)',
      'Polar method for normal deviates (G. Marsaglia, 1964), as described in D. E. Knuth, The Art of Computer Programming, Vol. 2: Seminumerical Algorithms',
      'R. J. Hyndman and Y. Fan, Sample quantiles in statistical packages, The American Statistician 50(4) (1996) 361–365, doi:10.1080/00031305.1996.10473566',
    ],
  },
  compute(v) {
    const aKm = semiMajorAxisFromAltitude(v.altitudeKm);
    const iRad = v.inclinationDeg !== undefined ? toRad(v.inclinationDeg) : solveSsoInclination(aKm, 0, v.theory);
    const r = computeInjectionDispersion({
      aKm,
      iRad,
      sigmaAltitudeKm: v.sigmaAltitudeKm,
      sigmaInclinationRad: toRad(v.sigmaInclinationDeg),
      sigmaLtanMin: v.sigmaLtanMin ?? 0,
      samples: v.samples,
      seed: v.seed,
      theory: v.theory,
      histogramBins: HISTOGRAM_BINS,
    });
    const warnings = orbitWarnings({ altitudeKm: v.altitudeKm, inclinationDeg: toDeg(iRad) });
    if (Math.abs(r.nominalDriftMinPerYear) > 1)
      warnings.push(
        `The nominal orbit is not sun-synchronous: its own node drifts ${r.nominalDriftMinPerYear.toFixed(1)} min/yr against the mean Sun; the dispersion is about that drift.`,
      );
    if (v.samples < 10_000)
      warnings.push(
        `With ${v.samples} samples the 99.73 % values rest on about ${Math.round(v.samples * (1 - P997))} tail samples: expect a few per cent of scatter between seeds.`,
      );
    return {
      outputs: {
        ltanDriftP997MinPerYear: r.ltanDriftP997MinPerYear,
        ltanDriftSigmaMinPerYear: r.ltanDriftSigmaMinPerYear,
        meanDriftMinPerYear: r.meanDriftMinPerYear,
        ltanDeviationOneYearP997Min: r.ltanDeviationOneYearP997Min,
        planeChangeDeltaVP997Mps: r.planeChangeDeltaVP997Mps,
        altitudeDeltaVP997Mps: r.altitudeDeltaVP997Mps,
        correctionDeltaVP997Mps: r.correctionDeltaVP997Mps,
        nominalDriftMinPerYear: r.nominalDriftMinPerYear,
        inclinationDeg: toDeg(iRad),
        samples: v.samples,
        histogram: r.histogram.map((b) => ({ ...b })),
        theory: v.theory,
      },
      warnings,
      modelNotes: theoryNotes(v.theory),
    };
  },
});
