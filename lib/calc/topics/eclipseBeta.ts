/**
 * Beta angle and eclipse duration of a circular orbit.
 * β = asin(ĥ · ŝ), ĥ = (sin i sin Ω, −sin i cos Ω, cos i) the orbit normal and ŝ the Sun
 * unit vector (Vallado 4th ed. ch. 5 shadow and beta-angle geometry, section from memory).
 * Eclipse (cylindrical shadow, circular orbit of radius a = R + h): fraction of the orbit in shadow
 *   f = (1/π) · acos( √(h² + 2 R h) / (a cos β) )   for |β| < β* = asin(R/a), else 0,
 * as given by S. L. Rickman, "Introduction to Orbital Mechanics and Spacecraft Attitudes for
 * Thermal Engineers", NASA TFAWS 2014 (from memory), the same geometry as Wertz et al.,
 * Space Mission Engineering: The New SMAD (2011) ch. 9 eclipse relations (number from memory).
 * Units: km, rad.
 */
import { EARTH_RADIUS_KM } from '../constants';

/** Orbit-normal unit vector for inclination iRad and RAAN raanRad (equator of date). */
export function computeOrbitNormal(iRad: number, raanRad: number): [number, number, number] {
  const si = Math.sin(iRad);
  return [si * Math.sin(raanRad), -si * Math.cos(raanRad), Math.cos(iRad)];
}

/** Beta angle [rad] between the orbit plane and the Sun direction sunUnit. */
export function computeBetaAngle(iRad: number, raanRad: number, sunUnit: readonly [number, number, number]): number {
  const h = computeOrbitNormal(iRad, raanRad);
  const dot = h[0] * sunUnit[0] + h[1] * sunUnit[1] + h[2] * sunUnit[2];
  return Math.asin(Math.max(-1, Math.min(1, dot)));
}

/** Critical beta angle β* [rad] above which a circular orbit at altitudeKm sees no eclipse. */
export function computeCriticalBeta(altitudeKm: number): number {
  return Math.asin(EARTH_RADIUS_KM / (EARTH_RADIUS_KM + altitudeKm));
}

/** Fraction [0, 0.5) of a circular orbit at altitudeKm spent in the cylindrical shadow at beta angle betaRad. */
export function computeEclipseFraction(altitudeKm: number, betaRad: number): number {
  if (Math.abs(betaRad) >= computeCriticalBeta(altitudeKm)) return 0;
  const h = altitudeKm;
  const a = EARTH_RADIUS_KM + h;
  const arg = Math.sqrt(h * h + 2 * EARTH_RADIUS_KM * h) / (a * Math.cos(betaRad));
  return Math.acos(Math.min(1, arg)) / Math.PI;
}
