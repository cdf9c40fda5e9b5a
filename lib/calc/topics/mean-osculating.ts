/**
 * Mean ↔ osculating elements: first-order J2 short-period terms.
 *
 * Definition. Mean elements are the osculating elements with their first-order J2 short-period variations
 * removed; the short-period variations have zero average over one revolution of the mean anomaly, so a mean
 * element equals the time average of the osculating one over a revolution (to first order in J2). This is
 * the short-period part of Kozai (1959) and Brouwer (1959); long-period terms (J3 and the O(J2·e) terms
 * of Brouwer) stay in the mean elements, as frozen-orbit theory expects.
 *
 * Method. First-order averaging (Kozai 1959 §3; Brouwer 1959 §5): along the mean Kepler orbit, the
 * short-period part δx of each element x obeys n̄ dδx/dM = F_x(M) − ⟨F_x⟩, where F_x is the rate of x from
 * Gauss's planetary equations with the J2 acceleration (Vallado 4th ed. eq. 9-24; Battin 1999 §10.2;
 * numbers from memory), and for the mean longitude λ = M + ω also −(3/2)(n̄/ā) δa from the change of mean
 * motion. F_x is sampled at N equally spaced mean anomalies and integrated term by term in its Fourier
 * series (exact for the truncated series; N is chosen so the dropped harmonics, which fall off like
 * (e/(1 + √(1 − e²)))^m, are below 1e-14). For e = 0 this reproduces Kozai's closed forms
 * (e.g. δa = (3/2) J2 R²/a sin²i cos 2u); for e > 0 Brouwer's.
 * Elements are used in the nonsingular set (a, e cos ω, e sin ω, i, Ω, λ = M + ω) of Lyddane (1963), so
 * e → 0 has no singularity; i → 0 and 180° are handled because the zonal normal force vanishes like sin i
 * (an equatorial orbit's RAAN is reported as 0).
 *
 * Accuracy: neglected second-order J2 and J3…J6 short-period terms reach a few tens of metres in a for LEO.
 * Frame: true-of-date equatorial (x toward the equinox of date, z along Earth's rotation axis); the zonal
 * field is symmetric about z, so no Earth-rotation angle is needed. Units: km, s, rad.
 * Valid for 0 ≤ e < 1 with perigee above the surface; the inverse iterates to 1e-6 km in a.
 */
import { EARTH_MU_KM3_S2, EARTH_RADIUS_KM, TWO_PI } from '../constants';
import { CalcInputError } from '../types';
import { wrapPi, wrapTwoPi } from './angles';
import { createZonalForceModel } from './propagation/zonal-force';
import { elementsToState, solveKeplerEquation, type KeplerElements, type StateVector, type Vec3 } from './kepler-state';

/** Perturbing acceleration [km/s²] at a position [km] (inertial equatorial frame), written into out. */
export type PerturbingAcceleration = (x: number, y: number, z: number, out: Float64Array) => void;

/**
 * Zonal perturbing acceleration of degrees 2…maxDegree (EGM-96 J_n): the engine's zonal force model
 * (propagation/zonalForce, Montenbruck & Gill §3.2) minus its two-body term. The subtraction loses about
 * 1e-16 of the central acceleration, under 1e-8 of the J9 term in low Earth orbit.
 */
export function createZonalAcceleration(maxDegree: number): PerturbingAcceleration {
  const model = createZonalForceModel(maxDegree);
  const y = new Float64Array(6);
  const d = new Float64Array(6);
  const mu = EARTH_MU_KM3_S2; // a local: the module binding is a property read per call under the CommonJS transform
  return (x, yy, z, out) => {
    y[0] = x;
    y[1] = yy;
    y[2] = z;
    model.derivative(0, y, d);
    const r2 = x * x + yy * yy + z * z;
    const k = mu / (r2 * Math.sqrt(r2));
    out[0] = d[3] + k * x;
    out[1] = d[4] + k * yy;
    out[2] = d[5] + k * z;
  };
}

/** J2 perturbing acceleration (the zonal model of degree 2). */
export const j2Acceleration: PerturbingAcceleration = createZonalAcceleration(2);

/** Nonsingular element set: a [km], ex = e cos ω, ey = e sin ω, i, Ω, λ = M + ω [rad]. */
interface Nonsingular {
  a: number;
  ex: number;
  ey: number;
  i: number;
  raan: number;
  lambda: number;
}

function toNonsingular(el: KeplerElements): Nonsingular {
  return {
    a: el.aKm,
    ex: el.e * Math.cos(el.argPerigeeRad),
    ey: el.e * Math.sin(el.argPerigeeRad),
    i: el.iRad,
    raan: el.raanRad,
    lambda: el.meanAnomalyRad + el.argPerigeeRad,
  };
}

/** Back to classical elements; for e = 0 the argument of perigee is 0 and M is the argument of latitude. */
function fromNonsingular(x: Nonsingular): KeplerElements {
  const e = Math.hypot(x.ex, x.ey);
  const w = e > 0 ? wrapTwoPi(Math.atan2(x.ey, x.ex)) : 0;
  return {
    aKm: x.a,
    e,
    iRad: x.i,
    raanRad: wrapTwoPi(x.raan),
    argPerigeeRad: w,
    meanAnomalyRad: wrapTwoPi(x.lambda - w),
  };
}

/**
 * Inclinations closer than this [rad] to 0 or π are evaluated at this distance: the node is ill-defined there
 * and Gauss's node equation is 0/0 (the zonal normal force vanishes like sin i); the limit is continuous.
 */
const MIN_INCLINATION_RAD = 1e-7;

/** Samples of the mean anomaly per revolution for eccentricity e (see module note). */
export function samplesPerRevolution(e: number): number {
  const rho = e / (1 + Math.sqrt(1 - e * e));
  const harmonics = rho < 1e-3 ? 8 : Math.ceil(Math.log(1e-14) / Math.log(rho)) + 6;
  return 2 * Math.max(8, Math.min(128, harmonics));
}

export interface ShortPeriodSeries {
  /** short-period parts at mean anomaly M0 + θ of the mean orbit (slow mean elements held fixed) */
  evaluate(theta: number): Nonsingular;
  /** the first `components` short-period parts in the order (a, e cos ω, e sin ω, i, Ω, λ) at θ, written into out (no allocation) */
  evaluateInto(theta: number, out: Float64Array, components: number): void;
  /** first-order secular rates ⟨F⟩ [per s] of a, e cos ω, e sin ω, i, Ω, λ (λ rate without the Kepler n̄) */
  secular: Nonsingular;
}

const COMPONENTS = 6;

/**
 * Calls visit(k, θ_k, F) for N equally spaced mean anomalies M0 + θ_k of the mean orbit `mean`, with F the
 * rates [per s] of (a, e cos ω, e sin ω, i, Ω, λ) from Gauss's equations for the acceleration `accel`, without
 * the Kepler n̄ in the λ rate (Vallado 4th ed. eq. 9-24 combined into the nonsingular set; the 1/e terms of ω̇
 * and Ṁ cancel analytically: (1 − η)/e = e/(1 + η)). Only k = 0…lastSample are visited (default: all N).
 */
function sampleGaussRates(
  mean: KeplerElements,
  accel: PerturbingAcceleration,
  N: number,
  visit: (k: number, theta: number, F: Float64Array) => void,
  lastSample = N - 1,
): void {
  const { aKm: a, e } = mean;
  const mu = EARTH_MU_KM3_S2;
  const p = a * (1 - e * e);
  const eta = Math.sqrt(1 - e * e);
  const h = Math.sqrt(mu * p);
  const ex = e * Math.cos(mean.argPerigeeRad);
  const ey = e * Math.sin(mean.argPerigeeRad);
  const iEff = Math.min(Math.PI - MIN_INCLINATION_RAD, Math.max(MIN_INCLINATION_RAD, mean.iRad));
  const si = Math.sin(iEff);
  const ci = Math.cos(iEff);
  const [cO, sO] = [Math.cos(mean.raanRad), Math.sin(mean.raanRad)];
  // node line and in-plane normal to it; orbit normal
  const nx: Vec3 = [cO, sO, 0];
  const ny: Vec3 = [-sO * ci, cO * ci, si];
  const nz: Vec3 = [sO * si, -cO * si, ci];
  const acc = new Float64Array(3);
  const F = new Float64Array(COMPONENTS);
  // cos u, sin u (u = ω + f) from E by the angle sum, with cos f = (cos E − e)/(1 − e cos E) and
  // sin f = η sin E/(1 − e cos E) (Vallado 4th ed. §2.2, from memory): no atan2 or half angles per sample
  const cw = Math.cos(mean.argPerigeeRad);
  const sw = Math.sin(mean.argPerigeeRad);
  const step = TWO_PI / N;
  for (let k = 0; k <= lastSample; k++) {
    const theta = step * k;
    const E = solveKeplerEquation(mean.meanAnomalyRad + theta, e);
    const cE = Math.cos(E);
    const sE = Math.sin(E);
    const oneMinusECosE = 1 - e * cE;
    const r = a * oneMinusECosE;
    const cf = (cE - e) / oneMinusECosE;
    const sf = (eta * sE) / oneMinusECosE;
    const cu = cw * cf - sw * sf;
    const su = sw * cf + cw * sf;
    const rx = r * (cu * nx[0] + su * ny[0]);
    const ry = r * (cu * nx[1] + su * ny[1]);
    const rz = r * (su * ny[2]);
    accel(rx, ry, rz, acc);
    // radial, along-track (in plane, ⊥ r) and normal components
    const R = (acc[0] * rx + acc[1] * ry + acc[2] * rz) / r;
    const S = acc[0] * (-su * nx[0] + cu * ny[0]) + acc[1] * (-su * nx[1] + cu * ny[1]) + acc[2] * (cu * ny[2]);
    const W = acc[0] * nz[0] + acc[1] * nz[1] + acc[2] * nz[2];
    const ecf = ex * cu + ey * su; // e cos f
    const esf = ex * su - ey * cu; // e sin f
    const nodeTerm = (r * su * W) / (h * si);
    F[0] = ((2 * a * a) / h) * (esf * R + (p / r) * S);
    F[1] = (p * su * R + ((p + r) * cu + r * ex) * S) / h + ey * ci * nodeTerm;
    F[2] = (-p * cu * R + ((p + r) * su + r * ey) * S) / h - ex * ci * nodeTerm;
    F[3] = (r * cu * W) / h;
    F[4] = nodeTerm;
    F[5] = (((-p * ecf) / (1 + eta) - 2 * eta * r) * R) / h + (((p + r) * esf) / (1 + eta)) * (S / h) - ci * nodeTerm;
    visit(k, theta, F);
  }
}

/**
 * First-order secular rates [per s] of (a, e cos ω, e sin ω, i, Ω, λ without n̄): Gauss's equations averaged
 * over the mean anomaly by the trapezoid rule on `samples` points (exact for harmonics below `samples`).
 */
export function computeAveragedRates(
  mean: KeplerElements,
  accel: PerturbingAcceleration,
  samples: number,
): Nonsingular {
  const avg = new Float64Array(COMPONENTS);
  sampleGaussRates(mean, accel, samples, (_k, _theta, F) => {
    for (let c = 0; c < COMPONENTS; c++) avg[c] += F[c] / samples;
  });
  return { a: avg[0], ex: avg[1], ey: avg[2], i: avg[3], raan: avg[4], lambda: avg[5] };
}

/**
 * The averaged rate of ξ = e cos ω [1/s] (as computeAveragedRates(mean, accel, samples).ex, even `samples`) for a
 * mean orbit with its perigee or apogee at M0 = 0 and ξ = 0 (ω = ±90°), from samples + 1 … half the work.
 * Why half suffices: the orbit points at M and −M are mirror images in the plane through the Earth's axis and
 * the apse line, a symmetry of the zonal field, so R and W are even in M and S is odd, which makes the ξ rate
 * (p sin u R + (p + r) cos u S)/h + η cos i · r sin u W/(h sin i) even in M; the trapezoid sum then pairs
 * θ_k with θ_(N−k).
 */
export function computeAveragedXiRateAtApse(
  mean: KeplerElements,
  accel: PerturbingAcceleration,
  samples: number,
): number {
  if (mean.meanAnomalyRad !== 0 || Math.abs(Math.cos(mean.argPerigeeRad)) > 1e-12 || samples % 2 !== 0) {
    throw new RangeError('computeAveragedXiRateAtApse needs M0 = 0, ω = ±90° and an even sample count');
  }
  const half = samples / 2;
  let sum = 0;
  sampleGaussRates(
    mean,
    accel,
    samples,
    (k, _theta, F) => {
      sum += k === 0 || k === half ? F[1] : 2 * F[1];
    },
    half,
  );
  return sum / samples;
}

const TABLES = new Map<number, { cos: Float64Array; sin: Float64Array }>();

/** (2/N) cos(m θ_k) and (2/N) sin(m θ_k) for θ_k = 2πk/N, m = 0…N/2 − 1, row k at offset k·N/2 (cached per N). */
function harmonicTables(N: number): { cos: Float64Array; sin: Float64Array } {
  let t = TABLES.get(N);
  if (!t) {
    const H = N / 2 - 1;
    t = { cos: new Float64Array(N * (H + 1)), sin: new Float64Array(N * (H + 1)) };
    for (let k = 0; k < N; k++) {
      for (let m = 1; m <= H; m++) {
        t.cos[k * (H + 1) + m] = (2 / N) * Math.cos((TWO_PI * k * m) / N);
        t.sin[k * (H + 1) + m] = (2 / N) * Math.sin((TWO_PI * k * m) / N);
      }
    }
    TABLES.set(N, t);
  }
  return t;
}

/**
 * Fourier series in the mean anomaly of the first-order short-period terms of the mean orbit `mean`
 * (its M is the origin θ = 0), for the perturbing acceleration `accel` (default J2). See the module note.
 */
export function computeShortPeriodSeries(
  mean: KeplerElements,
  accel: PerturbingAcceleration = j2Acceleration,
): ShortPeriodSeries {
  const a = mean.aKm;
  const n = Math.sqrt(EARTH_MU_KM3_S2 / (a * a * a));
  const N = samplesPerRevolution(mean.e);
  const H = N / 2 - 1;
  // Fourier coefficients F_c(θ) ≈ ⟨F_c⟩ + Σ_m A[c][m] cos mθ + B[c][m] sin mθ
  const A = new Float64Array(COMPONENTS * (H + 1));
  const B = new Float64Array(COMPONENTS * (H + 1));
  const avg = new Float64Array(COMPONENTS);
  const { cos, sin } = harmonicTables(N);
  sampleGaussRates(mean, accel, N, (k, _theta, F) => {
    const row = k * (H + 1);
    for (let c = 0; c < COMPONENTS; c++) {
      const f = F[c];
      avg[c] += f / N;
      const base = c * (H + 1);
      for (let m = 1; m <= H; m++) {
        A[base + m] += f * cos[row + m];
        B[base + m] += f * sin[row + m];
      }
    }
  });
  // λ also gets −(3/2)(n̄/ā) δa; δa has coefficients (A sin − B cos)/(m n̄), so this adds
  // cos coefficient (3/(2ā)) B^a_m/m and sin coefficient −(3/(2ā)) A^a_m/m to F_λ
  const L = 5 * (H + 1);
  for (let m = 1; m <= H; m++) {
    A[L + m] += ((1.5 / a) * B[m]) / m;
    B[L + m] -= ((1.5 / a) * A[m]) / m;
  }
  const d = new Float64Array(COMPONENTS);
  // zero-mean antiderivative in M: Σ (A_m sin mθ − B_m cos mθ) / m, divided by n̄
  const evaluateInto = (theta: number, out: Float64Array, components: number): void => {
    out.fill(0, 0, components);
    const c1 = Math.cos(theta);
    const s1 = Math.sin(theta);
    let cmTheta = c1;
    let smTheta = s1;
    for (let m = 1; m <= H; m++) {
      const sm = smTheta / m;
      const cm = cmTheta / m;
      for (let c = 0; c < components; c++) out[c] += A[c * (H + 1) + m] * sm - B[c * (H + 1) + m] * cm;
      // cos/sin of (m + 1)θ by the angle-addition recurrence
      const next = cmTheta * c1 - smTheta * s1;
      smTheta = smTheta * c1 + cmTheta * s1;
      cmTheta = next;
    }
    for (let c = 0; c < components; c++) out[c] /= n;
  };
  return {
    evaluate(theta: number): Nonsingular {
      evaluateInto(theta, d, COMPONENTS);
      return { a: d[0], ex: d[1], ey: d[2], i: d[3], raan: d[4], lambda: d[5] };
    },
    evaluateInto,
    secular: { a: avg[0], ex: avg[1], ey: avg[2], i: avg[3], raan: avg[4], lambda: avg[5] },
  };
}

const ORIGIN_WEIGHTS = new Map<number, { sin: Float64Array; cos: Float64Array }>();

/**
 * Per-sample weights of the series at θ = 0 (cached per N): Σ_m (2/N) sin(m θ_k)/m and Σ_m (2/N) cos(m θ_k)/m²,
 * m = 1…N/2 − 1, so that the δ of evaluate(0) is one weighted sum over the samples.
 */
function originWeights(N: number): { sin: Float64Array; cos: Float64Array } {
  let w = ORIGIN_WEIGHTS.get(N);
  if (!w) {
    const H = N / 2 - 1;
    const { cos, sin } = harmonicTables(N);
    w = { sin: new Float64Array(N), cos: new Float64Array(N) };
    for (let k = 0; k < N; k++) {
      for (let m = 1; m <= H; m++) {
        w.sin[k] += sin[k * (H + 1) + m] / m;
        w.cos[k] += cos[k * (H + 1) + m] / (m * m);
      }
    }
    ORIGIN_WEIGHTS.set(N, w);
  }
  return w;
}

/**
 * Short-period parts (a, e cos ω, e sin ω, i, Ω, λ) at the mean orbit's own mean anomaly, written into out:
 * the same sums as computeShortPeriodSeries(mean).evaluate(0) (−Σ_m B_m/m for each element, plus for λ the
 * (3/(2ā)) Σ_m A^a_m/m² of the mean-motion change), taken over the samples with precomputed weights. Used by
 * the inverse, which needs δ only at θ = 0 on every iteration.
 */
function computeShortPeriodAtOrigin(mean: KeplerElements, accel: PerturbingAcceleration, out: Float64Array): void {
  const a = mean.aKm;
  const n = Math.sqrt(EARTH_MU_KM3_S2 / (a * a * a));
  const N = samplesPerRevolution(mean.e);
  const w = originWeights(N);
  out.fill(0);
  let lambdaFromA = 0;
  sampleGaussRates(mean, accel, N, (k, _theta, F) => {
    const ws = w.sin[k];
    for (let c = 0; c < COMPONENTS; c++) out[c] -= F[c] * ws;
    lambdaFromA += F[0] * w.cos[k];
  });
  out[5] += (1.5 / a) * lambdaFromA;
  for (let c = 0; c < COMPONENTS; c++) out[c] /= n;
}

/** Short-period terms at the mean orbit's own mean anomaly and the first-order secular rates. */
export function computeShortPeriodTerms(
  mean: KeplerElements,
  accel: PerturbingAcceleration = j2Acceleration,
): { delta: Nonsingular; secular: Nonsingular } {
  const series = computeShortPeriodSeries(mean, accel);
  return { delta: series.evaluate(0), secular: series.secular };
}

function checkPerigee(el: KeplerElements, field: string): void {
  if (!(el.e >= 0 && el.e < 1)) throw new CalcInputError(field, `eccentricity ${el.e} is outside 0 ≤ e < 1`);
  if (el.aKm * (1 - el.e) <= EARTH_RADIUS_KM) {
    throw new CalcInputError(
      field,
      `perigee radius a(1 − e) = ${(el.aKm * (1 - el.e)).toFixed(1)} km is inside the Earth (equatorial radius ${EARTH_RADIUS_KM} km)`,
    );
  }
}

export interface OsculatingResult extends StateVector {
  osculating: KeplerElements;
}

/** Osculating elements and state (true-of-date equatorial frame, km, km/s) of the mean orbit `mean`. */
export function meanToOsculating(
  mean: KeplerElements,
  accel: PerturbingAcceleration = j2Acceleration,
): OsculatingResult {
  return createOsculatingOrbit(mean, accel)(0);
}

/** Refuses an osculating orbit (semi-major axis aKm, eccentricity e) that is open or reaches the surface. */
function checkOsculatingAboveSurface(aKm: number, e: number): void {
  if (e >= 1 || aKm * (1 - e) <= EARTH_RADIUS_KM) {
    throw new CalcInputError(
      'eccentricity',
      "the osculating orbit reaches the Earth's surface: the mean orbit is too low or too eccentric for this model",
    );
  }
}

/** Osculating elements at mean anomaly M0 + θ of the mean orbit, from its short-period series. */
function osculateElements(mean: KeplerElements, series: ShortPeriodSeries, theta: number): KeplerElements {
  const m = toNonsingular(mean);
  const delta = series.evaluate(theta);
  const osculating = fromNonsingular({
    a: m.a + delta.a,
    ex: m.ex + delta.ex,
    ey: m.ey + delta.ey,
    i: m.i + delta.i,
    raan: m.raan + delta.raan,
    lambda: m.lambda + theta + delta.lambda,
  });
  checkOsculatingAboveSurface(osculating.aKm, osculating.e);
  return osculating;
}

/**
 * The osculating eccentricity alone as a function of θ (as createOsculatingElements, same numbers): only the
 * a, e cos ω and e sin ω parts of the series are summed, for searches over the orbit.
 */
export function createOsculatingEccentricity(
  mean: KeplerElements,
  accel: PerturbingAcceleration = j2Acceleration,
): (theta: number) => number {
  checkPerigee(mean, 'semiMajorAxisKm');
  const series = computeShortPeriodSeries(mean, accel);
  const m = toNonsingular(mean);
  const d = new Float64Array(3);
  return (theta) => {
    series.evaluateInto(theta, d, 3);
    const e = Math.hypot(m.ex + d[1], m.ey + d[2]);
    checkOsculatingAboveSurface(m.a + d[0], e);
    return e;
  };
}

/**
 * The osculating elements of the mean orbit `mean` as a function of θ [rad], the mean anomaly counted from
 * the mean orbit's M0 (θ = n̄·t: equally spaced θ are equally spaced in time). The slow mean elements are held
 * fixed over θ (their drift within a revolution is O(J2) and not applied). The short-period series is built once.
 */
export function createOsculatingElements(
  mean: KeplerElements,
  accel: PerturbingAcceleration = j2Acceleration,
): (theta: number) => KeplerElements {
  checkPerigee(mean, 'semiMajorAxisKm');
  const series = computeShortPeriodSeries(mean, accel);
  return (theta) => osculateElements(mean, series, theta);
}

/** As createOsculatingElements, with the osculating state (true-of-date equatorial frame, km, km/s). */
export function createOsculatingOrbit(
  mean: KeplerElements,
  accel: PerturbingAcceleration = j2Acceleration,
): (theta: number) => OsculatingResult {
  const elements = createOsculatingElements(mean, accel);
  return (theta) => {
    const osculating = elements(theta);
    return { osculating, ...elementsToState(osculating) };
  };
}

/** Largest iteration count of osculatingToMean (it converges in about 4 steps for LEO). */
export const MAX_MEAN_ITERATIONS = 60;
/**
 * Last-step limits of the inverse: 1e-4 km in a, 1e-8 in the angles [rad] and eccentricity components. The map is
 * a contraction with factor of the order of the short-period terms' relative size (≈ 1e-3 in LEO, below 1e-2 for
 * e ≤ 0.5), so the error left after a step this small is below 1e-6 km in a and 1e-10 in the rest.
 */
export const MEAN_STEP_LIMIT_KM = 1e-4;
const ANGLE_STEP_LIMIT = 1e-8;

/**
 * Mean elements whose osculating image (meanToOsculating) equals `osc`: fixed-point iteration
 * x̄ ← x̄ + (x_osc − osc(x̄)) in the nonsingular set, to about 1e-6 km in a and 1e-10 in the other elements
 * (1e-10 rad ≈ 0.7 mm along a LEO orbit).
 */
export function osculatingToMean(osc: KeplerElements, accel: PerturbingAcceleration = j2Acceleration): KeplerElements {
  checkPerigee(osc, 'semiMajorAxisKm');
  const target = toNonsingular(osc);
  const x = { ...target };
  const delta = new Float64Array(COMPONENTS);
  for (let it = 0; it < MAX_MEAN_ITERATIONS; it++) {
    const trial = fromNonsingular(x);
    if (trial.e >= 1 || trial.aKm * (1 - trial.e) <= EARTH_RADIUS_KM) break;
    // the osculating image of the trial mean orbit at its own mean anomaly, x̄ + δ(x̄) (meanToOsculating without the state)
    computeShortPeriodAtOrigin(trial, accel, delta);
    const image = {
      a: x.a + delta[0],
      ex: x.ex + delta[1],
      ey: x.ey + delta[2],
      i: x.i + delta[3],
      raan: x.raan + delta[4],
      lambda: x.lambda + delta[5],
    };
    checkOsculatingAboveSurface(image.a, Math.hypot(image.ex, image.ey));
    const dA = target.a - image.a;
    const dEx = target.ex - image.ex;
    const dEy = target.ey - image.ey;
    const dI = target.i - image.i;
    const dRaan = wrapPi(target.raan - image.raan);
    const dLambda = wrapPi(target.lambda - image.lambda);
    x.a += dA;
    x.ex += dEx;
    x.ey += dEy;
    x.i += dI;
    x.raan += dRaan;
    x.lambda += dLambda;
    if (
      Math.abs(dA) < MEAN_STEP_LIMIT_KM &&
      Math.max(Math.abs(dEx), Math.abs(dEy), Math.abs(dI), Math.abs(dRaan), Math.abs(dLambda)) < ANGLE_STEP_LIMIT
    ) {
      return fromNonsingular(x);
    }
  }
  throw new CalcInputError(
    'semiMajorAxisKm',
    'the mean elements could not be found (the iteration did not converge): the orbit is too low or too eccentric for this model',
  );
}
