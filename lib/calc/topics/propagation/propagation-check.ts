/**
 * Cowell propagation from mean elements under two-body + zonal harmonics J2…J_N (N = zonalDegree, 2…6),
 * compared with the secular node rate of the same field in the chosen analytic theory.
 *
 * Start: the input mean elements (a = R⊕ + altitude, e = 0, i, Ω = 0, argument of latitude 0) are turned
 * into an osculating state with the engine's mean → osculating conversion (first-order short-period terms),
 * so the numerical orbit has the stated mean semi-major axis rather than a circular osculating one about
 * (3/2) J2 R²/a sin²i ≈ 9 km higher (Kozai 1959).
 * Mean-element comparison: the osculating RAAN carries short-period terms (twice per revolution,
 * amplitude ≈ 0.01° at 700 km) that would swamp a short comparison, so the numerical RAAN drift is
 * the slope of a time-weighted least-squares line through the osculating RAAN at every accepted step
 * (trapezoid-rule integrals over the whole span; short-period terms average out). The analytic rate is the
 * secular rate of the chosen theory at the input mean elements, limited to the same zonal degree.
 * RK4 uses a fixed step T/N with N = clamp(⌈5·relTol^(−1/4)⌉, 20, 1000) steps per Keplerian period
 * (RK4 global error ∝ h⁴; common practice, no source).
 * Units: km, s, rad.
 */
import { EARTH_MU_KM3_S2, EARTH_RADIUS_KM, SECONDS_PER_DAY, TWO_PI } from '../../constants';
import { CalcInputError } from '../../types';
import { toDeg } from '../angles';
import { computeSecularRates, type SecularTheory } from '../secular-rates';
import { computePlaneElements } from './elements';
import { integrateAdaptive, integrateRk4, IntegrationError, type IntegrationStats } from './integrators';
import { meanToOsculating } from '../mean-osculating';
import { createZonalForceModel, type ZonalForceModel } from './zonal-force';

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
}

export interface HistoryRow {
  tDays: number;
  smaKm: number;
  inclinationDeg: number;
  raanDeg: number;
  /** Secular zonal theory has no secular change in a, e or i (Brouwer 1959; Kozai 1959): the mean values, constant. */
  smaAnalyticKm: number;
  inclinationAnalyticDeg: number;
  raanAnalyticDeg: number;
}

export interface PropagationCheckResult {
  /** osculating semi-major axis of the start state [km] */
  startOsculatingSmaKm: number;
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

/** RK4 steps per Keplerian period for a relative tolerance (see module note). */
export function rk4StepsPerPeriod(relTol: number): number {
  return Math.min(1000, Math.max(20, Math.ceil(5 * relTol ** -0.25)));
}

export interface PropagationCheckOptions {
  altitudeKm: number;
  iRad: number;
  days: number;
  integrator: IntegratorName;
  relTol: number;
  zonalDegree: number;
  theory: SecularTheory;
}

/**
 * Osculating start state of the mean circular orbit (a, i) at the ascending node with RAAN 0, through the
 * engine's mean → osculating conversion with the short-period terms of the force model's zonal field.
 */
export function buildMeanStartState(aKm: number, iRad: number, force: ZonalForceModel): Float64Array {
  const s = meanToOsculating({ aKm, e: 0, iRad, raanRad: 0, argPerigeeRad: 0, meanAnomalyRad: 0 }, force.perturbation);
  return Float64Array.from([...s.positionKm, ...s.velocityKmS]);
}

/** Propagate `days` days with the chosen integrator and force model and compare with the analytic secular node rate. */
export function runPropagationCheck(o: PropagationCheckOptions): PropagationCheckResult {
  const { days, integrator, relTol } = o;
  const a0 = EARTH_RADIUS_KM + o.altitudeKm;
  const force = createZonalForceModel(o.zonalDegree);
  const y0 = buildMeanStartState(a0, o.iRad, force);
  const span = days * SECONDS_PER_DAY;
  const e0 = force.energy(y0);
  const raanFit = new LineFit();
  const smaFit = new LineFit();
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
    const err = Math.abs((force.energy(y) - e0) / e0);
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
      if (nSteps > MAX_RK4_STEPS)
        throw new CalcInputError(
          'relTol',
          `rk4 would need ${nSteps} steps (limit ${MAX_RK4_STEPS}): loosen relTol or shorten days`,
        );
      stats = integrateRk4(force.derivative, 0, y0, span, nSteps, observe);
    } else {
      stats = integrateAdaptive(
        integrator,
        force.derivative,
        0,
        y0,
        span,
        { relTol, absTol: relTol, maxSteps: MAX_ADAPTIVE_STEPS },
        observe,
      );
    }
  } catch (err) {
    if (err instanceof IntegrationError)
      throw new CalcInputError(
        'relTol',
        `${integrator} could not finish: ${err.message}; loosen relTol or shorten days`,
      );
    throw err;
  }

  const meanRates = computeSecularRates(a0, 0, o.iRad, o.theory, o.zonalDegree);
  const analyticRateDegPerDay = toDeg(meanRates.nodeRate) * SECONDS_PER_DAY;
  const numericRate = raanFit.slope();
  const intercept = raanFit.intercept();
  const smaAnalyticKm = a0;
  const inclinationAnalyticDeg = toDeg(o.iRad);
  return {
    startOsculatingSmaKm: computePlaneElements(y0).smaKm,
    raanDriftNumericDeg: numericRate * days,
    raanDriftAnalyticDeg: analyticRateDegPerDay * days,
    raanDriftDifferencePercent: ((numericRate - analyticRateDegPerDay) / analyticRateDegPerDay) * 100,
    smaDriftKm: smaFit.slope() * days,
    energyRelError: maxEnergyError,
    steps: stats.steps,
    rejectedSteps: stats.rejected,
    evaluations: stats.evaluations,
    history: raw.map((r) => ({
      ...r,
      smaAnalyticKm,
      inclinationAnalyticDeg,
      raanAnalyticDeg: intercept + analyticRateDegPerDay * r.tDays,
    })),
  };
}
