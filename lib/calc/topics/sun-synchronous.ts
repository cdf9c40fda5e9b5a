/**
 * Sun-synchronous orbit design and node-rate analysis in the secular theory chosen (secularRates.ts).
 * Condition: Ω̇(a, e, i) = Ω̇_Sun = 2π / tropical year (Vallado 4th ed. §11.4, SMAD 3rd ed. ch. 6 — section
 * numbers from memory). First-order J2 gives cos i = −Ω̇_Sun / ((3/2) n J2 (R/p)²) in closed form; the zonal
 * theory is solved for cos i by Newton's method from that start (the node rate is a polynomial in cos i).
 * Units: km, rad, s.
 */
import {
  EARTH_MU_KM3_S2,
  EARTH_RADIUS_KM,
  SECONDS_PER_DAY,
  SUN_MEAN_MOTION_RAD_S,
  TROPICAL_YEAR_DAYS,
} from '../constants';
import { CalcInputError } from '../types';
import { toDeg } from './angles';
import {
  computeJ2RateFactor,
  computeNodalPeriod,
  computeNodeRateWithSlope,
  computeSecularRates,
  DEFAULT_THEORY,
  type SecularTheory,
} from './secular-rates';

/** Minutes of local time per radian of node motion relative to the mean Sun (24 h per 2π). */
const MIN_PER_RAD = (24 * 60) / (2 * Math.PI);

/**
 * cos i of the sun-synchronous orbit with mean semi-major axis aKm [km], eccentricity e, in `theory`
 * (optional Newton start `start`, e.g. a previous solution at a nearby a).
 * Returns a value possibly outside [−1, 1] (then no SSO exists).
 */
export function computeSsoCosInclination(
  aKm: number,
  e: number,
  theory: SecularTheory = DEFAULT_THEORY,
  start?: number,
): number {
  const first = -SUN_MEAN_MOTION_RAD_S / computeJ2RateFactor(aKm, e);
  if (theory === 'j2' || first < -1) return first;
  // Newton on c = cos i with the analytic slope; the start (first-order value, or the caller's previous
  // solution) is within 1e-3 of the root, so two or three steps reach 1e-15.
  let c = start ?? first;
  for (let k = 0; k < 10; k++) {
    const { rate, slope } = computeNodeRateWithSlope(aKm, e, c, theory);
    const step = (rate - SUN_MEAN_MOTION_RAD_S) / slope;
    c -= step;
    if (Math.abs(step) < 1e-15) break;
  }
  return c;
}

/**
 * Sun-synchronous inclination [rad] for mean semi-major axis aKm [km] and eccentricity e in `theory`.
 * Throws CalcInputError on `field` when cos i < −1 (for e = 0: altitude above ≈ 5970 km).
 */
export function solveSsoInclination(
  aKm: number,
  e: number,
  theory: SecularTheory = DEFAULT_THEORY,
  field = 'altitudeKm',
): number {
  const c = computeSsoCosInclination(aKm, e, theory);
  if (!(c >= -1)) {
    throw new CalcInputError(
      field,
      `no sun-synchronous orbit exists here: the required cos i = ${c.toFixed(4)} is below −1 (J2 node rate too weak at this altitude; circular SSOs exist below about 5970 km altitude)`,
    );
  }
  return Math.acos(c);
}

/** Drift rate of the node's local time against the mean Sun [min/year] from a node rate [rad/s]. */
export function computeLocalTimeDriftMinPerYear(nodeRateRadS: number): number {
  return (nodeRateRadS - SUN_MEAN_MOTION_RAD_S) * TROPICAL_YEAR_DAYS * SECONDS_PER_DAY * MIN_PER_RAD;
}

export interface OrbitRateSummary {
  semiMajorAxisKm: number;
  inclinationDeg: number;
  nodalPeriodMin: number;
  revsPerDay: number;
  nodeRateDegPerDay: number;
  perigeeRateDegPerDay: number;
  localTimeDriftMinPerYear: number;
}

/** Secular-rate summary for a mean orbit (a km, e, i rad) in `theory`; revs per mean solar day use the nodal period. */
export function summariseOrbitRates(
  aKm: number,
  e: number,
  iRad: number,
  theory: SecularTheory = DEFAULT_THEORY,
): OrbitRateSummary {
  const rates = computeSecularRates(aKm, e, iRad, theory);
  const nodal = computeNodalPeriod(rates);
  return {
    semiMajorAxisKm: aKm,
    inclinationDeg: toDeg(iRad),
    nodalPeriodMin: nodal / 60,
    revsPerDay: SECONDS_PER_DAY / nodal,
    nodeRateDegPerDay: toDeg(rates.nodeRate) * SECONDS_PER_DAY,
    perigeeRateDegPerDay: toDeg(rates.perigeeRate) * SECONDS_PER_DAY,
    localTimeDriftMinPerYear: computeLocalTimeDriftMinPerYear(rates.nodeRate),
  };
}

/** Semi-major axis [km] of an orbit whose mean altitude above the equatorial radius is altitudeKm. */
export function semiMajorAxisFromAltitude(altitudeKm: number): number {
  return EARTH_RADIUS_KM + altitudeKm;
}

export interface InjectionSensitivity {
  nominalDriftMinPerYear: number;
  driftFromInclinationMinPerYear: number;
  driftFromAltitudeMinPerYear: number;
  combinedDriftMinPerYear: number;
  planeChangeDeltaVMps: number;
}

/**
 * Local-time drift caused by injection errors in inclination (rad) and altitude (km), each
 * as the exact difference of node rates of `theory` (actual − nominal), plus the ΔV of the plane change
 * that removes the inclination error: Δv = 2 v sin(Δi/2), v = √(μ/a) (Vallado 4th ed. §6.4, number from memory).
 */
export function computeInjectionSensitivity(
  aKm: number,
  iRad: number,
  di: number,
  da: number,
  theory: SecularTheory = DEFAULT_THEORY,
  e = 0,
): InjectionSensitivity {
  const rate = (a: number, i: number) => computeSecularRates(a, e, i, theory).nodeRate;
  const nominal = rate(aKm, iRad);
  const drift = (r: number) => computeLocalTimeDriftMinPerYear(r) - computeLocalTimeDriftMinPerYear(nominal);
  const v = Math.sqrt(EARTH_MU_KM3_S2 / aKm);
  return {
    nominalDriftMinPerYear: computeLocalTimeDriftMinPerYear(nominal),
    driftFromInclinationMinPerYear: drift(rate(aKm, iRad + di)),
    driftFromAltitudeMinPerYear: drift(rate(aKm + da, iRad)),
    combinedDriftMinPerYear: drift(rate(aKm + da, iRad + di)),
    planeChangeDeltaVMps: 2 * v * Math.sin(Math.abs(di) / 2) * 1000,
  };
}
