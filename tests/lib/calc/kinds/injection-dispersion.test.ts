import { describe, expect, it } from 'vitest';
import {
  quantileInPlace,
  quantileSorted,
  computeHohmannDeltaV,
} from '../../../../lib/calc/topics/injection-dispersion';
import { expectFieldError, num, outputsOf, resultOf, rows } from './helpers';

const BASE = { altitudeKm: 700, sigmaAltitudeKm: 2, sigmaInclinationDeg: 0.02 };

describe('injection-dispersion against the analytic root-sum-square of the engine’s own sensitivities', () => {
  /**
   * Outside reference: for Gaussian errors small enough that the drift is linear in them, the drift is Gaussian
   * with σ = √(s_i² + s_h²), s = the injection-sensitivity drifts at 1σ errors (an independent code path: one exact
   * rate difference per error); two-sided 99.73 % of a normal variable = 3σ (normal table). Tolerance 3 % (issue
   * #15); the sample scatter of the 99.73 % quantile at 100 000 samples is about 0.6 %.
   */
  for (const c of [
    { name: 'SSO 700 km, σh 2 km, σi 0.02°', inputs: { ...BASE } },
    {
      name: 'SSO 500 km, σh 5 km, σi 0.05°, j2 theory',
      inputs: { altitudeKm: 500, sigmaAltitudeKm: 5, sigmaInclinationDeg: 0.05, theory: 'j2' },
    },
    {
      name: 'given inclination 97.8° at 800 km, σi only',
      inputs: { altitudeKm: 800, inclinationDeg: 97.8, sigmaAltitudeKm: 0, sigmaInclinationDeg: 0.03 },
    },
  ]) {
    it(`${c.name}: 99.73 % of |drift| within 3 % of 3σ linear, σ within 2 %`, () => {
      const mc = outputsOf('injection-dispersion', { ...c.inputs, samples: 100_000, seed: 2026 });
      const inc = num(mc, 'inclinationDeg');
      const s = outputsOf('injection-sensitivity', {
        altitudeKm: c.inputs.altitudeKm,
        inclinationDeg: inc,
        inclinationErrorDeg: c.inputs.sigmaInclinationDeg,
        altitudeErrorKm: c.inputs.sigmaAltitudeKm,
        theory: 'theory' in c.inputs ? c.inputs.theory : 'zonal',
      });
      const rss = Math.hypot(num(s, 'driftFromInclinationMinPerYear'), num(s, 'driftFromAltitudeMinPerYear'));
      expect(Math.abs(num(mc, 'ltanDriftP997MinPerYear') / (3 * rss) - 1)).toBeLessThan(0.03);
      expect(Math.abs(num(mc, 'ltanDriftSigmaMinPerYear') / rss - 1)).toBeLessThan(0.02);
      // the plane change of the 99.73 % inclination error: 2 v sin(3σ/2), v from the sensitivity kind's own 1σ value
      expect(Math.abs(num(mc, 'planeChangeDeltaVP997Mps') / (3 * num(s, 'planeChangeDeltaVMps')) - 1)).toBeLessThan(
        0.03,
      );
    });
  }

  it('SSO inclination when none is given equals sso-inclination (zonal, 1e-12°)', () => {
    const mc = outputsOf('injection-dispersion', { ...BASE, samples: 1000 });
    expect(num(mc, 'inclinationDeg')).toBeCloseTo(
      num(outputsOf('sso-inclination', { altitudeKm: 700 }), 'inclinationDeg'),
      12,
    );
    expect(Math.abs(num(mc, 'nominalDriftMinPerYear'))).toBeLessThan(1e-9);
  });
});

describe('injection-dispersion: reproducibility', () => {
  it('the same seed gives identical outputs bit for bit; another seed gives different numbers', () => {
    const a = resultOf('injection-dispersion', { ...BASE, sigmaLtanMin: 3, samples: 20_000, seed: 11 });
    const b = resultOf('injection-dispersion', { ...BASE, sigmaLtanMin: 3, samples: 20_000, seed: 11 });
    const c = resultOf('injection-dispersion', { ...BASE, sigmaLtanMin: 3, samples: 20_000, seed: 12 });
    expect(JSON.stringify(b.outputs)).toBe(JSON.stringify(a.outputs));
    for (const name of [
      'ltanDriftP997MinPerYear',
      'ltanDriftSigmaMinPerYear',
      'correctionDeltaVP997Mps',
      'ltanDeviationOneYearP997Min',
    ]) {
      expect(Object.is(num(a.outputs, name), num(b.outputs, name))).toBe(true);
      expect(num(c.outputs, name)).not.toBe(num(a.outputs, name));
    }
  });

  it('adding a local-time error changes only the one-year deviation (separate random stream)', () => {
    const without = outputsOf('injection-dispersion', { ...BASE, samples: 5000, seed: 5 });
    const withLtan = outputsOf('injection-dispersion', { ...BASE, samples: 5000, seed: 5, sigmaLtanMin: 4 });
    expect(num(withLtan, 'ltanDriftP997MinPerYear')).toBe(num(without, 'ltanDriftP997MinPerYear'));
    expect(num(without, 'ltanDeviationOneYearP997Min')).toBe(num(without, 'ltanDriftP997MinPerYear'));
    // drift (σ ≈ 3.77 min after a year) and offset (σ 4 min) add in quadrature: 3 × 5.5 ≈ 16.5 min
    expect(num(withLtan, 'ltanDeviationOneYearP997Min')).toBeGreaterThan(15);
    expect(num(withLtan, 'ltanDeviationOneYearP997Min')).toBeLessThan(18);
  });
});

describe('injection-dispersion: outputs and refusals', () => {
  it('histogram holds every sample, bins contiguous and symmetric about zero', () => {
    const o = outputsOf('injection-dispersion', { ...BASE, samples: 10_000, seed: 3 });
    const h = rows(o, 'histogram');
    expect(h.reduce((s, r) => s + r.count, 0)).toBe(10_000);
    for (let k = 1; k < h.length; k++) expect(h[k].binLowMinPerYear).toBeCloseTo(h[k - 1].binHighMinPerYear, 12);
    expect(h[0].binLowMinPerYear).toBeCloseTo(-h[h.length - 1].binHighMinPerYear, 12);
  });

  it('zero errors give zero drift and zero ΔV', () => {
    const o = outputsOf('injection-dispersion', {
      altitudeKm: 600,
      sigmaAltitudeKm: 0,
      sigmaInclinationDeg: 0,
      samples: 1000,
    });
    expect(num(o, 'ltanDriftP997MinPerYear')).toBe(0);
    expect(num(o, 'correctionDeltaVP997Mps')).toBe(0);
  });

  it('refuses more than 100 000 samples, a fractional seed, and an altitude spread reaching below 150 km', () => {
    expect(expectFieldError('injection-dispersion', { ...BASE, samples: 100_001 }, 'samples')).toMatch(
      /at most 100000/,
    );
    expect(expectFieldError('injection-dispersion', { ...BASE, seed: 1.5 }, 'seed')).toMatch(/integer/);
    expect(
      expectFieldError('injection-dispersion', { altitudeKm: 200, sigmaAltitudeKm: 10 }, 'sigmaAltitudeKm'),
    ).toMatch(/below 150 km/);
  });
});

describe('injection-dispersion helpers', () => {
  it('selection gives the same quantile as a full sort (Hyndman & Fan definition 7)', () => {
    const values = Float64Array.from({ length: 5001 }, (_, k) => (Math.sin(k * 12.9898) * 43758.5453) % 1);
    for (const p of [0, 0.5, 0.9973, 1])
      expect(quantileInPlace(Float64Array.from(values), p)).toBe(quantileSorted(Float64Array.from(values).sort(), p));
    // definition 7 on 1…5: the 0.9973 quantile is 1 + 4 × 0.9973
    expect(quantileSorted(Float64Array.from([1, 2, 3, 4, 5]), 0.9973)).toBeCloseTo(4.9892, 12);
  });

  it('Hohmann 6778 → 7078 km (300 km raise) ≈ 164.3 m/s (vis-viva by hand: 0.0826 + 0.0817 km/s)', () => {
    expect(computeHohmannDeltaV(6778.137, 7078.137) * 1000).toBeCloseTo(164.3, 0);
    expect(computeHohmannDeltaV(7078.137, 6778.137)).toBe(computeHohmannDeltaV(6778.137, 7078.137));
  });
});

/**
 * REGRESSION VALUES, NOT AN OUTSIDE CHECK: printed by this kind when it was written (engine 2.0.0). A frozen revision
 * must recompute its stored numbers exactly, so these are compared bit for bit (toBe): any change to the generator,
 * the seeding, the normal deviates, the secular rates or the quantile moves them and must come with an engine version
 * and change-log entry. The physics is checked above against the root-sum-square of injection-sensitivity.
 */
const PINNED = [
  {
    inputs: {
      altitudeKm: 700,
      sigmaAltitudeKm: 2,
      sigmaInclinationDeg: 0.02,
      sigmaLtanMin: 3,
      samples: 100000,
      seed: 2026,
    },
    outputs: {
      ltanDriftP997MinPerYear: 11.362181370392063,
      ltanDriftSigmaMinPerYear: 3.7759945491204405,
      meanDriftMinPerYear: 0.004529937738607706,
      ltanDeviationOneYearP997Min: 14.532900033253734,
      planeChangeDeltaVP997Mps: 7.847460543211077,
      altitudeDeltaVP997Mps: 3.1380622675627072,
      correctionDeltaVP997Mps: 8.983694582580027,
      nominalDriftMinPerYear: -7.657510851161415e-13,
      inclinationDeg: 98.20591606343646,
      samples: 100000,
    },
    counts: [
      1, 1, 7, 9, 23, 61, 77, 166, 332, 520, 866, 1308, 1977, 2762, 3600, 4786, 5784, 7051, 7842, 8430, 8547, 8415,
      7869, 7121, 6015, 4592, 3815, 2721, 1959, 1334, 827, 531, 296, 177, 97, 52, 14, 9, 3, 2, 1,
    ],
  },
  {
    inputs: {
      altitudeKm: 500,
      inclinationDeg: 97.1,
      sigmaAltitudeKm: 5,
      sigmaInclinationDeg: 0.05,
      samples: 20000,
      seed: 7,
      theory: 'j2',
    },
    outputs: {
      ltanDriftP997MinPerYear: 30.835784670391323,
      ltanDriftSigmaMinPerYear: 10.377164235695632,
      meanDriftMinPerYear: 0.04125943746743116,
      ltanDeviationOneYearP997Min: 30.835784670391323,
      planeChangeDeltaVP997Mps: 19.92773707077421,
      altitudeDeltaVP997Mps: 8.567658702439912,
      correctionDeltaVP997Mps: 22.549299434204595,
      nominalDriftMinPerYear: -58.408514656360985,
      inclinationDeg: 97.1,
      samples: 20000,
    },
    counts: [
      0, 2, 2, 3, 9, 19, 38, 61, 88, 164, 235, 309, 474, 612, 808, 1031, 1066, 1365, 1438, 1553, 1505, 1455, 1460, 1297,
      1139, 962, 803, 632, 504, 334, 242, 153, 96, 56, 37, 20, 14, 6, 3, 3, 2,
    ],
  },
];

describe('injection-dispersion: the same numbers as when written (regression values, exact)', () => {
  for (const c of PINNED) {
    it(`seed ${c.inputs.seed}, ${c.inputs.samples} samples`, () => {
      const o = outputsOf('injection-dispersion', c.inputs);
      for (const [name, value] of Object.entries(c.outputs)) expect(o[name], name).toBe(value);
      expect(rows(o, 'histogram').map((b) => b.count)).toEqual(c.counts);
    });
  }
});
