/**
 * Beta angle and eclipse duration of a circular orbit.
 * β = asin(ĥ · ŝ), ĥ = (sin i sin Ω, −sin i cos Ω, cos i) the orbit normal and ŝ the Sun
 * unit vector (Vallado 4th ed. ch. 5 shadow and beta-angle geometry, section from memory).
 * Eclipse (cylindrical shadow, circular orbit of radius a = R + h): fraction of the orbit in shadow
 *   f = (1/π) · acos( √(h² + 2 R h) / (a cos β) )   for |β| < β* = asin(R/a), else 0,
 * as given by S. L. Rickman, "Introduction to Orbital Mechanics and Spacecraft Attitudes for
 * Thermal Engineers", NASA TFAWS 2014 (from memory), the same geometry as Wertz et al.,
 * Space Mission Engineering: The New SMAD (2011) ch. 9 eclipse relations (number from memory).
 * Conical shadow (umbra and penumbra): the umbra is the cone tangent to the Sun and the Earth that narrows
 * behind the Earth, the penumbra the cone tangent to both that widens behind it (Montenbruck & Gill (2000)
 * §3.4.2; Vallado 4th ed. Algorithm 34 SHADOW — numbers from memory). For a point at distance x behind the
 * Earth's centre along the anti-Sun line and ρ from that line, with d the Sun's distance:
 *   umbra      ρ < (L_u − x) tan α_u,  sin α_u = (R☉ − R)/d,  L_u = R / sin α_u;
 *   penumbra   ρ < (L_p + x) tan α_p,  sin α_p = (R☉ + R)/d,  L_p = R / sin α_p.
 * On a circular orbit of radius a at beta angle β, x = a cos β cos φ (φ measured from the orbit point nearest
 * the anti-Sun line) and ρ² = a² − x², so each boundary is a quadratic in x solved in closed form.
 * Units: km, rad.
 */
import { AU_KM, EARTH_RADIUS_KM, SUN_RADIUS_KM } from '../constants';

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

export type ShadowModel = 'conical' | 'cylindrical';

export interface ShadowFractions {
  /** fraction of a circular orbit in the umbra (Sun fully hidden) */
  umbra: number;
  /** fraction in umbra or penumbra (Sun at least partly hidden) */
  penumbra: number;
  /** fraction in the cylindrical shadow of radius R */
  cylindrical: number;
}

/** Half-angle φ0 [rad] of the arc with x = a cos β cos φ ≥ xBoundary (0 when the boundary is never reached). */
function shadowHalfArc(aKm: number, betaRad: number, xBoundary: number): number {
  const c = xBoundary / (aKm * Math.cos(betaRad));
  if (!(c < 1)) return 0;
  return Math.acos(Math.max(-1, c));
}

/**
 * Fractions of a circular orbit of radius aKm [km] in umbra, umbra + penumbra and the cylindrical shadow at beta
 * angle betaRad, for a spherical Earth of the equatorial radius and the Sun at sunDistanceKm (default 1 au).
 * Valid for aKm > R (the orbit point must be outside the Earth); |β| < 90°.
 */
export function computeShadowFractions(aKm: number, betaRad: number, sunDistanceKm = AU_KM): ShadowFractions {
  const R = EARTH_RADIUS_KM;
  const a2 = aKm * aKm;
  // umbra: a² − x² = t²(L − x)²  ⇒  (1 + t²)x² − 2t²L x + t²L² − a² = 0, larger root
  const su = (SUN_RADIUS_KM - R) / sunDistanceKm;
  const tu = su / Math.sqrt(1 - su * su);
  const lu = R / su;
  const tu2 = tu * tu;
  const xu = (tu2 * lu + Math.sqrt(Math.max(0, a2 * (1 + tu2) - tu2 * lu * lu))) / (1 + tu2);
  // penumbra: a² − x² = t²(L + x)²  ⇒  (1 + t²)x² + 2t²L x + t²L² − a² = 0, larger root
  const sp = (SUN_RADIUS_KM + R) / sunDistanceKm;
  const tp = sp / Math.sqrt(1 - sp * sp);
  const lp = R / sp;
  const tp2 = tp * tp;
  const xp = (-tp2 * lp + Math.sqrt(Math.max(0, a2 * (1 + tp2) - tp2 * lp * lp))) / (1 + tp2);
  const xc = Math.sqrt(Math.max(0, a2 - R * R));
  return {
    umbra: shadowHalfArc(aKm, betaRad, xu) / Math.PI,
    penumbra: shadowHalfArc(aKm, betaRad, xp) / Math.PI,
    cylindrical: shadowHalfArc(aKm, betaRad, xc) / Math.PI,
  };
}
