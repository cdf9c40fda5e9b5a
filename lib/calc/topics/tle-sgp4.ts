/**
 * SGP4 (and SDP4 for periods ≥ 225 min) at a TLE's epoch, through satellite.js
 * (npm, a port of Vallado's reference code of "Revisiting Spacetrack Report #3",
 * AIAA 2006-6753, in its improved mode, with the WGS-72 constants SGP4 is defined with).
 *
 * What is read from SGP4's initialisation (Hoots & Roehrich, Spacetrack Report
 * #3, 1980; Vallado et al. 2006):
 * - the Brouwer mean semi-major axis: SGP4 turns the TLE's Kozai mean motion
 *   into Brouwer's ("un-Kozai") and a = (k_e / n″)^(2/3) earth radii;
 * - the secular node rate Ω̇ (J2 with its J2² and J4 parts, the e → 0 limit the
 *   engine's zonal theory shares, see lib/calc/README.md);
 * - the TEME position and velocity at the epoch (tsince = 0).
 */
import { constants, sgp4, twoline2satrec, type SatRec } from 'satellite.js';
import { CalcInputError } from '../types';
import type { TleSet } from './tle';

/** Equatorial radius of SGP4's gravity model, WGS-72 [km] (satellite.js `constants.earthRadius`). */
export const SGP4_EARTH_RADIUS_KM: number = constants.earthRadius;

export interface Sgp4Epoch {
  /** Brouwer mean semi-major axis [km] */
  meanSemiMajorAxisKm: number;
  /** secular node rate [rad/min] */
  nodeRateRadPerMin: number;
  /** true when the period is 225 min or more and SDP4 (lunisolar terms) applies */
  deepSpace: boolean;
  positionTemeKm: [number, number, number];
  velocityTemeKmS: [number, number, number];
}

const SGP4_ERRORS: Record<number, string> = {
  1: 'mean eccentricity out of range 0 ≤ e < 1',
  2: 'mean motion below zero',
  3: 'perturbed eccentricity out of range',
  4: 'semi-latus rectum below zero',
  6: 'the orbit has decayed (position below the surface)',
};

export function sgp4AtEpoch(set: TleSet): Sgp4Epoch {
  const satrec: SatRec = twoline2satrec(set.line1, set.line2);
  const fail = (code: number): never => {
    throw new CalcInputError(
      'tle',
      `TLE set ${set.index}: SGP4 refuses the elements (${SGP4_ERRORS[code] ?? `error ${code}`})`,
    );
  };
  if (satrec.error) fail(satrec.error);
  const state = sgp4(satrec, 0);
  if (!state || satrec.error || typeof state.position !== 'object' || typeof state.velocity !== 'object')
    return fail(satrec.error || 6);
  const { position: p, velocity: v } = state;
  return {
    meanSemiMajorAxisKm: satrec.a * SGP4_EARTH_RADIUS_KM,
    nodeRateRadPerMin: satrec.nodedot,
    deepSpace: satrec.method === 'd',
    positionTemeKm: [p.x, p.y, p.z],
    velocityTemeKmS: [v.x, v.y, v.z],
  };
}
