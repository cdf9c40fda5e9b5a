/**
 * Orbit-averaged drag decay over dates: semi-major axis and eccentricity integrated in time down to re-entry.
 *
 * Method: Gauss's variational equations for a purely tangential drag acceleration T = −½ ρ v² B (B = C_D A/m)
 *   da/dt = 2 a² v T / μ,   de/dt = 2 (e + cos ν) T / v
 * (Vallado 4th ed. §9.6 / §8.6, sections from memory; D. G. King-Hele, "Methods for predicting satellite orbital lifetimes",
 * RAE Technical Report 77111, 1977, which builds lifetimes from the same per-revolution decay), averaged over one
 * revolution in mean anomaly by sampling N points uniformly in eccentric anomaly E with weights dM/dE = 1 − e cos E.
 * For e = 0 this is da/dt = −⟨ρ⟩ B √(μ a), King-Hele's circular decay with the orbit-mean density ⟨ρ⟩.
 * At each sample the density is taken at the point's geodetic altitude (r − R⊕(1 − f sin²φ)), latitude
 * φ = asin(sin i sin u) and local solar time LTAN + Δα/15° (Δα = right ascension from the node, u = ω + ν), so the
 * diurnal bulge and the latitude structure of the atmosphere enter the average; the node's local time moves with the
 * J2 node rate against the mean Sun (zero drift for a sun-synchronous orbit). All samples of one average are taken at
 * the same instant (an orbit is short against the solar and seasonal changes).
 * Time stepping: Heun's predictor–corrector with the end-point rate reused as the next start rate (one density
 * average per step), steps ≤ maxStepDays (15 d), ≤ maxStepKm (2 km) of perigee change and ≤ 5 maxStepKm of semi-major-axis change of semi-major-axis change.
 * Units: km, s, kg/m³, m²/kg. Valid: near-circular to moderately eccentric LEO (e ≲ 0.1), 120–1000 km.
 */
import {
  EARTH_FLATTENING,
  EARTH_MU_KM3_S2,
  EARTH_RADIUS_KM,
  SECONDS_PER_DAY,
  SUN_MEAN_MOTION_RAD_S,
  TWO_PI,
} from '../../constants';
import { computeSecularRates } from '../secular-rates';

const MS_PER_DAY = 86_400_000;
const RAD_TO_HOURS = 12 / Math.PI;

/** Density [kg/m³] at a geodetic altitude, latitude, local solar time and instant. */
export type DensityModel = (altitudeKm: number, latitudeDeg: number, localSolarTimeHours: number, date: Date) => number;

export interface DecayOrbit {
  /** ballistic term C_D A / m [m²/kg] */
  bM2PerKg: number;
  inclinationRad: number;
  /** mean local time of the ascending node at the start [h] */
  ltanHours: number;
  density: DensityModel;
  /** density samples per revolution */
  samples: number;
}

export interface AveragedRates {
  /** da/dt [km/s] */
  dadt: number;
  /** de/dt [1/s] */
  dedt: number;
  /** time-mean density over the revolution [kg/m³] */
  meanDensityKgM3: number;
}

/** Revolution-averaged da/dt and de/dt at semi-major axis aKm, eccentricity e, perigee argument omegaRad. */
export function computeAveragedRates(
  aKm: number,
  e: number,
  omegaRad: number,
  ltanHours: number,
  date: Date,
  o: DecayOrbit,
): AveragedRates {
  const si = Math.sin(o.inclinationRad);
  const ci = Math.cos(o.inclinationRad);
  const bPerKm = o.bM2PerKg * 1000; // ρ[kg/m³]·B[m²/kg] is 1/m; × 1000 → 1/km
  const rootE = Math.sqrt(1 - e * e);
  let wSum = 0;
  let daSum = 0;
  let deSum = 0;
  let rhoSum = 0;
  for (let k = 0; k < o.samples; k++) {
    const ecc = (TWO_PI * (k + 0.5)) / o.samples;
    const cosE = Math.cos(ecc);
    const w = 1 - e * cosE;
    const cosNu = (cosE - e) / w;
    const sinNu = (rootE * Math.sin(ecc)) / w;
    const r = aKm * w;
    const v2 = EARTH_MU_KM3_S2 * (2 / r - 1 / aKm);
    const v = Math.sqrt(v2);
    const u = omegaRad + Math.atan2(sinNu, cosNu);
    const sinLat = si * Math.sin(u);
    const altitude = r - EARTH_RADIUS_KM * (1 - EARTH_FLATTENING * sinLat * sinLat);
    const lst = ltanHours + Math.atan2(ci * Math.sin(u), Math.cos(u)) * RAD_TO_HOURS;
    const rho = o.density(altitude, Math.asin(sinLat) * (180 / Math.PI), ((lst % 24) + 24) % 24, date);
    const t = -0.5 * rho * bPerKm * v2; // km/s²
    wSum += w;
    rhoSum += w * rho;
    daSum += w * ((2 * aKm * aKm * v * t) / EARTH_MU_KM3_S2);
    if (e > 0) deSum += w * ((2 * (e + cosNu) * t) / v);
  }
  return { dadt: daSum / wSum, dedt: deSum / wSum, meanDensityKgM3: rhoSum / wSum };
}

export interface DecayRow {
  date: string;
  days: number;
  years: number;
  altitudeKm: number;
  perigeeAltitudeKm: number;
}

export interface DecayHistory {
  /** time to re-entry [s], or the horizon when the orbit is still up */
  lifetimeSeconds: number;
  reentered: boolean;
  /** rows about every rowEveryDays plus the start and the end */
  rows: DecayRow[];
  /** revolution-averaged rates at the start */
  initial: AveragedRates;
}

export interface DecayRun {
  start: Date;
  altitudeKm: number;
  eccentricity?: number;
  argPerigeeRad?: number;
  /** perigee altitude [km] at which the orbit counts as re-entered */
  reentryAltitudeKm: number;
  horizonYears: number;
  maxStepDays?: number;
  maxStepKm?: number;
  rowEveryDays?: number;
}

const YEAR_S = 365.25 * SECONDS_PER_DAY;

function rowAt(start: Date, t: number, a: number, e: number): DecayRow {
  return {
    date: new Date(start.getTime() + (t / SECONDS_PER_DAY) * MS_PER_DAY).toISOString(),
    days: t / SECONDS_PER_DAY,
    years: t / YEAR_S,
    altitudeKm: a - EARTH_RADIUS_KM,
    perigeeAltitudeKm: a * (1 - e) - EARTH_RADIUS_KM,
  };
}

/** Integrate the averaged decay from run.start until the perigee reaches the re-entry altitude or the horizon. */
export function integrateDecay(run: DecayRun, o: DecayOrbit): DecayHistory {
  const maxStep = (run.maxStepDays ?? 15) * SECONDS_PER_DAY;
  const maxKm = run.maxStepKm ?? 2;
  const rowEvery = (run.rowEveryDays ?? 30) * SECONDS_PER_DAY;
  const horizon = run.horizonYears * YEAR_S;
  const startMs = run.start.getTime();
  let a = EARTH_RADIUS_KM + run.altitudeKm;
  let e = run.eccentricity ?? 0;
  const omega0 = run.argPerigeeRad ?? 0;
  let t = 0;
  let ltan = o.ltanHours;
  const perigeeAlt = (aa: number, ee: number) => aa * (1 - ee) - EARTH_RADIUS_KM;
  const rates = (tt: number, aa: number, ee: number, lt: number) => {
    const j2 = computeSecularRates(aa, ee, o.inclinationRad);
    return computeAveragedRates(aa, ee, omega0 + j2.perigeeRate * tt, lt, new Date(startMs + tt * 1000), o);
  };
  const initial = rates(0, a, e, ltan);
  const rows: DecayRow[] = [rowAt(run.start, 0, a, e)];
  if (perigeeAlt(a, e) <= run.reentryAltitudeKm) return { lifetimeSeconds: 0, reentered: true, rows, initial };
  let f = initial;
  let nextRow = rowEvery;
  while (t < horizon) {
    // the perigee sets the drag: its change is held to maxKm per step, the semi-major axis (apogee) to 5 maxKm
    const perigeeSpeed = Math.abs(f.dadt * (1 - e) - a * f.dedt);
    const axisSpeed = Math.abs(f.dadt);
    const h = Math.min(
      maxStep,
      horizon - t,
      perigeeSpeed > 0 ? maxKm / perigeeSpeed : maxStep,
      axisSpeed > 0 ? (5 * maxKm) / axisSpeed : maxStep,
    );
    const ltanRate = (computeSecularRates(a, e, o.inclinationRad).nodeRate - SUN_MEAN_MOTION_RAD_S) * RAD_TO_HOURS;
    const aPred = a + h * f.dadt;
    const ePred = Math.max(0, e + h * f.dedt);
    const ltanNext = ltan + h * ltanRate;
    if (perigeeAlt(aPred, ePred) <= run.reentryAltitudeKm - 50) {
      // the predictor overshoots far below the end point: halve the step instead of sampling below the model's range
      const hp0 = perigeeAlt(a, e);
      const frac = (hp0 - run.reentryAltitudeKm) / (hp0 - perigeeAlt(aPred, ePred));
      const tCross = t + frac * h;
      rows.push(rowAt(run.start, tCross, a + frac * h * f.dadt, Math.max(0, e + frac * h * f.dedt)));
      return { lifetimeSeconds: tCross, reentered: true, rows, initial };
    }
    const fNext = rates(t + h, aPred, ePred, ltanNext);
    const aNew = a + 0.5 * h * (f.dadt + fNext.dadt);
    const eNew = Math.max(0, e + 0.5 * h * (f.dedt + fNext.dedt));
    const hpOld = perigeeAlt(a, e);
    const hpNew = perigeeAlt(aNew, eNew);
    if (hpNew <= run.reentryAltitudeKm) {
      const frac = (hpOld - run.reentryAltitudeKm) / (hpOld - hpNew);
      const tCross = t + frac * h;
      rows.push(rowAt(run.start, tCross, a + frac * (aNew - a), e + frac * (eNew - e)));
      return { lifetimeSeconds: tCross, reentered: true, rows, initial };
    }
    a = aNew;
    e = eNew;
    ltan = ltanNext;
    t += h;
    f = fNext;
    if (t >= nextRow || t >= horizon) {
      rows.push(rowAt(run.start, t, a, e));
      nextRow = t + rowEvery;
    }
  }
  return { lifetimeSeconds: horizon, reentered: false, rows, initial };
}
