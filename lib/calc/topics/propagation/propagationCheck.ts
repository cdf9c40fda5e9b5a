/**
 * Cowell propagation of a circular orbit under J2 compared with the first-order secular node rate.
 *
 * Mean-element comparison: the osculating RAAN carries J2 short-period terms (twice per revolution,
 * amplitude ≈ 0.01° at 700 km) that would swamp a short comparison, so the numerical RAAN drift is
 * the slope of a time-weighted least-squares line through the osculating RAAN at every accepted step
 * (trapezoid-rule integrals over the whole span; short-period terms average out). The analytic rate
 * uses the time-averaged osculating semi-major axis and inclination as mean elements.
 * RK4 uses a fixed step T/N with N = clamp(⌈5·relTol^(−1/4)⌉, 20, 1000) steps per Keplerian period
 * (RK4 global error ∝ h⁴; common practice, no source).
 * Units: km, s, rad.
 */
import { EARTH_MU_KM3_S2, EARTH_RADIUS_KM, SECONDS_PER_DAY, TWO_PI } from '../../constants';
import { CalcInputError } from '../../types';
import { toDeg } from '../angles';
import { computeSecularRates } from '../j2Secular';
import { computePlaneElements } from './elements';
import { integrateAdaptive, integrateRk4, IntegrationError, type IntegrationStats } from './integrators';
import { computeJ2Derivative, computeJ2Energy } from './j2Force';

export type IntegratorName = 'rk4' | 'dopri5' | 'dop853';

export const MAX_HISTORY_ROWS = 400;
export const MAX_ADAPTIVE_STEPS = 5_000_000;
export const MAX_RK4_STEPS = 15_000_000;

/** Time-weighted least-squares line through a sampled function (trapezoid rule). */
class LineFit {
  private s = 0;
  private st = 0;
  private stt = 0;
  private sy = 0;
  private sty = 0;
  private t0 = 0;
  private y0 = 0;
  private started = false;

  add(t: number, y: number): void {
    if (this.started) {
      const w = 0.5 * (t - this.t0);
      this.s += 2 * w;
      this.st += w * (t + this.t0);
      this.stt += w * (t * t + this.t0 * this.t0);
      this.sy += w * (y + this.y0);
      this.sty += w * (t * y + this.t0 * this.y0);
    }
    this.t0 = t;
    this.y0 = y;
    this.started = true;
  }

  slope(): number {
    return (this.s * this.sty - this.st * this.sy) / (this.s * this.stt - this.st * this.st);
  }

  intercept(): number {
    return (this.sy - this.slope() * this.st) / this.s;
  }

  mean(): number {
    return this.sy / this.s;
  }
}

export interface HistoryRow {
  tDays: number;
  smaKm: number;
  inclinationDeg: number;
  raanDeg: number;
  /** First-order J2 secular theory has no secular change in a, e or i (Kozai 1959): the mean values, constant. */
  smaAnalyticKm: number;
  inclinationAnalyticDeg: number;
  raanAnalyticDeg: number;
}

export interface PropagationCheckResult {
  raanDriftNumericDeg: number;
  raanDriftAnalyticDeg: number;
  raanDriftDifferencePercent: number;
  smaDriftKm: number;
  energyRelError: number;
  steps: number;
  rejectedSteps: number;
  evaluations: number;
  history: HistoryRow[];
}

/** Initial state of a circular orbit at the ascending node with RAAN 0: r = (a, 0, 0), v = √(μ/a)(0, cos i, sin i). */
export function buildCircularState(aKm: number, iRad: number): Float64Array {
  const v = Math.sqrt(EARTH_MU_KM3_S2 / aKm);
  return Float64Array.from([aKm, 0, 0, 0, v * Math.cos(iRad), v * Math.sin(iRad)]);
}

/** RK4 steps per Keplerian period for a relative tolerance (see module note). */
export function rk4StepsPerPeriod(relTol: number): number {
  return Math.min(1000, Math.max(20, Math.ceil(5 * relTol ** -0.25)));
}

/** Propagate `days` days with the chosen integrator and compare with the J2 secular node rate. */
export function runPropagationCheck(altitudeKm: number, iRad: number, days: number, integrator: IntegratorName, relTol: number): PropagationCheckResult {
  const a0 = EARTH_RADIUS_KM + altitudeKm;
  const y0 = buildCircularState(a0, iRad);
  const span = days * SECONDS_PER_DAY;
  const e0 = computeJ2Energy(y0);
  const raanFit = new LineFit();
  const smaFit = new LineFit();
  const incFit = new LineFit();
  const raw: Omit<HistoryRow, 'raanAnalyticDeg' | 'smaAnalyticKm' | 'inclinationAnalyticDeg'>[] = [];
  const sampleEvery = span / (MAX_HISTORY_ROWS - 1);
  let nextSample = 0;
  let maxEnergyError = 0;
  let prevRaan = 0;
  let raanOffset = 0;

  const observe = (t: number, y: Float64Array): void => {
    const el = computePlaneElements(y);
    let raan = el.raanRad + raanOffset;
    if (raan - prevRaan > Math.PI) raanOffset -= TWO_PI;
    else if (raan - prevRaan < -Math.PI) raanOffset += TWO_PI;
    raan = el.raanRad + raanOffset;
    prevRaan = raan;
    const tDays = t / SECONDS_PER_DAY;
    raanFit.add(tDays, toDeg(raan));
    smaFit.add(tDays, el.smaKm);
    incFit.add(tDays, el.inclinationRad);
    const err = Math.abs((computeJ2Energy(y) - e0) / e0);
    if (err > maxEnergyError) maxEnergyError = err;
    if (t >= nextSample - 1e-6 && raw.length < MAX_HISTORY_ROWS) {
      raw.push({ tDays, smaKm: el.smaKm, inclinationDeg: toDeg(el.inclinationRad), raanDeg: toDeg(raan) });
      nextSample += sampleEvery;
    }
  };

  observe(0, y0);
  let stats: IntegrationStats;
  try {
    if (integrator === 'rk4') {
      const period = TWO_PI * Math.sqrt((a0 * a0 * a0) / EARTH_MU_KM3_S2);
      const nSteps = Math.ceil((span / period) * rk4StepsPerPeriod(relTol));
      if (nSteps > MAX_RK4_STEPS) throw new CalcInputError('relTol', `rk4 would need ${nSteps} steps (limit ${MAX_RK4_STEPS}): loosen relTol or shorten days`);
      stats = integrateRk4(computeJ2Derivative, 0, y0, span, nSteps, observe);
    } else {
      stats = integrateAdaptive(integrator, computeJ2Derivative, 0, y0, span, { relTol, absTol: relTol, maxSteps: MAX_ADAPTIVE_STEPS }, observe);
    }
  } catch (err) {
    if (err instanceof IntegrationError) throw new CalcInputError('relTol', `${integrator} could not finish: ${err.message}; loosen relTol or shorten days`);
    throw err;
  }

  const meanRates = computeSecularRates(smaFit.mean(), 0, incFit.mean());
  const analyticRateDegPerDay = toDeg(meanRates.nodeRate) * SECONDS_PER_DAY;
  const numericRate = raanFit.slope();
  const intercept = raanFit.intercept();
  const smaAnalyticKm = smaFit.mean();
  const inclinationAnalyticDeg = toDeg(incFit.mean());
  return {
    raanDriftNumericDeg: numericRate * days,
    raanDriftAnalyticDeg: analyticRateDegPerDay * days,
    raanDriftDifferencePercent: ((numericRate - analyticRateDegPerDay) / analyticRateDegPerDay) * 100,
    smaDriftKm: smaFit.slope() * days,
    energyRelError: maxEnergyError,
    steps: stats.steps,
    rejectedSteps: stats.rejected,
    evaluations: stats.evaluations,
    history: raw.map((r) => ({ ...r, smaAnalyticKm, inclinationAnalyticDeg, raanAnalyticDeg: intercept + analyticRateDegPerDay * r.tDays })),
  };
}
