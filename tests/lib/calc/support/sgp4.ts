/**
 * Test support: hand-built TLEs and SGP4 (satellite.js, npm reference library) measurements.
 * TLE column layout and checksum rule: NORAD two-line element format as documented by
 * CelesTrak ("NORAD Two-Line Element Set Format", T. S. Kelso).
 */
import { propagate, twoline2satrec } from 'satellite.js';
import { tleChecksum as checksum } from '@/lib/calc/topics/tle';

function fixed(value: number, width: number, decimals: number): string {
  return value.toFixed(decimals).padStart(width, ' ');
}

export interface TleElements {
  inclinationDeg: number;
  raanDeg: number;
  eccentricity: number;
  argPerigeeDeg: number;
  meanAnomalyDeg: number;
  meanMotionRevPerDay: number;
  /** two-digit year and day of year with fraction */
  epochYear: number;
  epochDay: number;
}

/** Two TLE lines (drag terms zero) for the given mean elements. */
export function buildTle(e: TleElements): [string, string] {
  const yy = String(e.epochYear % 100).padStart(2, '0');
  const day = e.epochDay.toFixed(8).padStart(12, '0');
  const l1 = `1 99999U 24001A   ${yy}${day}  .00000000  00000-0  00000-0 0  999`;
  const ecc = Math.round(e.eccentricity * 1e7)
    .toString()
    .padStart(7, '0');
  const l2 = `2 99999 ${fixed(e.inclinationDeg, 8, 4)} ${fixed(e.raanDeg, 8, 4)} ${ecc} ${fixed(e.argPerigeeDeg, 8, 4)} ${fixed(e.meanAnomalyDeg, 8, 4)} ${fixed(e.meanMotionRevPerDay, 11, 8)}    1`;
  return [`${l1}${checksum(l1)}`, `${l2}${checksum(l2)}`];
}

/** Least-squares slope of y against x. */
export function fitSlope(x: number[], y: number[]): number {
  const n = x.length;
  const mx = x.reduce((s, v) => s + v, 0) / n;
  const my = y.reduce((s, v) => s + v, 0) / n;
  let sxy = 0;
  let sxx = 0;
  for (let k = 0; k < n; k++) {
    sxy += (x[k] - mx) * (y[k] - my);
    sxx += (x[k] - mx) ** 2;
  }
  return sxy / sxx;
}

/**
 * Mean RAAN rate [deg/day] of an SGP4 propagation: RAAN from h = r × v every stepMin minutes
 * over `days`, unwrapped, then a least-squares line (short-period terms average out).
 */
export function measureSgp4NodeRate(lines: [string, string], start: Date, days: number, stepMin = 10): number {
  const satrec = twoline2satrec(lines[0], lines[1]);
  const t: number[] = [];
  const raan: number[] = [];
  let prev = 0;
  let offset = 0;
  for (let m = 0; m <= days * 1440; m += stepMin) {
    const pv = propagate(satrec, new Date(start.getTime() + m * 60000));
    if (!pv) throw new Error('SGP4 propagation failed');
    const r = pv.position;
    const v = pv.velocity;
    const hx = r.y * v.z - r.z * v.y;
    const hy = r.z * v.x - r.x * v.z;
    let node = (Math.atan2(hx, -hy) * 180) / Math.PI;
    if (t.length > 0 && node + offset - prev > 180) offset -= 360;
    if (t.length > 0 && node + offset - prev < -180) offset += 360;
    node += offset;
    prev = node;
    t.push(m / 1440);
    raan.push(node);
  }
  return fitSlope(t, raan);
}

/** Semi-major axis [km] from a TLE mean motion [rev/day] with the WGS-84 μ (Kepler's third law). */
export function semiMajorAxisFromRevPerDay(revPerDay: number): number {
  const n = (revPerDay * 2 * Math.PI) / 86400;
  return Math.cbrt(398600.4418 / (n * n));
}

/** Build a TLE at epoch (year, day-of-year) and measure its SGP4 node rate [deg/day] over `days`. */
export function sgp4NodeRateFor(e: TleElements, days: number): number {
  const start = new Date(Date.UTC(e.epochYear, 0, 1) + (e.epochDay - 1) * 86400000);
  return measureSgp4NodeRate(buildTle(e), start, days);
}
