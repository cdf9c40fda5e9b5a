/**
 * Frozen orbits: the mean eccentricity vector that the zonal harmonics leave at rest.
 *
 * Classic J2–J3 value: with ω = 90°, the J3 long-period term in ė vanishes and ω̇ = 0 when
 *   e_f ≈ −(J3 R / (2 J2 a)) · sin i
 * (Cook 1966; Chobotov, Orbital Mechanics 3rd ed. ch. 11; Vallado 4th ed. §11.4 frozen orbits — numbers from memory).
 *
 * Zonal value (J2…J9): for a near-circular orbit the mean eccentricity vector (ξ, η) = e (cos ω, sin ω)
 * rotates at the even-zonal perigee rate and is pushed along η by the odd zonals (Cook 1966, Planet. Space
 * Sci. 14, 433–444); it is frozen at ξ = 0 where the averaged rate dξ/dt = −η ω̇ + (odd forcing) vanishes.
 * Here the averaged rates are those of first-order averaging: Gauss's equations with the zonal acceleration
 * J2…J9 (EGM-96) averaged over the mean anomaly of the mean orbit by exact quadrature (meanOsculating,
 * computeAveragedXiRateAtApse: the ξ rate is even in M about the perigee, so half the samples serve), i.e. the
 * averaged Lagrange equations of Cook without truncating the harmonic
 * series in e. dξ/dt(ξ = 0, η) = 0 is solved for η by the secant method; ω = 90° for η > 0, 270° for η < 0.
 * Neglected: J2² terms (≈ 0.1 % of ω̇), lunisolar and drag effects. Invalid near the critical inclinations
 * 63.4°/116.6°, where the J2 perigee rate vanishes and the higher odd zonals no longer balance.
 * Units: km, rad. The e and ω are mean elements (short-period terms removed).
 */
import { EARTH_J2, EARTH_J3, EARTH_RADIUS_KM, EARTH_ZONALS, TWO_PI } from '../constants';
import { CalcInputError } from '../types';
import { toDeg } from './angles';
import type { KeplerElements } from './kepler-state';
import { computeAveragedXiRateAtApse, createOsculatingEccentricity, createZonalAcceleration } from './mean-osculating';

/** Critical inclination [rad]: sin² i = 4/5 (ω̇ = 0 under J2). */
export const CRITICAL_INCLINATION_RAD = Math.asin(Math.sqrt(0.8));

/** Frozen eccentricity (J2–J3, first order) for semi-major axis aKm and inclination iRad. */
export function computeFrozenEccentricity(aKm: number, iRad: number): number {
  return Math.abs((-EARTH_J3 * EARTH_RADIUS_KM * Math.sin(iRad)) / (2 * EARTH_J2 * aKm));
}

/** Argument of perigee [deg] of the J2–J3 frozen solution: 90° when −J3 sin i > 0, else 270°. */
export function computeFrozenArgPerigeeDeg(iRad: number): number {
  return -EARTH_J3 * Math.sin(iRad) >= 0 ? 90 : 270;
}

/** Distance [deg] of the inclination from the nearer critical inclination. */
export function distanceFromCriticalInclinationDeg(iRad: number): number {
  const crit = toDeg(CRITICAL_INCLINATION_RAD);
  const i = toDeg(iRad);
  return Math.min(Math.abs(i - crit), Math.abs(i - (180 - crit)));
}

/** Highest zonal degree of the frozen-orbit model (all EGM-96 zonals the constants carry: J2…J9). */
export const FROZEN_ZONAL_DEGREE = EARTH_ZONALS.length - 1;
/** Largest frozen eccentricity accepted as a near-circular solution. */
export const MAX_FROZEN_ECCENTRICITY = 0.05;
/** Mean-anomaly samples of the averaging: exact for harmonics below 16 (the J9 terms reach about 11; 32 samples agree to 12 digits). */
const AVERAGING_SAMPLES = 16;

const zonalAcceleration = createZonalAcceleration(FROZEN_ZONAL_DEGREE);

/** Averaged dξ/dt [1/s] at ξ = 0, η = eta for the mean orbit (a, i). */
function averagedXiRate(aKm: number, iRad: number, eta: number): number {
  const mean = {
    aKm,
    e: Math.abs(eta),
    iRad,
    raanRad: 0,
    argPerigeeRad: eta >= 0 ? Math.PI / 2 : -Math.PI / 2,
    meanAnomalyRad: 0,
  };
  return computeAveragedXiRateAtApse(mean, zonalAcceleration, AVERAGING_SAMPLES);
}

export interface FrozenSolution {
  /** mean frozen eccentricity (J2…J9) */
  e: number;
  /** mean argument of perigee [deg]: 90 or 270 */
  argPerigeeDeg: number;
}

/** Mean frozen eccentricity and argument of perigee with the zonals J2…J9, for mean a [km] and i [rad]. */
export function solveFrozenOrbit(aKm: number, iRad: number): FrozenSolution {
  // start from the J2–J3 value (signed: η = e sin ω)
  let x0 = computeFrozenEccentricity(aKm, iRad) * (computeFrozenArgPerigeeDeg(iRad) === 90 ? 1 : -1);
  let x1 = x0 * 1.1 + 1e-7;
  let f0 = averagedXiRate(aKm, iRad, x0);
  let f1 = averagedXiRate(aKm, iRad, x1);
  for (let it = 0; it < 30; it++) {
    if (f1 === f0) break;
    const x2 = x1 - (f1 * (x1 - x0)) / (f1 - f0);
    if (!Number.isFinite(x2) || Math.abs(x2) > MAX_FROZEN_ECCENTRICITY) break;
    // the rate is linear in η up to O(η³): the step shrinks fast; stop at 1e-12 (e is shown to 1e-7)
    if (Math.abs(x2 - x1) < 1e-12) return { e: Math.abs(x2), argPerigeeDeg: x2 >= 0 ? 90 : 270 };
    [x0, f0] = [x1, f1];
    x1 = x2;
    f1 = averagedXiRate(aKm, iRad, x1);
  }
  throw new CalcInputError(
    'inclinationDeg',
    `no near-circular frozen orbit (e ≤ ${MAX_FROZEN_ECCENTRICITY}) found with the zonals J2…J${FROZEN_ZONAL_DEGREE} at this inclination; near the critical inclinations 63.4°/116.6° the J2 perigee rate vanishes and the balance fails`,
  );
}

/** Samples of the osculating eccentricity over one revolution before the extremes are refined. */
const RANGE_SAMPLES = 24;

/**
 * Smallest and largest osculating eccentricity over one revolution of the mean orbit `mean` (first-order J2
 * short-period terms, meanOsculating): sampled at 24 equally spaced mean anomalies, each extreme refined at the
 * vertex of the parabola through its sample and the two neighbours.
 */
export function computeOsculatingEccentricityRange(mean: KeplerElements): { min: number; max: number } {
  const osc = createOsculatingEccentricity(mean);
  const step = TWO_PI / RANGE_SAMPLES;
  const e = Array.from({ length: RANGE_SAMPLES }, (_, k) => osc(k * step));
  const refine = (k: number, better: (x: number, y: number) => boolean): number => {
    const [y0, y1, y2] = [e[(k + RANGE_SAMPLES - 1) % RANGE_SAMPLES], e[k], e[(k + 1) % RANGE_SAMPLES]];
    const curvature = y0 - 2 * y1 + y2;
    if (curvature === 0) return y1;
    const vertex = (k + (0.5 * (y0 - y2)) / curvature) * step;
    const y = osc(vertex);
    return better(y, y1) ? y : y1;
  };
  let kMin = 0;
  let kMax = 0;
  e.forEach((v, k) => {
    if (v < e[kMin]) kMin = k;
    if (v > e[kMax]) kMax = k;
  });
  return { min: refine(kMin, (x, y) => x < y), max: refine(kMax, (x, y) => x > y) };
}
