/**
 * NRLMSISE-00 against the model's own published check values: the test driver released with the
 * public-domain C version of the model (D. Brodowski, release 20041227, nrlmsise-00_test.c; its printed
 * output is listed in the release's DOCUMENTATION file and equals the official FORTRAN package's,
 * except case 4's anomalous O, printed 0.000E-00 by the FORTRAN build and 2.819879E-42 by the C build).
 *
 * Driver inputs: base case day 172, UT 29000 s, 400 km, 60° N, 70° W, LST 16 h, F10.7A = F10.7 = 150,
 * Ap = 4; each other case changes one input. Cases 16 and 17 use the Ap-history mode (switch 9 = −1)
 * with all seven Ap values = 100. Output columns as printed by the driver (%E, 7 significant digits):
 * He, O, N2, O2, Ar [cm⁻³], ρ [g/cm³] (GTD7, without anomalous O), H, N, anomalous O [cm⁻³], T∞, T [K].
 * Tolerance: half a unit of the last printed digit.
 */
import { describe, expect, it } from 'vitest';
import { evaluateNrlmsise00, type Nrlmsise00Input } from '@/lib/calc/topics/atmosphere/nrlmsise00';
import { PAVGM, PD, PDL, PDM, PMA, PS, PT, PTL, PTM } from '@/lib/calc/topics/atmosphere/nrlmsise00-coefficients';

const base: Nrlmsise00Input = {
  dayOfYear: 172,
  utSeconds: 29000,
  altitudeKm: 400,
  latitudeDeg: 60,
  longitudeDeg: -70,
  localSolarTimeHours: 16,
  f107Average: 150,
  f107: 150,
  ap: 4,
};
const apHistory = [100, 100, 100, 100, 100, 100, 100];

const CASES: [string, Partial<Nrlmsise00Input>, string][] = [
  [
    '1 base case, 400 km',
    {},
    '6.665177E+05 1.138806E+08 1.998211E+07 4.022764E+05 3.557465E+03 4.074714E-15 3.475312E+04 4.095913E+06 2.667273E+04 1.250540E+03 1.241416E+03',
  ],
  [
    '2 day 81',
    { dayOfYear: 81 },
    '3.407293E+06 1.586333E+08 1.391117E+07 3.262560E+05 1.559618E+03 5.001846E-15 4.854208E+04 4.380967E+06 6.956682E+03 1.166754E+03 1.161710E+03',
  ],
  [
    '3 UT 75000 s, 1000 km',
    { utSeconds: 75000, altitudeKm: 1000 },
    '1.123767E+05 6.934130E+04 4.247105E+01 1.322750E-01 2.618848E-05 2.756772E-18 2.016750E+04 5.741256E+03 2.374394E+04 1.239892E+03 1.239891E+03',
  ],
  [
    '4 100 km',
    { altitudeKm: 100 },
    '5.411554E+07 1.918893E+11 6.115826E+12 1.225201E+12 6.023212E+10 3.584426E-10 1.059880E+07 2.615737E+05 2.819879E-42 1.027318E+03 2.068878E+02',
  ],
  [
    '5 latitude 0°',
    { latitudeDeg: 0 },
    '1.851122E+06 1.476555E+08 1.579356E+07 2.633795E+05 1.588781E+03 4.809630E-15 5.816167E+04 5.478984E+06 1.264446E+03 1.212396E+03 1.208135E+03',
  ],
  [
    '6 longitude 0°',
    { longitudeDeg: 0 },
    '8.673095E+05 1.278862E+08 1.822577E+07 2.922214E+05 2.402962E+03 4.355866E-15 3.686389E+04 3.897276E+06 2.667273E+04 1.220146E+03 1.212712E+03',
  ],
  [
    '7 local solar time 4 h',
    { localSolarTimeHours: 4 },
    '5.776251E+05 6.979139E+07 1.236814E+07 2.492868E+05 1.405739E+03 2.470651E-15 5.291986E+04 1.069814E+06 2.667273E+04 1.116385E+03 1.112999E+03',
  ],
  [
    '8 F10.7A 70',
    { f107Average: 70 },
    '3.740304E+05 4.782720E+07 5.240380E+06 1.759875E+05 5.501649E+02 1.571889E-15 8.896776E+04 1.979741E+06 9.121815E+03 1.031247E+03 1.024848E+03',
  ],
  [
    '9 F10.7 180',
    { f107: 180 },
    '6.748339E+05 1.245315E+08 2.369010E+07 4.911583E+05 4.578781E+03 4.564420E-15 3.244595E+04 5.370833E+06 2.667273E+04 1.306052E+03 1.293374E+03',
  ],
  [
    '10 Ap 40',
    { ap: 40 },
    '5.528601E+05 1.198041E+08 3.495798E+07 9.339618E+05 1.096255E+04 4.974543E-15 2.686428E+04 4.889974E+06 2.805445E+04 1.361868E+03 1.347389E+03',
  ],
  [
    '11 0 km',
    { altitudeKm: 0 },
    '1.375488E+14 0.000000E+00 2.049687E+19 5.498695E+18 2.451733E+17 1.261066E-03 0.000000E+00 0.000000E+00 0.000000E+00 1.027318E+03 2.814648E+02',
  ],
  [
    '12 10 km',
    { altitudeKm: 10 },
    '4.427443E+13 0.000000E+00 6.597567E+18 1.769929E+18 7.891680E+16 4.059139E-04 0.000000E+00 0.000000E+00 0.000000E+00 1.027318E+03 2.274180E+02',
  ],
  [
    '13 30 km',
    { altitudeKm: 30 },
    '2.127829E+12 0.000000E+00 3.170791E+17 8.506280E+16 3.792741E+15 1.950822E-05 0.000000E+00 0.000000E+00 0.000000E+00 1.027318E+03 2.374389E+02',
  ],
  [
    '14 50 km',
    { altitudeKm: 50 },
    '1.412184E+11 0.000000E+00 2.104370E+16 5.645392E+15 2.517142E+14 1.294709E-06 0.000000E+00 0.000000E+00 0.000000E+00 1.027318E+03 2.795551E+02',
  ],
  [
    '15 70 km',
    { altitudeKm: 70 },
    '1.254884E+10 0.000000E+00 1.874533E+15 4.923051E+14 2.239685E+13 1.147668E-07 0.000000E+00 0.000000E+00 0.000000E+00 1.027318E+03 2.190732E+02',
  ],
  [
    '16 Ap history (all 100), 400 km',
    { apHistory },
    '5.196477E+05 1.274494E+08 4.850450E+07 1.720838E+06 2.354487E+04 5.881940E-15 2.500078E+04 6.279210E+06 2.667273E+04 1.426412E+03 1.408608E+03',
  ],
  [
    '17 Ap history (all 100), 100 km',
    { apHistory, altitudeKm: 100 },
    '4.260860E+07 1.241342E+11 4.929562E+12 1.048407E+12 4.993465E+10 2.914304E-10 8.831229E+06 2.252516E+05 2.415246E-42 1.027318E+03 1.934071E+02',
  ],
];

const COLUMNS = ['He', 'O', 'N2', 'O2', 'Ar', 'rho', 'H', 'N', 'anomalous O', 'Tinf', 'T'] as const;

/** |actual − printed| ≤ half a unit in the 7th significant digit of the printed %E value. */
function expectPrinted(actual: number, printed: string, what: string): void {
  const ref = Number(printed);
  const exponent = Number(printed.split('E')[1]);
  const halfUlp = 0.5e-6 * 10 ** exponent;
  if (ref === 0) {
    expect(actual, what).toBe(0);
    return;
  }
  expect(Math.abs(actual - ref), `${what}: ${actual.toExponential(6)} vs printed ${printed}`).toBeLessThanOrEqual(
    halfUlp * 1.0000001,
  );
}

describe('NRLMSISE-00 published test-driver output (C release 20041227)', () => {
  it.each(CASES)('case %s', (_name, change, printed) => {
    const r = evaluateNrlmsise00({ ...base, ...change });
    const values = [
      r.he,
      r.o,
      r.n2,
      r.o2,
      r.ar,
      r.massDensityGCm3,
      r.h,
      r.n,
      r.anomalousO,
      r.exosphericTemperatureK,
      r.temperatureK,
    ];
    const refs = printed.split(/\s+/);
    expect(refs).toHaveLength(11);
    values.forEach((v, k) => expectPrinted(v, refs[k], COLUMNS[k]));
  });

  it('the effective (drag) density of GTD7D adds anomalous O at 16 amu to the GTD7 total (case 1: 4.074714e-15 + 16·1.66e-24·2.667273e4 g/cm³)', () => {
    const r = evaluateNrlmsise00(base);
    expect(r.effectiveMassDensityGCm3 / (4.074714e-15 + 16 * 1.66e-24 * 2.667273e4)).toBeCloseTo(1, 6);
  });

  it('coefficient arrays have the published sizes', () => {
    expect(PT).toHaveLength(150);
    expect(PS).toHaveLength(150);
    expect(PD).toHaveLength(9);
    for (const row of PD) expect(row).toHaveLength(150);
    expect(PDL.map((r) => r.length)).toEqual([25, 25]);
    expect(PTL.map((r) => r.length)).toEqual([100, 100, 100, 100]);
    expect(PMA.map((r) => r.length)).toEqual(Array(10).fill(100));
    expect(PTM).toHaveLength(10);
    expect(PDM.map((r) => r.length)).toEqual(Array(8).fill(10));
    expect(PAVGM).toHaveLength(10);
    // every lower-atmosphere expansion carries the parameter-set marker 2.0 at index 99 (checked by GLOB7S in the release)
    for (const row of [...PTL, ...PMA]) expect(row[99]).toBe(2);
  });

  it('refuses an Ap history that is not 7 values', () => {
    expect(() => evaluateNrlmsise00({ ...base, apHistory: [1, 2, 3] })).toThrow(/7 values/);
  });
});
