/**
 * Keplerian elements ↔ position/velocity (two-body geometry, no perturbation).
 * Method: Kepler's equation E − e sin E = M by Newton iteration; perifocal position and velocity rotated by
 * R3(−Ω) R1(−i) R3(−ω) (Vallado 4th ed. Algorithm 10 COE2RV and Algorithm 9 RV2COE; Montenbruck & Gill (2000)
 * §2.2–2.3; algorithm numbers from memory).
 * Frame: the equatorial frame the elements refer to (in this engine the true-of-date equator, x toward the
 * equinox of date). Units: km, km/s, rad. Valid for 0 ≤ e < 1 (elliptic orbits).
 */
import { EARTH_MU_KM3_S2, TWO_PI } from '../constants';
import { wrapTwoPi } from './angles';

export interface KeplerElements {
  aKm: number;
  e: number;
  iRad: number;
  raanRad: number;
  argPerigeeRad: number;
  meanAnomalyRad: number;
}

export type Vec3 = [number, number, number];

export interface StateVector {
  positionKm: Vec3;
  velocityKmS: Vec3;
}

/** Eccentric anomaly [rad] from mean anomaly M [rad] and eccentricity 0 ≤ e < 1 (Newton, |ΔE| < 1e-15). */
export function solveKeplerEquation(meanAnomalyRad: number, e: number): number {
  const m = wrapTwoPi(meanAnomalyRad);
  // start at M + e sin M (error O(e²)), one Newton step fewer than from M for near-circular orbits
  let E = e < 0.8 ? m + e * Math.sin(m) : Math.PI;
  for (let k = 0; k < 50; k++) {
    const d = (E - e * Math.sin(E) - m) / (1 - e * Math.cos(E));
    E -= d;
    if (Math.abs(d) < 1e-15) break;
  }
  return E;
}

/** True anomaly [rad] from eccentric anomaly E [rad]. */
export function trueFromEccentricAnomaly(E: number, e: number): number {
  return 2 * Math.atan2(Math.sqrt(1 + e) * Math.sin(E / 2), Math.sqrt(1 - e) * Math.cos(E / 2));
}

/** Position [km] and velocity [km/s] of a Kepler orbit (gravitational parameter μ of the Earth). */
export function elementsToState(el: KeplerElements, mu = EARTH_MU_KM3_S2): StateVector {
  const { aKm: a, e } = el;
  const E = solveKeplerEquation(el.meanAnomalyRad, e);
  const cE = Math.cos(E);
  const sE = Math.sin(E);
  const eta = Math.sqrt(1 - e * e);
  // perifocal frame (P toward perigee, Q 90° ahead in the orbit plane)
  const xp = a * (cE - e);
  const yp = a * eta * sE;
  const r = a * (1 - e * cE);
  const k = Math.sqrt(mu * a) / r;
  const vxp = -k * sE;
  const vyp = k * eta * cE;
  const [cO, sO] = [Math.cos(el.raanRad), Math.sin(el.raanRad)];
  const [cw, sw] = [Math.cos(el.argPerigeeRad), Math.sin(el.argPerigeeRad)];
  const [ci, si] = [Math.cos(el.iRad), Math.sin(el.iRad)];
  const P: Vec3 = [cO * cw - sO * sw * ci, sO * cw + cO * sw * ci, sw * si];
  const Q: Vec3 = [-cO * sw - sO * cw * ci, -sO * sw + cO * cw * ci, cw * si];
  return {
    positionKm: [xp * P[0] + yp * Q[0], xp * P[1] + yp * Q[1], xp * P[2] + yp * Q[2]],
    velocityKmS: [vxp * P[0] + vyp * Q[0], vxp * P[1] + vyp * Q[1], vxp * P[2] + vyp * Q[2]],
  };
}

const cross = (u: Vec3, v: Vec3): Vec3 => [
  u[1] * v[2] - u[2] * v[1],
  u[2] * v[0] - u[0] * v[2],
  u[0] * v[1] - u[1] * v[0],
];
const dot = (u: Vec3, v: Vec3): number => u[0] * v[0] + u[1] * v[1] + u[2] * v[2];

/**
 * Classical elements of a state (elliptic orbits). Conventions where an angle is undefined: for e = 0
 * the argument of perigee is 0 and the mean anomaly is the argument of latitude; for i = 0 the RAAN is 0.
 */
export function stateToElements(s: StateVector, mu = EARTH_MU_KM3_S2): KeplerElements {
  const r = s.positionKm;
  const v = s.velocityKmS;
  const rn = Math.sqrt(dot(r, r));
  const h = cross(r, v);
  const hn = Math.sqrt(dot(h, h));
  const a = 1 / (2 / rn - dot(v, v) / mu);
  const vxh = cross(v, h);
  const ev: Vec3 = [vxh[0] / mu - r[0] / rn, vxh[1] / mu - r[1] / rn, vxh[2] / mu - r[2] / rn];
  const e = Math.sqrt(dot(ev, ev));
  const iRad = Math.acos(Math.max(-1, Math.min(1, h[2] / hn)));
  const nodeLen = Math.hypot(h[0], h[1]);
  const raanRad = nodeLen > 1e-12 * hn ? wrapTwoPi(Math.atan2(h[0], -h[1])) : 0;
  // unit vectors of the node line and of the in-plane normal to it
  const nx: Vec3 = [Math.cos(raanRad), Math.sin(raanRad), 0];
  const ny = cross([h[0] / hn, h[1] / hn, h[2] / hn], nx);
  const u = Math.atan2(dot(r, ny), dot(r, nx));
  const w = e > 1e-14 ? Math.atan2(dot(ev, ny), dot(ev, nx)) : 0;
  const f = u - w;
  const E = 2 * Math.atan2(Math.sqrt(1 - e) * Math.sin(f / 2), Math.sqrt(1 + e) * Math.cos(f / 2));
  return { aKm: a, e, iRad, raanRad, argPerigeeRad: wrapTwoPi(w), meanAnomalyRad: wrapTwoPi(E - e * Math.sin(E)) };
}

/** Keplerian period [s] of semi-major axis aKm. */
export function keplerPeriod(aKm: number, mu = EARTH_MU_KM3_S2): number {
  return TWO_PI * Math.sqrt((aKm * aKm * aKm) / mu);
}
