/**
 * Ground track of a circular orbit with secular motion of the chosen theory (secularRates.ts).
 * Argument of latitude u(t) = (ω̇ + Ṁ) t from the ascending node, node Ω(t) = Ω0 + Ω̇ t,
 * position in the equator-of-date frame, Earth-fixed longitude by rotating through GMST
 * (IAU 1982, Vallado 4th ed. eq. 3-47, at the start epoch, then advanced at the engine's one Earth
 * rotation rate ω⊕ — the same rate the repeat condition uses), geodetic latitude on the WGS-84
 * ellipsoid by fixed-point iteration (Vallado 4th ed. Algorithm 12, number from memory).
 * Units: km, s, rad.
 */
import { EARTH_FLATTENING, EARTH_RADIUS_KM, EARTH_ROTATION_RAD_S } from '../constants';
import { toDeg, wrapPi } from './angles';
import { computeNodalPeriod, computeSecularRates, DEFAULT_THEORY, type SecularTheory } from './secular-rates';
import { gmstRad } from './time';

const E2 = EARTH_FLATTENING * (2 - EARTH_FLATTENING);

/** Geodetic latitude [rad] of an Earth-fixed position (x, y, z) [km] on WGS-84. */
export function computeGeodeticLatitude(x: number, y: number, z: number): number {
  const rxy = Math.hypot(x, y);
  let lat = Math.atan2(z, rxy);
  for (let k = 0; k < 4; k++) {
    const s = Math.sin(lat);
    const c = EARTH_RADIUS_KM / Math.sqrt(1 - E2 * s * s);
    lat = Math.atan2(z + c * E2 * s, rxy);
  }
  return lat;
}

export type TrackPoint = {
  t: number;
  latDeg: number;
  lonDeg: number;
};

export type NodeCrossing = { t: number; lonDeg: number };

export interface GroundTrack {
  points: TrackPoint[];
  ascendingNodes: NodeCrossing[];
  nodalPeriodS: number;
}

/**
 * Earth-fixed position [km] of the circular mean orbit at time t [s] after an ascending-node crossing:
 * argument of latitude uRate·t, node raan0 + nodeRate·t, rotated by the Earth angle gmst0 + gmstRate·t.
 */
export function computeEarthFixedPosition(
  aKm: number,
  iRad: number,
  raan0: number,
  gmst0: number,
  gmstRate: number,
  uRate: number,
  nodeRate: number,
  t: number,
): [number, number, number] {
  const u = uRate * t;
  const raan = raan0 + nodeRate * t;
  const cu = Math.cos(u);
  const su = Math.sin(u);
  const x = aKm * (Math.cos(raan) * cu - Math.sin(raan) * su * Math.cos(iRad));
  const y = aKm * (Math.sin(raan) * cu + Math.cos(raan) * su * Math.cos(iRad));
  const z = aKm * su * Math.sin(iRad);
  const theta = gmst0 + gmstRate * t;
  return [x * Math.cos(theta) + y * Math.sin(theta), -x * Math.sin(theta) + y * Math.cos(theta), z];
}

/** Sub-satellite point [lat, lon rad] at time t [s] after an ascending-node crossing with GMST gmst0 [rad]. */
function subSatellitePoint(
  aKm: number,
  iRad: number,
  raan0: number,
  gmst0: number,
  gmstRate: number,
  uRate: number,
  nodeRate: number,
  t: number,
): [number, number] {
  const [xe, ye, z] = computeEarthFixedPosition(aKm, iRad, raan0, gmst0, gmstRate, uRate, nodeRate, t);
  return [computeGeodeticLatitude(xe, ye, z), wrapPi(Math.atan2(ye, xe))];
}

/**
 * Ground track from an ascending-node crossing at Julian date jd0 with RAAN raan0 [rad],
 * sampled every stepS seconds for spanS seconds (caller caps the point count), rates of `theory`.
 */
export function computeGroundTrack(
  aKm: number,
  iRad: number,
  raan0: number,
  jd0: number,
  spanS: number,
  stepS: number,
  theory: SecularTheory = DEFAULT_THEORY,
): GroundTrack {
  const rates = computeSecularRates(aKm, 0, iRad, theory);
  const uRate = rates.perigeeRate + rates.meanAnomalyRate;
  const nodalPeriodS = computeNodalPeriod(rates);
  const gmst0 = gmstRad(jd0);
  const gmstRate = EARTH_ROTATION_RAD_S;
  const at = (t: number) => subSatellitePoint(aKm, iRad, raan0, gmst0, gmstRate, uRate, rates.nodeRate, t);
  const points: TrackPoint[] = [];
  const count = Math.floor(spanS / stepS + 1e-9);
  for (let k = 0; k <= count; k++) {
    const t = k * stepS;
    const [lat, lon] = at(t);
    points.push({ t, latDeg: toDeg(lat), lonDeg: toDeg(lon) });
  }
  const ascendingNodes: NodeCrossing[] = [];
  for (let k = 0; k * nodalPeriodS <= spanS; k++) {
    const t = k * nodalPeriodS;
    ascendingNodes.push({ t, lonDeg: toDeg(at(t)[1]) });
  }
  return { points, ascendingNodes, nodalPeriodS };
}
