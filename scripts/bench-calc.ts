/**
 * Calc engine benchmark (npm run bench:calc).
 *  1. Median in-process time per runCalc call for each analytic kind (target < 50 µs).
 *     Rate-using kinds run with their default secular theory, "zonal" (J2², J4, J6).
 *  1b. A 25-year lifetime with orbit-averaged NRLMSISE-00 over the solar cycle (drag-decay, target < 500 ms).
 *  1c. injection-dispersion with 100 000 Monte-Carlo samples (target < 100 ms).
 *  2. propagation-check over 365 days, DOP853, relTol 1e-10, zonal harmonics J2…J6: wall time, steps, energy error.
 *  3. When scipy is importable: the same problem (J2…J6 force model, same initial state from the mean → osculating
 *     conversion, same rtol/atol) through scipy.integrate.solve_ivp (DOP853) in a python subprocess; speed ratio
 *     and both energy errors (target ≥ 30× at equal or better error).
 */
import { execFileSync } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { engineVersion, runCalc } from '../lib/calc/index';
import { evaluateNrlmsise00 } from '../lib/calc/topics/atmosphere/nrlmsise00';
import { buildMeanStartState } from '../lib/calc/topics/propagation/propagation-check';
import { createZonalForceModel } from '../lib/calc/topics/propagation/zonal-force';

const ANALYTIC_TARGET_US = 50;
const PROPAGATION_TARGET_S = 1;
const SCIPY_RATIO_TARGET = 30;

const CASES: [string, Record<string, unknown>][] = [
  ['sso-inclination', { altitudeKm: 700 }],
  ['node-rate', { altitudeKm: 700, inclinationDeg: 98.2 }],
  ['repeat-orbit', { revolutions: 233, days: 16 }],
  ['repeat-options', { minAltitudeKm: 695, maxAltitudeKm: 710, maxDays: 16 }],
  ['node-local-time', { epoch: '2025-03-20T10:00:00Z', ltanHours: 10.5 }],
  [
    'sun-geometry',
    {
      altitudeKm: 700,
      inclinationDeg: 98.19,
      ltanHours: 10.5,
      startEpoch: '2025-01-01T00:00:00Z',
      days: 365,
      stepDays: 1,
    },
  ],
  ['frozen-orbit', { altitudeKm: 700, inclinationDeg: 98.19 }],
  [
    'mean-to-osculating',
    { semiMajorAxisKm: 7078.137, eccentricity: 0.00115, inclinationDeg: 98.19, argPerigeeDeg: 90, meanAnomalyDeg: 30 },
  ],
  [
    'osculating-to-mean',
    { semiMajorAxisKm: 7085.4, eccentricity: 0.0012, inclinationDeg: 98.19, argPerigeeDeg: 90, meanAnomalyDeg: 30 },
  ],
  ['eclipse-duration', { altitudeKm: 700, betaDeg: 30 }],
  ['injection-sensitivity', { altitudeKm: 700, inclinationDeg: 98.19, inclinationErrorDeg: 0.05, altitudeErrorKm: 5 }],
  ['drag-decay', { altitudeKm: 500, massKg: 100, areaM2: 1, atmosphere: 'exponential' }],
  ['atmosphere-density', { epoch: '2025-03-20T10:00:00Z', altitudeKm: 500, latitudeDeg: 45, longitudeDeg: 10 }],
  [
    'ground-track',
    {
      altitudeKm: 700,
      inclinationDeg: 98.19,
      ltanHours: 10.5,
      startEpoch: '2025-01-01T00:00:00Z',
      hours: 24,
      stepSec: 60,
    },
  ],
  ['coverage', { altitudeKm: 699.6, swathKm: 185, revolutions: 233, days: 16 }],
  [
    'expression',
    { expression: '2 pi sqrt(a^3 / mu)', values: { a: '7078.137 km', mu: '398600.4418 km^3/s^2' }, unit: 'min' },
  ],
];

/** Rows produced per call, for a per-row figure on the series kinds. */
const ROWS_PER_CALL: Record<string, number> = { 'sun-geometry': 366, 'ground-track': 1441 };

function describeCase(kind: string, us: number): string {
  const rows = ROWS_PER_CALL[kind];
  if (rows) return `(${rows} rows: ${(us / rows).toFixed(2)} µs per row)`;
  if (kind === 'repeat-options')
    return '(band 695–710 km, cycles ≤ 16 d: 6 repeat solutions, about 15 candidates bracketed)';
  return '';
}

/** Median over batches of the mean time per call [µs]. */
function medianMicros(kind: string, inputs: Record<string, unknown>): number {
  const check = runCalc(kind, inputs);
  if (!check.ok) throw new Error(`${kind}: ${check.error}`);
  let perBatch = 1;
  for (;;) {
    const t0 = performance.now();
    for (let k = 0; k < perBatch; k++) runCalc(kind, inputs);
    if (performance.now() - t0 > 20 || perBatch >= 1 << 16) break;
    perBatch *= 2;
  }
  const samples: number[] = [];
  for (let b = 0; b < 25; b++) {
    const t0 = performance.now();
    for (let k = 0; k < perBatch; k++) runCalc(kind, inputs);
    samples.push(((performance.now() - t0) * 1000) / perBatch);
  }
  samples.sort((x, y) => x - y);
  return samples[Math.floor(samples.length / 2)];
}

function pad(s: string, n: number): string {
  return s.length >= n ? s : s + ' '.repeat(n - s.length);
}

function numberOut(o: Record<string, unknown>, name: string): number {
  const v = o[name];
  if (typeof v !== 'number') throw new Error(`missing output ${name}`);
  return v;
}

const NRLMSISE_TARGET_PER_S = 100_000;
const LIFETIME_TARGET_MS = 500;
const DISPERSION_TARGET_MS = 100;

/** injection-dispersion, 100 000 samples at 700 km SSO: median wall of 7 runs (each its own seed) after a warm-up [ms]. */
function dispersionMillis(): { ms: number; p997: number } {
  const inputs = { altitudeKm: 700, sigmaAltitudeKm: 2, sigmaInclinationDeg: 0.02, samples: 100_000 };
  runCalc('injection-dispersion', { ...inputs, seed: 99 }); // warm-up (JIT)
  const walls: number[] = [];
  let p997 = 0;
  for (let k = 0; k < 7; k++) {
    const t0 = performance.now();
    const r = runCalc('injection-dispersion', { ...inputs, seed: k });
    walls.push(performance.now() - t0);
    if (!r.ok) throw new Error(r.error);
    p997 = numberOut(r.result.outputs, 'ltanDriftP997MinPerYear');
  }
  return { ms: walls.sort((x, y) => x - y)[3], p997 };
}

/** NRLMSISE-00 model calls per second on one core, altitudes cycling 100–990 km (median of 5 one-second-ish runs). */
function nrlmsiseCallsPerSecond(): number {
  const input = {
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
  let sink = 0;
  const rates: number[] = [];
  for (let run = 0; run < 6; run++) {
    const n = 100_000;
    const t0 = performance.now();
    for (let k = 0; k < n; k++)
      sink += evaluateNrlmsise00({ ...input, altitudeKm: 100 + (k % 90) * 10 }).effectiveMassDensityGCm3;
    if (run > 0) rates.push(n / ((performance.now() - t0) / 1000)); // run 0 warms the JIT
  }
  if (!Number.isFinite(sink)) throw new Error('non-finite density');
  return rates.sort((a, b) => a - b)[2];
}

function main(): void {
  console.log(`${engineVersion} — benchmark on node ${process.version}`);
  console.log('\nAnalytic kinds: median time per runCalc call (validation + compute + result copy)');
  for (const [kind, inputs] of CASES) {
    const us = medianMicros(kind, inputs);
    const verdict = us < ANALYTIC_TARGET_US ? 'ok' : 'over target';
    console.log(
      `  ${pad(kind, 22)} ${pad(us.toFixed(1), 9)} µs   target < ${ANALYTIC_TARGET_US} µs  ${verdict} ${describeCase(kind, us)}`,
    );
  }

  const perSecond = nrlmsiseCallsPerSecond();
  console.log(
    `\nNRLMSISE-00 (100–990 km): ${Math.round(perSecond).toLocaleString('en-US')} calls/s on one core (target ≥ ${NRLMSISE_TARGET_PER_S.toLocaleString('en-US')}/s): ${perSecond >= NRLMSISE_TARGET_PER_S ? 'ok' : 'target missed'}`,
  );

  // about 25 years from 2026 for B = m/(C_D A) ≈ 45 kg/m² at the cycle's mean level
  const lifetimeCase = {
    altitudeKm: 590,
    massKg: 100,
    areaM2: 1,
    dragCoefficient: 2.2,
    startEpoch: '2026-01-01T00:00:00Z',
  };
  runCalc('drag-decay', { ...lifetimeCase, altitudeKm: 400 }); // warm-up (JIT)
  const lifeWalls: number[] = [];
  let life = runCalc('drag-decay', lifetimeCase);
  for (let k = 0; k < 3; k++) {
    const t0 = performance.now();
    life = runCalc('drag-decay', lifetimeCase);
    lifeWalls.push(performance.now() - t0);
  }
  if (!life.ok) throw new Error(life.error);
  const lifeMs = lifeWalls.sort((x, y) => x - y)[1];
  const lifeSeries = life.result.outputs.series as unknown[];
  console.log(
    `drag-decay NRLMSISE-00 over dates, 590 km, B ≈ 45 kg/m², from 2026-01-01: lifetime ${numberOut(life.result.outputs, 'lifetimeYears').toFixed(1)} yr (${lifeSeries.length} series rows): ${lifeMs.toFixed(0)} ms median of 3 (target < ${LIFETIME_TARGET_MS} ms): ${lifeMs < LIFETIME_TARGET_MS ? 'ok' : 'target missed'}`,
  );

  const dispersion = dispersionMillis();
  console.log(
    `injection-dispersion, 100 000 samples (700 km SSO, σ 2 km / 0.02°; 99.73 % drift ${dispersion.p997.toFixed(2)} min/yr): ${dispersion.ms.toFixed(0)} ms median of 7 (target < ${DISPERSION_TARGET_MS} ms): ${dispersion.ms < DISPERSION_TARGET_MS ? 'ok' : 'target missed'}`,
  );

  const prop = {
    altitudeKm: 700,
    inclinationDeg: 98.206,
    days: 365,
    integrator: 'dop853',
    relTol: 1e-10,
    zonalDegree: 6,
  };
  runCalc('propagation-check', { ...prop, days: 5 }); // warm-up (JIT)
  const walls: number[] = [];
  let r = runCalc('propagation-check', { ...prop, days: 1 });
  for (let k = 0; k < 3; k++) {
    const t0 = performance.now();
    r = runCalc('propagation-check', prop);
    walls.push((performance.now() - t0) / 1000);
  }
  const wall = walls.sort((x, y) => x - y)[1];
  if (!r.ok) throw new Error(r.error);
  const o = r.result.outputs;
  const jsEnergy = numberOut(o, 'energyRelError');
  console.log(
    `\npropagation-check: 700 km, ${prop.inclinationDeg}° (zonal SSO), 365 days, DOP853, relTol = atol = 1e-10, zonal harmonics J2…J${prop.zonalDegree}`,
  );
  console.log(
    `  wall ${wall.toFixed(3)} s, median of 3 runs (target < ${PROPAGATION_TARGET_S} s), steps ${numberOut(o, 'steps')}, evaluations ${numberOut(o, 'evaluations')}, energy rel. error ${jsEnergy.toExponential(2)}`,
  );
  console.log(
    `  RAAN drift numerical ${numberOut(o, 'raanDriftNumericDeg').toFixed(4)}° vs analytic ${numberOut(o, 'raanDriftAnalyticDeg').toFixed(4)}° (${numberOut(o, 'raanDriftDifferencePercent').toFixed(3)} %)`,
  );

  try {
    execFileSync('python3', ['-c', 'import scipy'], { stdio: 'ignore' });
  } catch {
    console.log('\nscipy not importable: reference comparison skipped');
    return;
  }
  const here = path.dirname(fileURLToPath(import.meta.url));
  const y0 = buildMeanStartState(
    6378.137 + prop.altitudeKm,
    (prop.inclinationDeg * Math.PI) / 180,
    createZonalForceModel(prop.zonalDegree),
  );
  const args = JSON.stringify({
    y0: [...y0],
    zonalDegree: prop.zonalDegree,
    days: prop.days,
    rtol: prop.relTol,
    atol: prop.relTol,
  });
  console.log(
    `\nscipy.integrate.solve_ivp (DOP853, same J2…J${prop.zonalDegree} problem and start state) — running, this takes a while …`,
  );
  const py = JSON.parse(
    execFileSync('python3', [path.join(here, 'bench-calc-scipy.py'), args], { encoding: 'utf8', maxBuffer: 1 << 20 }),
  ) as {
    wallSeconds: number;
    steps: number;
    evaluations: number;
    energyRelError: number;
  };
  const ratio = py.wallSeconds / wall;
  // 'equal or better' energy error, allowing 1 % for last-digit rounding differences
  const verdict = ratio >= SCIPY_RATIO_TARGET && jsEnergy <= py.energyRelError * 1.01 ? 'ok' : 'target missed';
  console.log(
    `  scipy wall ${py.wallSeconds.toFixed(2)} s, steps ${py.steps}, evaluations ${py.evaluations}, energy rel. error ${py.energyRelError.toExponential(2)}`,
  );
  console.log(
    `  speed ratio ${ratio.toFixed(1)}× (target ≥ ${SCIPY_RATIO_TARGET}× at equal or better energy error): ${verdict}`,
  );
  console.log(`  energy error: nodewright ${jsEnergy.toExponential(2)} vs scipy ${py.energyRelError.toExponential(2)}`);
}

main();
