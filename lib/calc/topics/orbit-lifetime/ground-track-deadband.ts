/**
 * Ground-track maintenance against drag with a symmetric dead band at the equator.
 *
 * Linearised drift (B.-S. Lee, J.-W. Eun and C. E. Webb, "Ground track acquisition and maintenance maneuver
 * modeling for low-Earth orbit satellite", J. Astron. Space Sci. 15(2) (1997) 355): an offset Δa of the
 * semi-major axis from the reference makes the equator crossings drift east–west at a rate dx/dt = K Δa, where
 * K = R⊕ · d[(ω⊕ − Ω̇) T_N]/da / T_N (km of equator per second per km of a; first-order J2 rates, fixed inclination).
 * With a constant decay rate ȧ < 0 the offset falls linearly, so x(t) is a parabola. A manoeuvre raises a to
 * a_ref + Δa₀ with the track at one edge of the band (x = −L); the track drifts out, turns at x = +L when a
 * passes a_ref, and returns to −L when a = a_ref − Δa₀. Hence K Δa₀² / (2|ȧ|) = 2L, i.e.
 *   Δa₀ = 2 √(L |ȧ| / K),   interval T = 2 Δa₀ / |ȧ| = 4 √(L / (K |ȧ|)),   Δa per manoeuvre = 2 Δa₀,
 * and the ΔV of the tangential raise (two small burns of a Hohmann transfer) is Δv = n (2Δa₀) / 2 = n Δa₀.
 * Units: km, s. Valid for near-circular LEO, dead bands ≪ the equatorial track spacing.
 */
import { EARTH_RADIUS_KM, EARTH_ROTATION_RAD_S } from '../../constants';
import { computeNodalPeriod, computeSecularRates } from '../secular-rates';

/** K [km/s per km]: equator drift rate of the ground track per km of semi-major-axis offset. */
export function computeGroundTrackDriftGain(aKm: number, iRad: number): number {
  const g = (a: number) => {
    const rates = computeSecularRates(a, 0, iRad);
    return (EARTH_ROTATION_RAD_S - rates.nodeRate) * computeNodalPeriod(rates);
  };
  const h = 1e-3 * aKm * 1e-3; // 1 m per 1000 km
  const derivative = (g(aKm + h) - g(aKm - h)) / (2 * h);
  return (EARTH_RADIUS_KM * derivative) / computeNodalPeriod(computeSecularRates(aKm, 0, iRad));
}

export interface DeadbandCycle {
  /** Δa₀: raise above the reference at each manoeuvre [km] */
  offsetKm: number;
  /** total Δa of one manoeuvre (2Δa₀) [km] */
  deltaSemiMajorAxisKm: number;
  /** time between manoeuvres [s] */
  intervalSeconds: number;
  /** ΔV of one manoeuvre [km/s] */
  deltaVKmS: number;
}

/** Dead-band cycle for half-width deadbandKm at the equator, decay rate |ȧ| [km/s], gain K, mean motion n [rad/s]. */
export function computeDeadbandCycle(
  deadbandKm: number,
  decayKmPerS: number,
  gain: number,
  meanMotion: number,
): DeadbandCycle {
  const offsetKm = 2 * Math.sqrt((deadbandKm * decayKmPerS) / gain);
  return {
    offsetKm,
    deltaSemiMajorAxisKm: 2 * offsetKm,
    intervalSeconds: (2 * offsetKm) / decayKmPerS,
    deltaVKmS: meanMotion * offsetKm,
  };
}
