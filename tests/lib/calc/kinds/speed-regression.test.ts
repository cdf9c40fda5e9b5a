import { describe, expect, it } from 'vitest';
import { num, outputsOf } from './helpers';

/**
 * REGRESSION VALUES, NOT AN OUTSIDE CHECK. The numbers below were printed by engine 2.0.0 at commit 176ed99,
 * before frozen-orbit and osculating-to-mean were made faster (per-sample true anomaly from E without atan2,
 * δ at θ = 0 as one weighted sum in the inverse, eccentricity-only evaluation in the osculating-range search).
 * They only show that the faster code gives the same numbers; the physics is checked against published and
 * numerical references in frozenOrbit.test.ts and meanToOsculating.test.ts.
 *
 * Tolerance: 1e-9 relative, far below display precision (e to 1e-7, a to 1e-4 km, angles to 1e-4…1e-5 deg);
 * eccentricities also 1e-12 absolute, because the frozen solution's secant stops at a 1e-12 step and the
 * rate it zeroes carries rounding noise of that order (a near-zero frozen e, e.g. 1.5e-5 at 66°, moves by 2e-13).
 */
const REL = 1e-9;
const ECC_ABS = 1e-12;

function expectSame(name: string, actual: number, expected: number): void {
  const tol = Math.max(REL * Math.abs(expected), /ccentricity/.test(name) ? ECC_ABS : 0);
  expect(Math.abs(actual - expected), `${name}: ${actual} vs ${expected}`).toBeLessThanOrEqual(tol);
}

const FROZEN: { altitudeKm: number; inclinationDeg: number; outputs: Record<string, number> }[] = [
  {
    altitudeKm: 500,
    inclinationDeg: 97.4,
    outputs: {
      eccentricity: 0.0012790430555007508,
      eccentricityJ2J3: 0.0010756185211808946,
      argPerigeeDeg: 90,
      oscEccentricityMin: 0.0005333754108135472,
      oscEccentricityMax: 0.0030823289970117115,
      perigeeAltitudeKm: 512.2340959361163,
      apogeeAltitudeKm: 529.8289571647265,
    },
  },
  {
    altitudeKm: 700,
    inclinationDeg: 98.19,
    outputs: {
      eccentricity: 0.0012032942406440348,
      eccentricityJ2J3: 0.0010432547754930122,
      argPerigeeDeg: 90,
      oscEccentricityMin: 0.0004964662823213747,
      oscEccentricityMax: 0.0028949902761613794,
      perigeeAltitudeKm: 712.4354789497565,
      apogeeAltitudeKm: 729.469635791691,
    },
  },
  {
    altitudeKm: 785,
    inclinationDeg: 98.5,
    outputs: {
      eccentricity: 0.0011745353462643783,
      eccentricityJ2J3: 0.0010300573600240048,
      argPerigeeDeg: 90,
      oscEccentricityMin: 0.0004803525104508325,
      oscEccentricityMax: 0.0028217565534375587,
      perigeeAltitudeKm: 797.5060800140709,
      apogeeAltitudeKm: 814.3327888499034,
    },
  },
  {
    altitudeKm: 1336,
    inclinationDeg: 66,
    outputs: {
      eccentricity: 1.498839251759046e-5,
      eccentricityJ2J3: 0.0008834952614246214,
      argPerigeeDeg: 270,
      oscEccentricityMin: 0.00027302839818437466,
      oscEccentricityMax: 0.001066625486643308,
      perigeeAltitudeKm: 1353.7426766176632,
      apogeeAltitudeKm: 1353.97392115607,
    },
  },
  {
    altitudeKm: 900,
    inclinationDeg: 45,
    outputs: {
      eccentricity: 0.0006641705122843342,
      eccentricityJ2J3: 0.0007248133526384968,
      argPerigeeDeg: 90,
      oscEccentricityMin: 0.0002986852388441685,
      oscEccentricityMax: 0.0012055908288365472,
      perigeeAltitudeKm: 905.8808786009613,
      apogeeAltitudeKm: 915.5486848295113,
    },
  },
  {
    altitudeKm: 600,
    inclinationDeg: 120,
    outputs: {
      eccentricity: 0.001748713814486972,
      eccentricityJ2J3: 0.0009258754091953049,
      argPerigeeDeg: 90,
      oscEccentricityMin: 0.000727409700731049,
      oscEccentricityMax: 0.002762455690401666,
      perigeeAltitudeKm: 603.8535950956639,
      apogeeAltitudeKm: 628.2590386701986,
    },
  },
];

const OSC_TO_MEAN: { inputs: Record<string, number>; outputs: Record<string, number> }[] = [
  {
    inputs: {
      semiMajorAxisKm: 7085.4,
      eccentricity: 0.0012,
      inclinationDeg: 98.19,
      raanDeg: 40,
      argPerigeeDeg: 90,
      meanAnomalyDeg: 30,
    },
    outputs: {
      meanSemiMajorAxisKm: 7089.993416857492,
      meanEccentricity: 0.0022062485008408532,
      meanInclinationDeg: 98.18734983051378,
      meanRaanDeg: 39.9953292404692,
      meanArgPerigeeDeg: 114.16448553730997,
      meanMeanAnomalyDeg: 5.883028054839,
    },
  },
  {
    inputs: {
      semiMajorAxisKm: 6878.137,
      eccentricity: 0,
      inclinationDeg: 97.4,
      raanDeg: 40,
      argPerigeeDeg: 0,
      meanAnomalyDeg: 200,
    },
    outputs: {
      meanSemiMajorAxisKm: 6870.895765738297,
      meanEccentricity: 0.0003639035200367754,
      meanInclinationDeg: 97.40392434487622,
      meanRaanDeg: 40.00330926108385,
      meanArgPerigeeDeg: 74.03441209513556,
      meanMeanAnomalyDeg: 125.92806262452102,
    },
  },
  {
    inputs: {
      semiMajorAxisKm: 7714.4,
      eccentricity: 0.0011,
      inclinationDeg: 66.04,
      raanDeg: 40,
      argPerigeeDeg: 270,
      meanAnomalyDeg: 10,
    },
    outputs: {
      meanSemiMajorAxisKm: 7721.1648507961845,
      meanEccentricity: 0.002094024109296882,
      meanInclinationDeg: 66.05109478532513,
      meanRaanDeg: 40.00443476207591,
      meanArgPerigeeDeg: 277.689060363313,
      meanMeanAnomalyDeg: 2.3228195518244408,
    },
  },
  {
    inputs: {
      semiMajorAxisKm: 8000,
      eccentricity: 0.05,
      inclinationDeg: 45,
      raanDeg: 40,
      argPerigeeDeg: 30,
      meanAnomalyDeg: 120,
    },
    outputs: {
      meanSemiMajorAxisKm: 7997.685718922363,
      meanEccentricity: 0.050173477435827785,
      meanInclinationDeg: 44.991200372488144,
      meanRaanDeg: 40.021174331380344,
      meanArgPerigeeDeg: 29.428867235225912,
      meanMeanAnomalyDeg: 120.57048202733624,
    },
  },
  {
    inputs: {
      semiMajorAxisKm: 7200,
      eccentricity: 0.01,
      inclinationDeg: 120,
      raanDeg: 40,
      argPerigeeDeg: 180,
      meanAnomalyDeg: 300,
    },
    outputs: {
      meanSemiMajorAxisKm: 7203.7194982103765,
      meanEccentricity: 0.01053202935725163,
      meanInclinationDeg: 119.99165038702371,
      meanRaanDeg: 39.98535138742262,
      meanArgPerigeeDeg: 177.94916329704847,
      meanMeanAnomalyDeg: 302.07834750014354,
    },
  },
];

describe('frozen-orbit: same numbers as before the speed-up (regression values)', () => {
  it.each(FROZEN)('$altitudeKm km, $inclinationDeg°', ({ altitudeKm, inclinationDeg, outputs }) => {
    const o = outputsOf('frozen-orbit', { altitudeKm, inclinationDeg });
    for (const [name, expected] of Object.entries(outputs)) expectSame(name, num(o, name), expected);
  });
});

describe('osculating-to-mean: same numbers as before the speed-up (regression values)', () => {
  it.each(OSC_TO_MEAN)(
    'a = $inputs.semiMajorAxisKm km, e = $inputs.eccentricity, i = $inputs.inclinationDeg°',
    ({ inputs, outputs }) => {
      const o = outputsOf('osculating-to-mean', inputs);
      for (const [name, expected] of Object.entries(outputs)) expectSame(name, num(o, name), expected);
    },
  );
});
