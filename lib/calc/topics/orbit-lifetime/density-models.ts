/**
 * Density models for the averaged decay: NRLMSISE-00 driven by a solar-activity source, or the static
 * exponential tables of dragLifetime.ts (Vallado 4th ed. Table 8-4; MSISE-90 low/high).
 *
 * NRLMSISE-00 takes the place's local solar time directly; its longitude input is set to the one that gives
 * that local time at the instant's UT (LST = UT + λ/15, the model's own convention, see densityAtEpoch.ts).
 */
import { computeDayOfYear, type SpaceWeather } from '../atmosphere/density-at-epoch';
import { evaluateNrlmsise00 } from '../atmosphere/nrlmsise00';
import { computeDensity, TABLE_BOTTOM_KM, type SolarActivity } from '../drag-lifetime';
import { CalcInputError } from '../../types';
import { interpolateSolarActivity, type SolarActivityRow } from '../solar-activity/parse-solar-activity-table';
import {
  computeSolarActivity,
  type SolarActivityLevel,
  type SolarCycleParameters,
} from '../solar-activity/solar-cycle';
import type { DensityModel } from './averaged-decay';

/** The solar-cycle model at a level. */
export interface CycleSolarSource {
  kind: 'cycle';
  parameters: SolarCycleParameters;
  level: SolarActivityLevel;
}

/**
 * The analyst's table (rows in increasing date order). Outside its dates: an error on `field`, or the cycle model
 * `beyond` when the analyst asked for it; `outside` records the first and last such date used (for the warning).
 */
export interface TableSolarSource {
  kind: 'table';
  rows: readonly SolarActivityRow[];
  field: string;
  beyond?: CycleSolarSource;
  outside: { first?: Date; last?: Date };
}

/** Where F10.7 and Ap come from: the solar-cycle model at a level, constant values, or the analyst's table. */
export type SolarSource = CycleSolarSource | { kind: 'constant'; weather: SpaceWeather } | TableSolarSource;

const isoDay = (d: Date) => d.toISOString().slice(0, 10);

/** Solar and geomagnetic inputs at a date. Throws CalcInputError for a date outside a table without a fallback. */
export function weatherAt(source: SolarSource, date: Date): SpaceWeather {
  if (source.kind === 'constant') return source.weather;
  if (source.kind === 'table') {
    const w = interpolateSolarActivity(source.rows, date);
    if (w) return w;
    if (!source.beyond) {
      const first = source.rows[0].date;
      const last = source.rows[source.rows.length - 1].date;
      throw new CalcInputError(
        source.field,
        `the solar-activity table covers ${isoDay(first)} to ${isoDay(last)}, but the calculation needs ${isoDay(date)}; extend the table, or set "dates outside the table" to cycle to use the solar-cycle model there`,
      );
    }
    const o = source.outside;
    if (!o.first || date < o.first) o.first = date;
    if (!o.last || date > o.last) o.last = date;
    return weatherAt(source.beyond, date);
  }
  const s = computeSolarActivity(date, source.parameters, source.level);
  return { f107: s.f107, f107Average: s.f107Average, ap: s.ap };
}

/** Spacing of the cached solar-cycle nodes [days]; the cycle model's F10.7 is an 81-day mean, smooth on this scale. */
const WEATHER_NODE_DAYS = 30;
const MS_PER_NODE = WEATHER_NODE_DAYS * 86_400_000;

/**
 * weatherAt for many dates of one run: the analyst's table as is; the cycle model evaluated every 30 days (cached) and interpolated
 * linearly between (F10.7 of the smooth cycle shape changes by well under 1 % of itself within 30 days).
 */
export function cachedWeather(source: SolarSource): (date: Date) => SpaceWeather {
  if (source.kind === 'constant') return () => source.weather;
  // the analyst's rows are interpolated as given (a binary search per date; the density model caches per instant)
  if (source.kind === 'table') return (date) => weatherAt(source, date);
  const nodes = new Map<number, SpaceWeather>();
  const node = (k: number) => {
    let w = nodes.get(k);
    if (!w) {
      w = weatherAt(source, new Date(k * MS_PER_NODE));
      nodes.set(k, w);
    }
    return w;
  };
  return (date) => {
    const x = date.getTime() / MS_PER_NODE;
    const k = Math.floor(x);
    const f = x - k;
    const w0 = node(k);
    const w1 = node(k + 1);
    return {
      f107: w0.f107 + f * (w1.f107 - w0.f107),
      f107Average: w0.f107Average + f * (w1.f107Average - w0.f107Average),
      ap: w0.ap + f * (w1.ap - w0.ap),
    };
  };
}

/**
 * NRLMSISE-00 total mass density (GTD7D, with anomalous oxygen) [kg/m³]. The space weather and the
 * day-of-year are cached per instant: one orbit average evaluates many places at the same date.
 */
export function nrlmsiseDensityModel(source: SolarSource): DensityModel {
  const weatherOn = cachedWeather(source);
  let cachedMs = Number.NaN;
  // one input object of fixed shape, reused (the model reads it and keeps no reference)
  const input = {
    dayOfYear: 1,
    utSeconds: 0,
    altitudeKm: 0,
    latitudeDeg: 0,
    longitudeDeg: 0,
    localSolarTimeHours: 0,
    f107Average: 0,
    f107: 0,
    ap: 0,
  };
  return (altitudeKm, latitudeDeg, localSolarTimeHours, date) => {
    if (date.getTime() !== cachedMs) {
      cachedMs = date.getTime();
      const weather = weatherOn(date);
      const doy = computeDayOfYear(date);
      input.dayOfYear = doy.dayOfYear;
      input.utSeconds = doy.utSeconds;
      input.f107 = weather.f107;
      input.f107Average = weather.f107Average;
      input.ap = weather.ap;
    }
    input.altitudeKm = altitudeKm;
    input.latitudeDeg = latitudeDeg;
    input.localSolarTimeHours = localSolarTimeHours;
    input.longitudeDeg = (((((localSolarTimeHours - input.utSeconds / 3600) * 15) % 360) + 540) % 360) - 180;
    return evaluateNrlmsise00(input).effectiveMassDensityGCm3 * 1000; // g/cm³ → kg/m³
  };
}

/** The static exponential table of the given activity, a function of altitude only (clamped at its 100 km base). */
export function tableDensityModel(activity: SolarActivity): DensityModel {
  return (altitudeKm) => computeDensity(Math.max(TABLE_BOTTOM_KM, altitudeKm), activity);
}
