/**
 * Repeat ground-track design with the secular rates of the chosen theory (secularRates.ts).
 * Condition (Vallado 4th ed. §11.4 repeat ground tracks; Wertz, Orbit & Constellation
 * Design and Management, §2.2 — section numbers from memory):
 *     R · T_N = D · T_ND,   T_N = 2π/(ω̇ + Ṁ) nodal period,  T_ND = 2π/(ω⊕ − Ω̇) nodal day,
 * so the ground track repeats after R revolutions in D nodal days. For a sun-synchronous
 * orbit the nodal day equals the mean solar day. Solved by fixed-point iteration on the
 * mean motion; for a sun-synchronous orbit the inclination is updated in the same loop.
 * ω⊕ is the engine's one Earth rotation rate (the GMST rate), so that a solved repeat closes on the
 * ground track drawn with GMST.
 * Units: km, rad, s.
 */
import { EARTH_RADIUS_KM, EARTH_ROTATION_RAD_S, TWO_PI } from '../constants';
import { CalcInputError } from '../types';
import {
  computeNodalDay,
  computeNodalPeriod,
  computeSecularRates,
  DEFAULT_THEORY,
  semiMajorAxisFromMeanMotion,
  type SecularTheory,
} from './secular-rates';
import { computeSsoCosInclination } from './sun-synchronous';

export interface RepeatSolution {
  revolutions: number;
  days: number;
  semiMajorAxisKm: number;
  altitudeKm: number;
  inclinationRad: number;
  nodalPeriodS: number;
  nodalDayS: number;
  /** equatorial distance between adjacent tracks of the full cycle [km] */
  equatorSpacingKm: number;
  /** westward longitude step between successive ascending nodes [rad] */
  nodeShiftRad: number;
  iterations: number;
}

/** Greatest common divisor of two non-negative integers (Euclid). */
export function gcd(a: number, b: number): number {
  let x = Math.abs(a);
  let y = Math.abs(b);
  while (y) [x, y] = [y, x % y];
  return x;
}

/**
 * Solve the repeat condition for R revolutions in D nodal days.
 * @param revolutions R ≥ 1, @param days D ≥ 1 (coprime is the caller's concern),
 * @param e eccentricity (0 ≤ e < 1), @param inclinationRad fixed inclination, or undefined
 *   for a sun-synchronous orbit (inclination solved jointly), @param theory secular theory of the rates.
 * Throws CalcInputError('revolutions') where no solution above 100 km altitude exists
 * or no sun-synchronous inclination exists.
 */
export function solveRepeatOrbit(
  revolutions: number,
  days: number,
  e: number,
  inclinationRad?: number,
  theory: SecularTheory = DEFAULT_THEORY,
): RepeatSolution {
  const ratio = revolutions / days;
  let n = ratio * EARTH_ROTATION_RAD_S;
  let a = semiMajorAxisFromMeanMotion(n);
  let inc = inclinationRad ?? Math.acos(-1);
  let iterations = 0;
  for (; iterations < 200; iterations++) {
    if (inclinationRad === undefined) {
      const c = computeSsoCosInclination(a, e, theory, iterations > 0 ? Math.cos(inc) : undefined);
      if (!(c >= -1))
        throw new CalcInputError(
          'revolutions',
          `no sun-synchronous orbit repeats ${revolutions} revolutions in ${days} days: it would lie near ${(a - EARTH_RADIUS_KM).toFixed(0)} km, above the sun-synchronous limit (about 5970 km)`,
        );
      inc = Math.acos(c);
    }
    const r = computeSecularRates(a, e, inc, theory);
    const target = ratio * (EARTH_ROTATION_RAD_S - r.nodeRate);
    n = target - (r.perigeeRate + r.meanAnomalyRate - r.n);
    const aNext = semiMajorAxisFromMeanMotion(n);
    const done = Math.abs(aNext - a) < 1e-6; // the map contracts by ≈ 1e-3 per step, so the remaining error is ≈ 1e-9 km
    a = aNext;
    if (done) break;
  }
  if (!(a * (1 - e) - EARTH_RADIUS_KM >= 100)) {
    throw new CalcInputError(
      'revolutions',
      `${revolutions} revolutions in ${days} days needs perigee altitude ${(a * (1 - e) - EARTH_RADIUS_KM).toFixed(0)} km, below 100 km: choose fewer revolutions per day`,
    );
  }
  const rates = computeSecularRates(a, e, inc, theory);
  const nodalPeriodS = computeNodalPeriod(rates);
  const nodalDayS = computeNodalDay(rates.nodeRate);
  return {
    revolutions,
    days,
    semiMajorAxisKm: a,
    altitudeKm: a - EARTH_RADIUS_KM,
    inclinationRad: inc,
    nodalPeriodS,
    nodalDayS,
    equatorSpacingKm: (TWO_PI * EARTH_RADIUS_KM) / revolutions,
    nodeShiftRad: (EARTH_ROTATION_RAD_S - rates.nodeRate) * nodalPeriodS,
    iterations: iterations + 1,
  };
}

/** Revolutions per nodal day of a (mean) circular-ish orbit at aKm with inclination (or SSO when undefined). */
function revsPerNodalDay(aKm: number, e: number, theory: SecularTheory, inclinationRad?: number): number {
  const inc = inclinationRad ?? Math.acos(Math.max(-1, computeSsoCosInclination(aKm, e, theory)));
  const r = computeSecularRates(aKm, e, inc, theory);
  return (r.perigeeRate + r.meanAnomalyRate) / (EARTH_ROTATION_RAD_S - r.nodeRate);
}

/** Most options listed before the caller must narrow the search. */
export const MAX_REPEAT_OPTIONS = 5000;

/**
 * Every repeat (R, D) with gcd(R, D) = 1, 1 ≤ D ≤ maxDays, whose altitude lies in
 * [minAltitudeKm, maxAltitudeKm]; sorted by altitude. Revolutions-per-day is monotonic
 * in altitude, so candidates are bracketed from the band edges before each is solved.
 */
export function listRepeatOptions(
  minAltitudeKm: number,
  maxAltitudeKm: number,
  maxDays: number,
  e: number,
  inclinationRad?: number,
  theory: SecularTheory = DEFAULT_THEORY,
): RepeatSolution[] {
  const qHigh = revsPerNodalDay(EARTH_RADIUS_KM + minAltitudeKm, e, theory, inclinationRad);
  const qLow = revsPerNodalDay(EARTH_RADIUS_KM + maxAltitudeKm, e, theory, inclinationRad);
  const found: RepeatSolution[] = [];
  for (let d = 1; d <= maxDays; d++) {
    for (let rev = Math.max(1, Math.floor(qLow * d)); rev <= Math.ceil(qHigh * d); rev++) {
      // a solution has exactly rev/d revolutions per nodal day, so one outside [qLow, qHigh] (with a margin for
      // rounding) lies outside the band: skip solving it
      const q = rev / d;
      if (q < qLow * (1 - 1e-9) || q > qHigh * (1 + 1e-9) || gcd(rev, d) !== 1) continue;
      let s: RepeatSolution;
      try {
        s = solveRepeatOrbit(rev, d, e, inclinationRad, theory);
      } catch (err) {
        if (err instanceof CalcInputError) continue;
        throw err;
      }
      if (s.altitudeKm < minAltitudeKm || s.altitudeKm > maxAltitudeKm) continue;
      found.push(s);
      if (found.length > MAX_REPEAT_OPTIONS) {
        throw new CalcInputError(
          'maxDays',
          `more than ${MAX_REPEAT_OPTIONS} repeat options in this band: narrow the altitude band or lower maxDays`,
        );
      }
    }
  }
  return found.sort((p, q) => p.altitudeKm - q.altitudeKm || p.days - q.days);
}
