/**
 * First-order J2 secular rates of a near-circular or eccentric orbit (mean elements).
 * Method: Kozai (1959) "The motion of a close earth satellite", Astron. J. 64, 367–377, and
 * Brouwer (1959) Astron. J. 64, 378–397; same form in Vallado 4th ed. §9.6 (secular J2 rates).
 *   Ω̇ = −(3/2) n J2 (R/p)² cos i
 *   ω̇ =  (3/4) n J2 (R/p)² (4 − 5 sin² i)
 *   Ṁ = n [1 + (3/4) J2 (R/p)² √(1−e²) (2 − 3 sin² i)]
 * n is the Keplerian mean motion √(μ/a³). Units: a km, angles rad, rates rad/s.
 * Valid range: a > R⊕, 0 ≤ e < 1; accuracy O(J2²) ≈ 0.1 % of the rates.
 */
import { EARTH_J2, EARTH_MU_KM3_S2, EARTH_RADIUS_KM, EARTH_ROTATION_RAD_S, TWO_PI } from '../constants';

export interface SecularRates {
  /** Keplerian mean motion [rad/s] */
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

/** The factor (3/2) n J2 (R/p)² [rad/s] shared by all secular J2 rates. */
export function computeJ2RateFactor(aKm: number, e: number): number {
  const p = aKm * (1 - e * e);
  const rp = EARTH_RADIUS_KM / p;
  return 1.5 * computeMeanMotion(aKm) * EARTH_J2 * rp * rp;
}

/** Secular J2 rates for semi-major axis aKm [km], eccentricity e [-], inclination iRad [rad]. */
export function computeSecularRates(aKm: number, e: number, iRad: number): SecularRates {
  const n = computeMeanMotion(aKm);
  const k = computeJ2RateFactor(aKm, e);
  const s2 = Math.sin(iRad) ** 2;
  return {
    n,
    nodeRate: -k * Math.cos(iRad),
    perigeeRate: 0.5 * k * (4 - 5 * s2),
    meanAnomalyRate: n + 0.5 * k * Math.sqrt(1 - e * e) * (2 - 3 * s2),
  };
}

/** Nodal (draconitic) period [s]: 2π / (ω̇ + Ṁ), time between ascending-node crossings. */
export function computeNodalPeriod(rates: SecularRates): number {
  return TWO_PI / (rates.perigeeRate + rates.meanAnomalyRate);
}

/** Length of a nodal day [s]: 2π / (ω⊕ − Ω̇), Earth's rotation relative to the orbit plane. */
export function computeNodalDay(nodeRate: number): number {
  return TWO_PI / (EARTH_ROTATION_RAD_S - nodeRate);
}
