/**
 * Frozen-orbit eccentricity from J2–J3 theory.
 * With ω = 90°, the J3 long-period term in ė vanishes and ω̇ = 0 when
 *   e_f ≈ −(J3 R / (2 J2 a)) · sin i
 * (Chobotov, Orbital Mechanics 3rd ed. ch. 11; Vallado 4th ed. §11.4 frozen orbits — numbers from memory).
 * Valid away from the critical inclinations 63.435° / 116.565°, where the J2 perigee rate vanishes and
 * this balance no longer fixes e; higher odd zonals (J5, J7, …) raise sun-synchronous values by about 10 %.
 * Units: km, rad.
 */
import { EARTH_J2, EARTH_J3, EARTH_RADIUS_KM } from '../constants';
import { toDeg } from './angles';

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
