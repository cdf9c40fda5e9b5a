/**
 * Drag decay and orbital lifetime of a circular orbit.
 * Decay rate (King-Hele 1987; Vallado 4th ed. §9.6 / §8.6.2, numbers from memory):
 *   da/dt = −ρ B √(μ a),   B = C_D A / m,
 * lifetime = ∫ da / |da/dt| from a0 down to R⊕ + 200 km, evaluated with 5-point Gauss–Legendre
 * quadrature on each piece of the piecewise-exponential density (exact to ~1e-8 per piece).
 * Maintenance ΔV per year = drag acceleration ½ ρ v² B × one year (SMAD 3rd ed. ch. 6/8, from memory).
 * Densities: Vallado 4th ed. Table 8-4 for moderate activity; MSISE-90 tables for low/high (see atmosphereTables.ts).
 * Units: km, s; densities kg/m³, areas m², masses kg.
 */
import { EARTH_MU_KM3_S2, EARTH_RADIUS_KM, SECONDS_PER_DAY, TROPICAL_YEAR_DAYS } from '../constants';
import { MEAN_EXPONENTIAL, MSISE90_FIRST_KM, MSISE90_HIGH, MSISE90_LOW, MSISE90_STEP_KM } from './atmosphere-tables';

export type SolarActivity = 'low' | 'moderate' | 'high';

/** Piecewise-exponential layers: base altitude [km], base density [kg/m³], scale height [km]. */
interface Layer {
  h0: number;
  rho0: number;
  scaleKm: number;
}

function layersFromNodes(densities: readonly number[], firstKm: number, stepKm: number): Layer[] {
  return densities
    .slice(0, -1)
    .map((rho0, k) => ({ h0: firstKm + k * stepKm, rho0, scaleKm: stepKm / Math.log(rho0 / densities[k + 1]) }));
}

const LAYERS: Record<SolarActivity, Layer[]> = {
  moderate: MEAN_EXPONENTIAL.map(([h0, rho0, scaleKm]) => ({ h0, rho0, scaleKm })),
  low: layersFromNodes(MSISE90_LOW, MSISE90_FIRST_KM, MSISE90_STEP_KM),
  high: layersFromNodes(MSISE90_HIGH, MSISE90_FIRST_KM, MSISE90_STEP_KM),
};

/** Highest altitude [km] each table covers (the last layer extends to it). */
export const TABLE_TOP_KM: Record<SolarActivity, number> = { moderate: 1000, low: 900, high: 900 };
/** Lowest altitude [km] of the tables used here. */
export const TABLE_BOTTOM_KM = 100;
/** Lifetime end point: altitude [km] at which the orbit is counted as re-entered. */
export const REENTRY_ALTITUDE_KM = 200;

function layerIndex(layers: Layer[], h: number): number {
  let k = 0;
  while (k + 1 < layers.length && layers[k + 1].h0 <= h) k++;
  return k;
}

/** Atmospheric density [kg/m³] at altitude hKm for the given solar activity (valid TABLE_BOTTOM_KM..TABLE_TOP_KM). */
export function computeDensity(hKm: number, activity: SolarActivity): number {
  const layers = LAYERS[activity];
  const l = layers[layerIndex(layers, hKm)];
  return l.rho0 * Math.exp(-(hKm - l.h0) / l.scaleKm);
}

/** Circular-orbit decay rate da/dt [km/s] (negative) at altitude hKm; ballistic term B = C_D A / m [m²/kg]. */
export function computeDecayRate(hKm: number, bM2PerKg: number, activity: SolarActivity): number {
  const rhoPerKm = computeDensity(hKm, activity) * bM2PerKg * 1000; // ρB in 1/km
  return -rhoPerKm * Math.sqrt(EARTH_MU_KM3_S2 * (EARTH_RADIUS_KM + hKm));
}

const GL_NODES = [-0.906179845938664, -0.5384693101056831, 0, 0.5384693101056831, 0.906179845938664];
const GL_WEIGHTS = [0.2369268850561891, 0.4786286704993665, 0.5688888888888889, 0.4786286704993665, 0.2369268850561891];

/** Time [s] to decay from altitude hKm to REENTRY_ALTITUDE_KM (0 when already at or below it). */
export function computeLifetimeSeconds(hKm: number, bM2PerKg: number, activity: SolarActivity): number {
  if (hKm <= REENTRY_ALTITUDE_KM) return 0;
  const layers = LAYERS[activity];
  const edges = [
    REENTRY_ALTITUDE_KM,
    ...layers.map((l) => l.h0).filter((h) => h > REENTRY_ALTITUDE_KM && h < hKm),
    hKm,
  ];
  let total = 0;
  for (let k = 0; k + 1 < edges.length; k++) {
    const mid = (edges[k] + edges[k + 1]) / 2;
    const half = (edges[k + 1] - edges[k]) / 2;
    for (let g = 0; g < GL_NODES.length; g++) {
      total += (GL_WEIGHTS[g] * half) / -computeDecayRate(mid + half * GL_NODES[g], bM2PerKg, activity);
    }
  }
  return total;
}

export interface DragSummary {
  densityKgM3: number;
  decayKmPerDay: number;
  lifetimeDays: number;
  maintenanceDeltaVMpsPerYear: number;
  dragAccelerationMps2: number;
}

/** Density, decay rate, lifetime to 200 km and yearly maintenance ΔV at altitude hKm. */
export function summariseDrag(
  hKm: number,
  massKg: number,
  areaM2: number,
  cd: number,
  activity: SolarActivity,
): DragSummary {
  const b = (cd * areaM2) / massKg;
  const rho = computeDensity(hKm, activity);
  const vMs = Math.sqrt(EARTH_MU_KM3_S2 / (EARTH_RADIUS_KM + hKm)) * 1000;
  const accel = 0.5 * rho * vMs * vMs * b;
  return {
    densityKgM3: rho,
    decayKmPerDay: -computeDecayRate(hKm, b, activity) * SECONDS_PER_DAY,
    lifetimeDays: computeLifetimeSeconds(hKm, b, activity) / SECONDS_PER_DAY,
    maintenanceDeltaVMpsPerYear: accel * TROPICAL_YEAR_DAYS * SECONDS_PER_DAY,
    dragAccelerationMps2: accel,
  };
}
