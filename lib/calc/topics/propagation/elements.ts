/**
 * Osculating elements from a state vector (Vallado 4th ed. Algorithm 9 RV2COE, number from memory):
 * h = r × v, Ω = atan2(h_x, −h_y), i = acos(h_z/|h|), a from vis-viva 1/a = 2/r − v²/μ.
 * Units: km, km/s, rad.
 */
import { EARTH_MU_KM3_S2 } from '../../constants';

export interface PlaneElements {
  smaKm: number;
  inclinationRad: number;
  raanRad: number;
}

/** Osculating semi-major axis, inclination and RAAN (in (−π, π]) of state y = [r, v]. */
export function computePlaneElements(y: Float64Array): PlaneElements {
  const [x, yy, z, vx, vy, vz] = [y[0], y[1], y[2], y[3], y[4], y[5]];
  const hx = yy * vz - z * vy;
  const hy = z * vx - x * vz;
  const hz = x * vy - yy * vx;
  const r = Math.sqrt(x * x + yy * yy + z * z);
  const v2 = vx * vx + vy * vy + vz * vz;
  return {
    smaKm: 1 / (2 / r - v2 / EARTH_MU_KM3_S2),
    inclinationRad: Math.acos(hz / Math.sqrt(hx * hx + hy * hy + hz * hz)),
    raanRad: Math.atan2(hx, -hy),
  };
}
