/**
 * The J2 force model — the only place the engine evaluates a gravity acceleration.
 * Two-body plus J2 zonal term (Montenbruck & Gill, Satellite Orbits (2000) §3.2; Vallado 4th ed. §8.6.1,
 * numbers from memory):
 *   a = −μ r / r³ − (3/2) J2 μ R² / r⁵ · [ x (1 − 5 z²/r²), y (1 − 5 z²/r²), z (3 − 5 z²/r²) ]
 * Specific energy with the J2 potential U = −μ/r + (μ J2 R² / (2 r³)) (3 z²/r² − 1):
 *   E = v²/2 + U (conserved by the exact flow; used to judge integration error).
 * State y = [x, y, z, vx, vy, vz] in km and km/s, inertial equatorial frame.
 */
import { EARTH_J2, EARTH_MU_KM3_S2, EARTH_RADIUS_KM } from '../../constants';

const K_J2 = 1.5 * EARTH_J2 * EARTH_MU_KM3_S2 * EARTH_RADIUS_KM * EARTH_RADIUS_KM;

/** dy/dt for the two-body + J2 problem (t unused: the field is time-independent). */
export function computeJ2Derivative(_t: number, y: Float64Array, dydt: Float64Array): void {
  const x = y[0];
  const yy = y[1];
  const z = y[2];
  const r2 = x * x + yy * yy + z * z;
  const r = Math.sqrt(r2);
  const invR3 = 1 / (r2 * r);
  const invR5 = invR3 / r2;
  const zz = (5 * z * z) / r2;
  const kep = -EARTH_MU_KM3_S2 * invR3;
  const j = -K_J2 * invR5;
  dydt[0] = y[3];
  dydt[1] = y[4];
  dydt[2] = y[5];
  dydt[3] = kep * x + j * x * (1 - zz);
  dydt[4] = kep * yy + j * yy * (1 - zz);
  dydt[5] = kep * z + j * z * (3 - zz);
}

/** Specific mechanical energy [km²/s²] including the J2 potential. */
export function computeJ2Energy(y: Float64Array): number {
  const r2 = y[0] * y[0] + y[1] * y[1] + y[2] * y[2];
  const r = Math.sqrt(r2);
  const v2 = y[3] * y[3] + y[4] * y[4] + y[5] * y[5];
  const u = -EARTH_MU_KM3_S2 / r + ((K_J2 / 3) / (r2 * r)) * ((3 * y[2] * y[2]) / r2 - 1);
  return 0.5 * v2 + u;
}

/** Two-body only derivative (for integrator checks against the Kepler solution). */
export function computeKeplerDerivative(_t: number, y: Float64Array, dydt: Float64Array): void {
  const r2 = y[0] * y[0] + y[1] * y[1] + y[2] * y[2];
  const k = -EARTH_MU_KM3_S2 / (r2 * Math.sqrt(r2));
  dydt[0] = y[3];
  dydt[1] = y[4];
  dydt[2] = y[5];
  dydt[3] = k * y[0];
  dydt[4] = k * y[1];
  dydt[5] = k * y[2];
}
