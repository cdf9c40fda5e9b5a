/**
 * Altitude conventions of a mean orbit and heights above the WGS-84 ellipsoid.
 *
 * Three altitudes describe the same orbit (they differ by up to ~20 km for a sun-synchronous LEO):
 *  - mean altitude: mean semi-major axis − equatorial radius (the engine's input convention);
 *  - altitude at the ascending node: osculating radius where the orbit crosses the equator northward
 *    − equatorial radius (at the equator the ellipsoid's height and this coincide);
 *  - mean altitude above the ellipsoid: time average over one revolution of the geodetic height along the
 *    osculating orbit (the ellipsoid's polar radius is 21.4 km smaller than its equatorial one).
 * Osculating orbit from meanOsculating (first-order J2 short-period terms); geodetic height on WGS-84 from the
 * geodetic latitude φ (fixed-point iteration, Vallado 4th ed. Algorithm 12, number from memory):
 *   h = ρ cos φ + z sin φ − R √(1 − e² sin² φ),  ρ = √(x² + y²)  (exact for the given φ).
 * The ellipsoid is symmetric about Earth's axis, so inertial coordinates serve (no rotation angle needed).
 * Units: km, rad. Valid where meanOsculating is (perigee above ~200 km, e ≤ 0.5).
 */
import { EARTH_FLATTENING, EARTH_RADIUS_KM, TWO_PI } from '../constants';
import { computeGeodeticLatitude } from './ground-track';
import type { KeplerElements, Vec3 } from './kepler-state';
import { createOsculatingOrbit } from './mean-osculating';

const E2 = EARTH_FLATTENING * (2 - EARTH_FLATTENING);

/** Geodetic height [km] of a position [km] above the WGS-84 ellipsoid. */
export function computeHeightAboveEllipsoid(p: Vec3): number {
  const rho = Math.hypot(p[0], p[1]);
  const phi = computeGeodeticLatitude(p[0], p[1], p[2]);
  const s = Math.sin(phi);
  return rho * Math.cos(phi) + p[2] * s - EARTH_RADIUS_KM * Math.sqrt(1 - E2 * s * s);
}

export interface AltitudeConventions {
  /** mean semi-major axis − equatorial radius [km] */
  meanAltitudeKm: number;
  /** osculating radius at the ascending node − equatorial radius [km] */
  altitudeAtAscendingNodeKm: number;
  /** time average of the geodetic height along the osculating orbit [km] */
  meanAltitudeAboveEllipsoidKm: number;
  /** lowest and highest geodetic height along the osculating orbit over one revolution [km] */
  minHeightAboveEllipsoidKm: number;
  maxHeightAboveEllipsoidKm: number;
}

/**
 * Samples per revolution for the orbit average: the trapezoid rule is exact for harmonics below 12 of the
 * argument of latitude; the height's 12th harmonic (ellipsoid e⁶ terms) is below 1e-9 km.
 */
export const PROFILE_SAMPLES = 12;

/**
 * The three altitudes of the mean orbit `mean` (its M0 is ignored: the profile covers a whole revolution).
 * The ascending node is found on the osculating orbit (z = 0, going north) by the secant method from the
 * mean orbit's node.
 */
export function computeAltitudeConventions(mean: KeplerElements): AltitudeConventions {
  const w = mean.argPerigeeRad;
  // θ counted from the mean orbit's own ascending node (mean anomaly of the node = M at u = 0)
  const fNode = -w;
  const Enode =
    2 * Math.atan2(Math.sqrt(1 - mean.e) * Math.sin(fNode / 2), Math.sqrt(1 + mean.e) * Math.cos(fNode / 2));
  const atNode: KeplerElements = { ...mean, meanAnomalyRad: Enode - mean.e * Math.sin(Enode) };
  const orbit = createOsculatingOrbit(atNode);
  let sum = 0;
  let min = Infinity;
  let max = -Infinity;
  for (let k = 0; k < PROFILE_SAMPLES; k++) {
    const h = computeHeightAboveEllipsoid(orbit((TWO_PI * k) / PROFILE_SAMPLES).positionKm);
    sum += h;
    min = Math.min(min, h);
    max = Math.max(max, h);
  }
  // secant on z(θ) near θ = 0
  let t0 = -1e-3;
  let t1 = 1e-3;
  let z0 = orbit(t0).positionKm[2];
  let z1 = orbit(t1).positionKm[2];
  for (let it = 0; it < 20 && Math.abs(t1 - t0) > 1e-13 && z1 !== z0; it++) {
    const t2 = t1 - (z1 * (t1 - t0)) / (z1 - z0);
    [t0, z0] = [t1, z1];
    t1 = t2;
    z1 = orbit(t1).positionKm[2];
  }
  const node = orbit(t1).positionKm;
  return {
    meanAltitudeKm: mean.aKm - EARTH_RADIUS_KM,
    altitudeAtAscendingNodeKm: Math.hypot(node[0], node[1], node[2]) - EARTH_RADIUS_KM,
    meanAltitudeAboveEllipsoidKm: sum / PROFILE_SAMPLES,
    minHeightAboveEllipsoidKm: min,
    maxHeightAboveEllipsoidKm: max,
  };
}
