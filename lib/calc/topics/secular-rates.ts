/**
 * Secular rates of the mean elements under Earth's zonal harmonics — the one module every kind calls.
 *
 * Two theories, chosen by a switch that every rate-using kind exposes as its `theory` input:
 *
 *  - `"j2"`: first-order J2 (Kozai 1959, Astron. J. 64, 367–377; Vallado 4th ed. §9.6):
 *      Ω̇ = −(3/2) n J2 (R/p)² cos i,  ω̇ = (3/4) n J2 (R/p)² (4 − 5 sin² i),
 *      Ṁ = n [1 + (3/4) J2 (R/p)² √(1−e²) (2 − 3 sin² i)].
 *
 *  - `"zonal"` (default): J2 to second order plus J4 and J6 to first order, in Brouwer mean elements
 *    (Brouwer 1959, Astron. J. 64, 378–397, secular part of his solution). With η = √(1−e²), θ = cos i,
 *    γ2' = (J2/2)(R/a)²/η⁴ and n0 = √(μ/a³) of the Brouwer mean semi-major axis a (the time average of
 *    the osculating a, to first order):
 *      l̇/n0 = 1 + (3/2)γ2'η(3θ² − 1)
 *             + (3/32)γ2'²η[−15 + 16η + 25η² + (30 − 96η − 90η²)θ² + (105 + 144η + 25η²)θ⁴]
 *      ġ/n0 = (3/2)γ2'(5θ² − 1) + (3/32)γ2'²[−35 + 24η + 25η² + (90 − 192η − 126η²)θ² + (385 + 360η + 45η²)θ⁴]
 *      ḣ/n0 = −3γ2'θ + (3/8)γ2'²[(−5 + 12η + 9η²)θ + (−35 − 36η − 5η²)θ³]
 *    (l = M, g = ω, h = Ω; equation numbers of the paper not checked — the e → 0 limits of these J2²
 *    terms equal the secular J2² terms of SGP4, Hoots & Roehrich 1980 Spacetrack Report No. 3, which the
 *    tests check). The J4 and J6 terms are the first-order secular rates of an even zonal J_k, from
 *    Lagrange's planetary equations applied to the orbit average of its potential (Kaula 1966, Theory of
 *    Satellite Geodesy, §3.3, the ω-independent term p = k/2, q = 0; same J4 result as Brouwer's γ4 terms
 *    and Vallado 4th ed. eq. 9-41):
 *      R̄_k = −(μ/a) J_k (R/a)^k A_k(sin² i) η^−(2k−1) Q_k(e),
 *      A_k = ⟨P_k(sin i sin u)⟩_u,  Q_k = ⟨(1 + e cos f)^(k−1)⟩_f,
 *      Ω̇ = R̄_i/(n a² η sin i),  ω̇ = −cos i R̄_i/(n a² η sin i) + η R̄_e/(n a² e),  Ṁ = n − 2 R̄_a/(n a) − η² R̄_e/(n a² e).
 *    The long-period terms (in ω; J3, J5 and the ω-dependent parts of J4, J6) are not secular and are left out.
 *
 * Units: a km, angles rad, rates rad/s. Valid for a > R⊕ and 0 ≤ e ≲ 0.1 (Brouwer's theory is singular at
 * e → 1 and its long-period terms near the critical inclination 63.43°/116.57°, where ω̇ → 0; the secular
 * rates themselves stay finite there). Accuracy: the neglected terms are O(J2³) ≈ 1e-9 relative and J2·J4,
 * J8 … ≈ 1e-6 relative of the node rate.
 */
import {
  EARTH_J2,
  EARTH_J4,
  EARTH_J6,
  EARTH_MU_KM3_S2,
  EARTH_RADIUS_KM,
  EARTH_ROTATION_RAD_S,
  TWO_PI,
} from '../constants';

/** Secular theory of a rate computation: first-order J2, or J2² + J4 + J6 in Brouwer mean elements. */
export type SecularTheory = 'zonal' | 'j2';
export const SECULAR_THEORIES = ['zonal', 'j2'] as const;
export const DEFAULT_THEORY: SecularTheory = 'zonal';

export interface SecularRates {
  /** Keplerian mean motion √(μ/a³) of the mean semi-major axis [rad/s] */
  n: number;
  /** node rate Ω̇ [rad/s] */
  nodeRate: number;
  /** argument-of-perigee rate ω̇ [rad/s] */
  perigeeRate: number;
  /** mean-anomaly rate Ṁ [rad/s] */
  meanAnomalyRate: number;
}

/** Keplerian mean motion √(μ/a³) [rad/s] for a in km. */
export function computeMeanMotion(aKm: number): number {
  return Math.sqrt(EARTH_MU_KM3_S2 / (aKm * aKm * aKm));
}

/** Semi-major axis [km] from Keplerian mean motion [rad/s]. */
export function semiMajorAxisFromMeanMotion(n: number): number {
  return Math.cbrt(EARTH_MU_KM3_S2 / (n * n));
}

/** The factor (3/2) n J2 (R/p)² [rad/s] shared by all first-order J2 rates. */
export function computeJ2RateFactor(aKm: number, e: number): number {
  const p = aKm * (1 - e * e);
  const rp = EARTH_RADIUS_KM / p;
  return 1.5 * computeMeanMotion(aKm) * EARTH_J2 * rp * rp;
}

/** (k−1)!!/k!! = ⟨sin^k u⟩ over a full turn, k even. */
function meanPowerOfSine(k: number): number {
  let r = 1;
  for (let j = 1; j < k; j += 2) r *= j / (j + 1);
  return r;
}

/** Binomial coefficient C(n, k). */
function binomial(n: number, k: number): number {
  let r = 1;
  for (let j = 1; j <= k; j++) r = (r * (n - k + j)) / j;
  return r;
}

/** Coefficients c_j of the Legendre polynomial P_k(x) = Σ c_j x^j (Bonnet's recursion). */
function legendreCoefficients(k: number): number[] {
  let prev = [1];
  let cur = [0, 1];
  if (k === 0) return prev;
  for (let m = 1; m < k; m++) {
    const next = new Array<number>(m + 2).fill(0);
    for (let j = 0; j < cur.length; j++) next[j + 1] += ((2 * m + 1) / (m + 1)) * cur[j];
    for (let j = 0; j < prev.length; j++) next[j] -= (m / (m + 1)) * prev[j];
    prev = cur;
    cur = next;
  }
  return cur;
}

/** Precomputed averages for an even zonal of degree k: A_k(w) = Σ b_j w^j (w = sin² i), Q_k(e) = Σ q_j e^(2j). */
interface EvenZonalAverages {
  degree: number;
  /** A_k coefficients in powers of w = sin² i */
  b: number[];
  /** Q_k coefficients in powers of e² */
  q: number[];
}

function buildEvenZonalAverages(k: number): EvenZonalAverages {
  const c = legendreCoefficients(k);
  const b: number[] = [];
  for (let j = 0; 2 * j <= k; j++) b.push((c[2 * j] ?? 0) * meanPowerOfSine(2 * j));
  const q: number[] = [];
  for (let j = 0; 2 * j <= k - 1; j++) q.push(binomial(k - 1, 2 * j) * meanPowerOfSine(2 * j));
  return { degree: k, b, q };
}

const J4_AVERAGES = buildEvenZonalAverages(4);
const J6_AVERAGES = buildEvenZonalAverages(6);

function polynomial(coeffs: number[], x: number): number {
  let r = 0;
  for (let j = coeffs.length - 1; j >= 0; j--) r = r * x + coeffs[j];
  return r;
}

function polynomialDerivative(coeffs: number[], x: number): number {
  let r = 0;
  for (let j = coeffs.length - 1; j >= 1; j--) r = r * x + j * coeffs[j];
  return r;
}

/**
 * First-order secular rates [rad/s] of an even zonal harmonic J_k (k = 2, 4, 6 …) added to `out`
 * (see the module note: Lagrange's equations on the orbit-averaged potential). n0 is the mean motion [rad/s].
 */
function addEvenZonalFirstOrder(
  out: SecularRates,
  avg: EvenZonalAverages,
  jk: number,
  aKm: number,
  e: number,
  cosI: number,
  n0: number,
): void {
  const k = avg.degree;
  const w = 1 - cosI * cosI;
  const e2 = e * e;
  const eta2 = 1 - e2;
  const eta = Math.sqrt(eta2);
  const scale = n0 * jk * (EARTH_RADIUS_KM / aKm) ** k;
  const a0 = polynomial(avg.b, w);
  const a0w = polynomialDerivative(avg.b, w);
  const qk = polynomial(avg.q, e2);
  // Q'(e)/e = 2 dQ/d(e²)
  const qkOverE = 2 * polynomialDerivative(avg.q, e2);
  // H(e) = η^−(2k−1) Q(e);  H'(e)/e = (2k−1) η^−(2k+1) Q + η^−(2k−1) Q'/e
  const etaPow = eta2 ** (-(2 * k - 1) / 2);
  const h = etaPow * qk;
  const hPrimeOverE = ((2 * k - 1) * etaPow * qk) / eta2 + etaPow * qkOverE;
  out.nodeRate += -scale * (h / eta) * 2 * cosI * a0w;
  out.perigeeRate += scale * ((h / eta) * 2 * cosI * cosI * a0w - a0 * eta * hPrimeOverE);
  out.meanAnomalyRate += scale * a0 * (-2 * (k + 1) * h + eta2 * hPrimeOverE);
}

/** Brouwer's (1959) secular J2² terms [rad/s] added to `out` (module note). */
function addBrouwerJ2Squared(out: SecularRates, aKm: number, e: number, cosI: number, n0: number): void {
  const eta2 = 1 - e * e;
  const eta = Math.sqrt(eta2);
  const g2 = (0.5 * EARTH_J2 * (EARTH_RADIUS_KM / aKm) ** 2) / (eta2 * eta2);
  const k = (3 / 32) * g2 * g2 * n0;
  const t2 = cosI * cosI;
  const t4 = t2 * t2;
  out.meanAnomalyRate +=
    k * eta * (-15 + 16 * eta + 25 * eta2 + (30 - 96 * eta - 90 * eta2) * t2 + (105 + 144 * eta + 25 * eta2) * t4);
  out.perigeeRate +=
    k * (-35 + 24 * eta + 25 * eta2 + (90 - 192 * eta - 126 * eta2) * t2 + (385 + 360 * eta + 45 * eta2) * t4);
  out.nodeRate += 4 * k * ((-5 + 12 * eta + 9 * eta2) * cosI + (-35 - 36 * eta - 5 * eta2) * t2 * cosI);
}

/**
 * Secular rates for mean semi-major axis aKm [km], eccentricity e [-], inclination iRad [rad] in the
 * chosen theory (default "zonal"; see the module note for formulas, sources and validity).
 * zonalDegree (2…6, default 6) limits the zonal theory to the harmonics of a force model of that degree
 * (J4 from 4, J6 from 6; the odd zonals have no first-order secular effect), so a numerical run with J2…J_N
 * is compared with the analytic rates of the same field.
 */
export function computeSecularRates(
  aKm: number,
  e: number,
  iRad: number,
  theory: SecularTheory = DEFAULT_THEORY,
  zonalDegree = 6,
): SecularRates {
  const n = computeMeanMotion(aKm);
  const k = computeJ2RateFactor(aKm, e);
  const cosI = Math.cos(iRad);
  const s2 = 1 - cosI * cosI;
  const rates: SecularRates = {
    n,
    nodeRate: -k * cosI,
    perigeeRate: 0.5 * k * (4 - 5 * s2),
    meanAnomalyRate: n + 0.5 * k * Math.sqrt(1 - e * e) * (2 - 3 * s2),
  };
  if (theory === 'j2') return rates;
  addBrouwerJ2Squared(rates, aKm, e, cosI, n);
  if (zonalDegree >= 4) addEvenZonalFirstOrder(rates, J4_AVERAGES, EARTH_J4, aKm, e, cosI, n);
  if (zonalDegree >= 6) addEvenZonalFirstOrder(rates, J6_AVERAGES, EARTH_J6, aKm, e, cosI, n);
  return rates;
}

/** Second derivative of a polynomial Σ c_j x^j at x. */
function polynomialSecondDerivative(coeffs: number[], x: number): number {
  let r = 0;
  for (let j = coeffs.length - 1; j >= 2; j--) r = r * x + j * (j - 1) * coeffs[j];
  return r;
}

/**
 * Node rate Ω̇ [rad/s] and its derivative dΩ̇/d(cos i) [rad/s] at mean a [km], e, cos i in `theory` — the same
 * terms as computeSecularRates, differentiated analytically (every term is cos i times a polynomial in cos² i),
 * for Newton solutions in cos i (sun-synchronous inclination).
 */
export function computeNodeRateWithSlope(
  aKm: number,
  e: number,
  cosI: number,
  theory: SecularTheory = DEFAULT_THEORY,
  zonalDegree = 6,
): { rate: number; slope: number } {
  const k = computeJ2RateFactor(aKm, e);
  let rate = -k * cosI;
  let slope = -k;
  if (theory === 'j2') return { rate, slope };
  const n0 = computeMeanMotion(aKm);
  const eta2 = 1 - e * e;
  const eta = Math.sqrt(eta2);
  const g2 = (0.5 * EARTH_J2 * (EARTH_RADIUS_KM / aKm) ** 2) / (eta2 * eta2);
  const kk = (3 / 8) * g2 * g2 * n0;
  const alpha = -5 + 12 * eta + 9 * eta2;
  const beta = -35 - 36 * eta - 5 * eta2;
  const c2 = cosI * cosI;
  rate += kk * (alpha * cosI + beta * c2 * cosI);
  slope += kk * (alpha + 3 * beta * c2);
  const w = 1 - c2;
  for (const [avg, jk] of [
    [J4_AVERAGES, EARTH_J4],
    [J6_AVERAGES, EARTH_J6],
  ] as const) {
    if (avg.degree > zonalDegree) continue;
    const etaPow = eta2 ** (-(2 * avg.degree - 1) / 2);
    const factor = 2 * n0 * jk * (EARTH_RADIUS_KM / aKm) ** avg.degree * ((etaPow * polynomial(avg.q, e * e)) / eta);
    const d1 = polynomialDerivative(avg.b, w);
    rate -= factor * cosI * d1;
    slope -= factor * (d1 - 2 * c2 * polynomialSecondDerivative(avg.b, w));
  }
  return { rate, slope };
}

/** Nodal (draconitic) period [s]: 2π / (ω̇ + Ṁ), time between ascending-node crossings. */
export function computeNodalPeriod(rates: SecularRates): number {
  return TWO_PI / (rates.perigeeRate + rates.meanAnomalyRate);
}

/** Length of a nodal day [s]: 2π / (ω⊕ − Ω̇), Earth's rotation relative to the orbit plane. */
export function computeNodalDay(nodeRate: number): number {
  return TWO_PI / (EARTH_ROTATION_RAD_S - nodeRate);
}

/** The sentence each model note carries to say which secular theory produced its numbers. */
export function describeTheory(theory: SecularTheory): string {
  return theory === 'zonal'
    ? 'Secular theory "zonal": J2 to second order (Brouwer 1959) plus J4 and J6 to first order, EGM-96 coefficients; elements are Brouwer mean elements (mean semi-major axis = time average of the osculating one).'
    : 'Secular theory "j2": first-order J2 only (Kozai 1959), the textbook rates; kept for comparison — it misses the J2², J4 and J6 terms (about 0.02° in sun-synchronous inclination).';
}
