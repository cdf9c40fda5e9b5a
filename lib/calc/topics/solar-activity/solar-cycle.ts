/**
 * Solar activity over time from a parametric sunspot-cycle shape.
 *
 * Cycle shape (Hathaway, Wilson & Reichmann 1994, Solar Physics 151, 177): smoothed monthly sunspot number
 *   R(t) = a τ³ / (exp(τ² / b²) − c),  τ = months since the cycle's start (minimum),
 *   c = 0.71, b = 27.12 + 25.15 / (a·10³)^¼  (rise time tied to amplitude, so a cycle is set by its start and size).
 * The fit is in the original (version 1) International Sunspot Number; today's published values are version 2,
 * which SILSO states to be about 45 % higher after 1947 (SILSO, "Sunspot Number Version 2.0: new data and
 * conventions", 2015), so R_v1 = R_v2 / 1.45 here.
 * F10.7 from the sunspot number (Holland & Vaughn 1984, as eq. 3 of D. H. Hathaway, "The Solar Cycle",
 * Living Rev. Solar Phys. 7 (2010) 1): F10.7 = 67 + 0.97 R + 17.6 (exp(−0.035 R) − 1), R version 1.
 * Cycles overlap near minimum: the curve is the sum of every cycle's shape.
 * Units: sunspot numbers version 2 at the interface, F10.7 in sfu, time in months of 365.25/12 days.
 */
import type { SpaceWeather } from '../atmosphere/density-at-epoch';

export type SolarActivityLevel = 'low' | 'mean' | 'high';

export interface SolarCycleParameters {
  /** start (minimum) of the current cycle */
  cycleStart: Date;
  /** maximum smoothed monthly sunspot number (version 2) of the current cycle */
  cycleMaxSunspotNumber: number;
  /** maximum smoothed sunspot number (version 2) assumed for the cycles after it */
  nextCyclesMaxSunspotNumber: number;
  /** minimum-to-minimum length of the current and later cycles [years] */
  cyclePeriodYears: number;
  /** one standard deviation of a cycle's amplitude [% of it]; the low/high levels are ∓ 2σ */
  amplitudeSigmaPercent: number;
  /** daily Ap used at every date (the cycle model has no geomagnetic part) */
  apMean: number;
}

/** A completed cycle kept fixed so that dates back to its start can be evaluated. */
export const PREVIOUS_CYCLE = {
  /** cycle 24 minimum, December 2008 (SIDC/STCE) */
  start: new Date(Date.UTC(2008, 11, 1)),
  /** cycle 24 maximum smoothed sunspot number 116.4 (April 2014; NASA MSFC "Solar Cycle 25 Status", 2023) */
  maxSunspotNumber: 116.4,
} as const;

/** Defaults for the current cycle (25): start December 2019 as declared by SIDC; amplitude see README. */
export const CYCLE_25_DEFAULTS = {
  cycleStartEpoch: '2019-12-01T00:00:00Z',
  cycleMaxSunspotNumber: 140,
  nextCyclesMaxSunspotNumber: 140,
  cyclePeriodYears: 11,
  amplitudeSigmaPercent: 10,
  apMean: 12,
} as const;

const C_SHAPE = 0.71;
const V2_OVER_V1 = 1.45;
const DAYS_PER_MONTH = 365.25 / 12;
const MS_PER_MONTH = DAYS_PER_MONTH * 86_400_000;

function shapeWidthMonths(a: number): number {
  return 27.12 + 25.15 / Math.pow(a * 1e3, 0.25);
}

/** Hathaway et al. (1994) cycle shape, version-1 sunspot number, τ months after the start. */
export function computeCycleShape(tauMonths: number, a: number): number {
  if (tauMonths <= 0) return 0;
  const b = shapeWidthMonths(a);
  const x = (tauMonths / b) ** 2;
  if (x > 700) return 0;
  return (a * tauMonths ** 3) / (Math.exp(x) - C_SHAPE);
}

/** Peak of u³/(exp(u²) − c) (τ = b u), found once by golden-section search. */
const UNIT_PEAK = (() => {
  const h = (u: number) => (u * u * u) / (Math.exp(u * u) - C_SHAPE);
  let lo = 0.5;
  let hi = 3;
  const g = (Math.sqrt(5) - 1) / 2;
  for (let k = 0; k < 200; k++) {
    const x1 = hi - g * (hi - lo);
    const x2 = lo + g * (hi - lo);
    if (h(x1) < h(x2)) lo = x1;
    else hi = x2;
  }
  const u = (lo + hi) / 2;
  return { u, value: h(u) };
})();

/** Amplitude parameter a whose curve peaks at maxV1 (version-1 sunspot number); bisection on a·b(a)³·h*. */
export function computeShapeAmplitude(maxV1: number): number {
  let lo = 1e-9;
  let hi = 1;
  for (let k = 0; k < 100; k++) {
    const mid = Math.sqrt(lo * hi);
    if (mid * shapeWidthMonths(mid) ** 3 * UNIT_PEAK.value < maxV1) lo = mid;
    else hi = mid;
  }
  return Math.sqrt(lo * hi);
}

/** Months from the start of a cycle of maximum maxV2 (version 2) to its peak. */
export function computePeakMonths(maxV2: number): number {
  return shapeWidthMonths(computeShapeAmplitude(maxV2 / V2_OVER_V1)) * UNIT_PEAK.u;
}

/** F10.7 [sfu] from a version-1 sunspot number (Holland & Vaughn 1984). */
export function computeF107FromSunspots(rV1: number): number {
  return 67 + 0.97 * rV1 + 17.6 * (Math.exp(-0.035 * rV1) - 1);
}

/** Amplitude factor of a level: low = 1 − 2σ, mean = 1, high = 1 + 2σ. */
export function levelFactor(level: SolarActivityLevel, sigmaPercent: number): number {
  const twoSigma = (2 * sigmaPercent) / 100;
  return level === 'low' ? Math.max(0, 1 - twoSigma) : level === 'high' ? 1 + twoSigma : 1;
}

export interface SolarActivityAt extends SpaceWeather {
  /** smoothed monthly sunspot number, version 2 */
  sunspotNumber: number;
}

/** Smoothed sunspot number (version 2), F10.7 (daily = 81-day mean) and Ap at a date. */
export function computeSolarActivity(date: Date, p: SolarCycleParameters, level: SolarActivityLevel): SolarActivityAt {
  const factor = levelFactor(level, p.amplitudeSigmaPercent);
  const months = (from: Date) => (date.getTime() - from.getTime()) / MS_PER_MONTH;
  // previous (completed) cycle: observed, not scaled by the level
  let rV1 = computeCycleShape(
    months(PREVIOUS_CYCLE.start),
    computeShapeAmplitude(PREVIOUS_CYCLE.maxSunspotNumber / V2_OVER_V1),
  );
  const periodMonths = p.cyclePeriodYears * 12;
  const tau0 = months(p.cycleStart);
  for (let k = 0; tau0 - k * periodMonths > 0; k++) {
    const maxV2 = (k === 0 ? p.cycleMaxSunspotNumber : p.nextCyclesMaxSunspotNumber) * factor;
    if (maxV2 > 0) rV1 += computeCycleShape(tau0 - k * periodMonths, computeShapeAmplitude(maxV2 / V2_OVER_V1));
  }
  const f107 = computeF107FromSunspots(rV1);
  return { sunspotNumber: rV1 * V2_OVER_V1, f107, f107Average: f107, ap: p.apMean };
}

/** First date the model covers (start of the previous cycle). */
export const SOLAR_MODEL_FIRST_DATE = PREVIOUS_CYCLE.start;
