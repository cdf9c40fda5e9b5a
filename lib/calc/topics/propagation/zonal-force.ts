/**
 * Two-body + zonal-harmonic force model J2 … J_N (N = 2…6 here, any N ≤ 9 the constants carry).
 * Potential per unit mass (Montenbruck & Gill, Satellite Orbits (2000) §3.2, zonal terms only;
 * Vallado 4th ed. §8.6.1, numbers from memory):
 *   Φ = −μ/r + Σ_{n=2..N} (μ J_n R^n / r^(n+1)) P_n(s),   s = z/r,
 * and the acceleration a = −∇Φ, per degree
 *   a_n = (μ J_n R^n / r^(n+2)) [((n+1) P_n(s) + s P_n'(s)) r̂ − P_n'(s) ẑ],
 * with P_n by Bonnet's recursion (m+1)P_{m+1} = (2m+1) s P_m − m P_{m−1} and P'_{m+1} = P'_{m−1} + (2m+1) P_m
 * (free of the 1/(1 − s²) pole singularity). For n = 2 this is the familiar
 *   a = −(3/2) J2 μ R²/r⁵ · [x(1 − 5z²/r²), y(1 − 5z²/r²), z(3 − 5z²/r²)].
 * Specific energy E = v²/2 + Φ is conserved by the exact flow (field time-independent, inertial frame)
 * and judges the integration error.
 * State y = [x, y, z, vx, vy, vz] in km and km/s, inertial equatorial frame (Earth's axis = z).
 */
import { EARTH_MU_KM3_S2, EARTH_RADIUS_KM, EARTH_ZONALS } from '../../constants';
import type { Derivative } from './integrators';

export const MIN_ZONAL_DEGREE = 2;
export const MAX_ZONAL_DEGREE = 6;

export interface ZonalForceModel {
  degree: number;
  derivative: Derivative;
  /** the zonal part alone (no Kepler term), for the mean ↔ osculating conversion */
  perturbation: (x: number, y: number, z: number, out: Float64Array) => void;
  energy: (y: Float64Array) => number;
}

/** Two-body + J2…J_degree force model (degree 2…9). */
export function createZonalForceModel(degree: number): ZonalForceModel {
  if (!Number.isInteger(degree) || degree < MIN_ZONAL_DEGREE || degree > EARTH_ZONALS.length - 1)
    throw new RangeError(`zonal degree ${degree} outside 2…${EARTH_ZONALS.length - 1}`);
  // k[n] = μ J_n R^n
  const k = new Float64Array(degree + 1);
  for (let n = 2; n <= degree; n++) k[n] = EARTH_MU_KM3_S2 * EARTH_ZONALS[n] * EARTH_RADIUS_KM ** n;
  const p = new Float64Array(degree + 1);
  const dp = new Float64Array(degree + 1);

  /** Fills p[n] = P_n(s), dp[n] = P_n'(s) for n ≤ degree. */
  const legendre = (s: number): void => {
    p[0] = 1;
    p[1] = s;
    dp[0] = 0;
    dp[1] = 1;
    for (let m = 1; m < degree; m++) {
      p[m + 1] = ((2 * m + 1) * s * p[m] - m * p[m - 1]) / (m + 1);
      dp[m + 1] = dp[m - 1] + (2 * m + 1) * p[m];
    }
  };

  const derivative: Derivative = (_t, y, dydt) => {
    const x = y[0];
    const yy = y[1];
    const z = y[2];
    const r2 = x * x + yy * yy + z * z;
    const invR = 1 / Math.sqrt(r2);
    const s = z * invR;
    legendre(s);
    // coefficient along r̂ (Kepler term first) and along ẑ, accumulated over degrees
    let radial = -EARTH_MU_KM3_S2 * invR * invR;
    let along = 0;
    let invRn2 = invR * invR * invR * invR; // 1/r^(n+2) for n = 2
    for (let n = 2; n <= degree; n++) {
      const f = k[n] * invRn2;
      radial += f * ((n + 1) * p[n] + s * dp[n]);
      along -= f * dp[n];
      invRn2 *= invR;
    }
    const radialOverR = radial * invR;
    dydt[0] = y[3];
    dydt[1] = y[4];
    dydt[2] = y[5];
    dydt[3] = radialOverR * x;
    dydt[4] = radialOverR * yy;
    dydt[5] = radialOverR * z + along;
  };

  /** Zonal (non-Kepler) acceleration [km/s²] at (x, y, z) [km] written into out[0..2]: the derivative minus −μ r/r³. */
  const probe = new Float64Array(6);
  const rates = new Float64Array(6);
  const perturbation = (x: number, yy: number, z: number, out: Float64Array): void => {
    probe[0] = x;
    probe[1] = yy;
    probe[2] = z;
    derivative(0, probe, rates);
    const r2 = x * x + yy * yy + z * z;
    const kep = -EARTH_MU_KM3_S2 / (r2 * Math.sqrt(r2));
    out[0] = rates[3] - kep * x;
    out[1] = rates[4] - kep * yy;
    out[2] = rates[5] - kep * z;
  };

  const energy = (y: Float64Array): number => {
    const r2 = y[0] * y[0] + y[1] * y[1] + y[2] * y[2];
    const r = Math.sqrt(r2);
    legendre(y[2] / r);
    let phi = -EARTH_MU_KM3_S2 / r;
    let invRn1 = 1 / (r2 * r);
    for (let n = 2; n <= degree; n++) {
      phi += k[n] * invRn1 * p[n];
      invRn1 /= r;
    }
    const v2 = y[3] * y[3] + y[4] * y[4] + y[5] * y[5];
    return 0.5 * v2 + phi;
  };

  return { degree, derivative, perturbation, energy };
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
