/**
 * Density models for the averaged decay: NRLMSISE-00 driven by a solar-activity source, or the static
 * exponential tables of dragLifetime.ts (Vallado 4th ed. Table 8-4; MSISE-90 low/high).
 *
 * NRLMSISE-00 takes the place's local solar time directly; its longitude input is set to the one that gives
 * that local time at the instant's UT (LST = UT + λ/15, the model's own convention, see densityAtEpoch.ts).
 */
import { computeDayOfYear, type SpaceWeather } from '../atmosphere/densityAtEpoch';
import { evaluateNrlmsise00 } from '../atmosphere/nrlmsise00';
import { computeDensity, TABLE_BOTTOM_KM, type SolarActivity } from '../dragLifetime';
import { computeSolarActivity, type SolarActivityLevel, type SolarCycleParameters } from '../solarActivity/solarCycle';
import type { DensityModel } from './averagedDecay';

/** Where F10.7 and Ap come from: the solar-cycle model at a level, or constant values. */
export type SolarSource =
  | { kind: 'cycle'; parameters: SolarCycleParameters; level: SolarActivityLevel }
  | { kind: 'constant'; weather: SpaceWeather };

/** Solar and geomagnetic inputs at a date. */
export function weatherAt(source: SolarSource, date: Date): SpaceWeather {
  if (source.kind === 'constant') return source.weather;
  const s = computeSolarActivity(date, source.parameters, source.level);
  return { f107: s.f107, f107Average: s.f107Average, ap: s.ap };
}

/** Spacing of the cached solar-cycle nodes [days]; the cycle model's F10.7 is an 81-day mean, smooth on this scale. */
const WEATHER_NODE_DAYS = 30;
const MS_PER_NODE = WEATHER_NODE_DAYS * 86_400_000;

/**
 * weatherAt for many dates of one run: the cycle model evaluated every 30 days (cached) and interpolated
 * linearly between (F10.7 of the smooth cycle shape changes by well under 1 % of itself within 30 days).
 */
export function cachedWeather(source: SolarSource): (date: Date) => SpaceWeather {
  if (source.kind === 'constant') return () => source.weather;
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
    return { f107: w0.f107 + f * (w1.f107 - w0.f107), f107Average: w0.f107Average + f * (w1.f107Average - w0.f107Average), ap: w0.ap + f * (w1.ap - w0.ap) };
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
  const input = { dayOfYear: 1, utSeconds: 0, altitudeKm: 0, latitudeDeg: 0, longitudeDeg: 0, localSolarTimeHours: 0, f107Average: 0, f107: 0, ap: 0 };
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
    input.longitudeDeg = ((((localSolarTimeHours - input.utSeconds / 3600) * 15) % 360) + 540) % 360 - 180;
    return evaluateNrlmsise00(input).effectiveMassDensityGCm3 * 1000; // g/cm³ → kg/m³
  };
}

/** The static exponential table of the given activity, a function of altitude only (clamped at its 100 km base). */
export function tableDensityModel(activity: SolarActivity): DensityModel {
  return (altitudeKm) => computeDensity(Math.max(TABLE_BOTTOM_KM, altitudeKm), activity);
}
