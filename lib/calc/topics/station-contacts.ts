/**
 * Contacts between a circular orbit and ground sites: when each site sees the
 * satellite above its minimum elevation.
 *
 * Orbit: the circular mean orbit of the chosen secular theory from an ascending-node
 * crossing at the start epoch, as the ground-track kind draws it (groundTrack.ts:
 * argument of latitude and node advancing at their secular rates, Earth angle from
 * IAU 1982 GMST advanced at ω⊕). Site: geodetic latitude, longitude and height on
 * WGS-84 (NIMA TR8350.2) turned into Earth-fixed coordinates (Vallado 4th ed.
 * §3.2, site position; number from memory); elevation from the local vertical of the
 * ellipsoid. The elevation is sampled every `stepS` seconds and each crossing of the
 * minimum elevation found by bisection to 0.01 s: a pass shorter than about the
 * step (a graze at the edge of the visibility circle) can be missed.
 * Units: km, s, rad. Not modelled: short-period and drag motion, refraction, terrain.
 */
import { EARTH_FLATTENING, EARTH_RADIUS_KM, EARTH_ROTATION_RAD_S } from '../constants';
import { toRad } from './angles';
import { computeEarthFixedPosition } from './ground-track';
import { computeNodalPeriod, computeSecularRates, type SecularTheory } from './secular-rates';
import { gmstRad } from './time';
import type { Site } from './site-list';

const E2 = EARTH_FLATTENING * (2 - EARTH_FLATTENING);

export interface ContactOrbit {
  aKm: number;
  iRad: number;
  raan0: number;
  jd0: number;
  theory: SecularTheory;
  /** Earth rotation rate [rad/s]; the engine's ω⊕ unless a test sets 0 to match a textbook that neglects it. */
  earthRotationRadS?: number;
}

export interface Pass {
  startS: number;
  endS: number;
  maxElevationDeg: number;
  /** true when the pass was already under way at the start or still under way at the end of the span. */
  clipped: boolean;
}

/** Earth-fixed position [km] and local vertical of a geodetic site (WGS-84). */
export function computeSitePosition(site: Pick<Site, 'latDeg' | 'lonDeg' | 'altitudeKm'>): {
  r: [number, number, number];
  up: [number, number, number];
} {
  const lat = toRad(site.latDeg);
  const lon = toRad(site.lonDeg);
  const s = Math.sin(lat);
  const c = Math.cos(lat);
  const n = EARTH_RADIUS_KM / Math.sqrt(1 - E2 * s * s);
  const h = site.altitudeKm;
  return {
    r: [(n + h) * c * Math.cos(lon), (n + h) * c * Math.sin(lon), (n * (1 - E2) + h) * s],
    up: [c * Math.cos(lon), c * Math.sin(lon), s],
  };
}

/** The passes of each site over [0, spanS] after the start epoch. */
export function computeSitePasses(orbit: ContactOrbit, sites: Site[], spanS: number, stepS: number): Pass[][] {
  const rates = computeSecularRates(orbit.aKm, 0, orbit.iRad, orbit.theory);
  const uRate = rates.perigeeRate + rates.meanAnomalyRate;
  const gmst0 = gmstRad(orbit.jd0);
  const omega = orbit.earthRotationRadS ?? EARTH_ROTATION_RAD_S;
  const position = (t: number) =>
    computeEarthFixedPosition(orbit.aKm, orbit.iRad, orbit.raan0, gmst0, omega, uRate, rates.nodeRate, t);
  return sites.map((site) => {
    const { r: rs, up } = computeSitePosition(site);
    const sinMin = Math.sin(toRad(site.minElevationDeg));
    const sinElevation = (t: number) => {
      const p = position(t);
      const d = [p[0] - rs[0], p[1] - rs[1], p[2] - rs[2]];
      return (d[0] * up[0] + d[1] * up[1] + d[2] * up[2]) / Math.hypot(d[0], d[1], d[2]);
    };
    const above = (t: number) => sinElevation(t) - sinMin;
    const crossing = (t0: number, t1: number) => {
      let lo = t0;
      let hi = t1;
      const rising = above(t0) < 0;
      while (hi - lo > 0.01) {
        const mid = 0.5 * (lo + hi);
        if (above(mid) < 0 === rising) lo = mid;
        else hi = mid;
      }
      return 0.5 * (lo + hi);
    };
    const passes: Pass[] = [];
    let start: number | null = above(0) >= 0 ? 0 : null;
    let startClipped = start !== null;
    let maxSin = start !== null ? sinElevation(0) : -1;
    const count = Math.ceil(spanS / stepS);
    let prevT = 0;
    let prevAbove = above(0) >= 0;
    for (let k = 1; k <= count; k++) {
      const t = Math.min(k * stepS, spanS);
      const f = above(t);
      const nowAbove = f >= 0;
      if (nowAbove) maxSin = Math.max(maxSin, sinElevation(t));
      if (nowAbove && !prevAbove) {
        start = crossing(prevT, t);
        startClipped = false;
        maxSin = Math.max(sinElevation(start), sinElevation(t));
      } else if (!nowAbove && prevAbove && start !== null) {
        const end = crossing(prevT, t);
        passes.push(finishPass(start, end, maxSin, startClipped, sinElevation));
        start = null;
      }
      prevT = t;
      prevAbove = nowAbove;
    }
    if (start !== null) passes.push(finishPass(start, spanS, maxSin, true, sinElevation));
    return passes;
  });
}

/** Refines the highest elevation of a pass by golden-section search between its samples (to 0.01 s). */
function finishPass(
  startS: number,
  endS: number,
  sampledMaxSin: number,
  clipped: boolean,
  sinElevation: (t: number) => number,
): Pass {
  let lo = startS;
  let hi = endS;
  const g = (Math.sqrt(5) - 1) / 2;
  while (hi - lo > 0.01) {
    const a = hi - g * (hi - lo);
    const b = lo + g * (hi - lo);
    if (sinElevation(a) > sinElevation(b)) hi = b;
    else lo = a;
  }
  const best = Math.max(sampledMaxSin, sinElevation(0.5 * (lo + hi)));
  return { startS, endS, maxElevationDeg: (Math.asin(Math.min(1, best)) * 180) / Math.PI, clipped };
}

/** Nodal period [s] of the circular mean orbit (the time of one pass of the argument of latitude). */
export function contactOrbitNodalPeriod(orbit: ContactOrbit): number {
  return computeNodalPeriod(computeSecularRates(orbit.aKm, 0, orbit.iRad, orbit.theory));
}
