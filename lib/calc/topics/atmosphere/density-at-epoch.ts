/**
 * NRLMSISE-00 at a UTC epoch and geodetic place: derives the model's time inputs (day of year,
 * seconds of the UTC day, local solar time) and converts its CGS outputs to SI.
 *
 * Local solar time = UT hours + longitude / 15°/h, wrapped to [0, 24) h: the form the model's
 * documentation prescribes for its LST input (it neglects the equation of time, ≤ 16 min).
 * UTC is used for UT1 (|UT1 − UTC| < 0.9 s, far below the model's time resolution).
 */
import { evaluateNrlmsise00 } from './nrlmsise00';

export interface SpaceWeather {
  /** daily F10.7 of the previous day [sfu = 1e-22 W m⁻² Hz⁻¹] */
  f107: number;
  /** 81-day centred average of F10.7 [sfu] */
  f107Average: number;
  /** daily planetary geomagnetic index Ap */
  ap: number;
}

export interface AtmosphereState {
  /** total mass density including anomalous oxygen (NRLMSISE-00 GTD7D) [kg/m³] */
  densityKgM3: number;
  exosphericTemperatureK: number;
  temperatureK: number;
  localSolarTimeHours: number;
}

const MS_PER_DAY = 86_400_000;

/** Day of year (1 = 1 January) and seconds of the UTC day of a date. */
export function computeDayOfYear(date: Date): { dayOfYear: number; utSeconds: number } {
  const startOfYear = Date.UTC(date.getUTCFullYear(), 0, 1);
  const ms = date.getTime() - startOfYear;
  const dayIndex = Math.floor(ms / MS_PER_DAY);
  return { dayOfYear: dayIndex + 1, utSeconds: (ms - dayIndex * MS_PER_DAY) / 1000 };
}

/** Atmospheric state from NRLMSISE-00; altitude geodetic [km], latitude geodetic and longitude east [deg]. */
export function computeAtmosphereState(
  date: Date,
  altitudeKm: number,
  latitudeDeg: number,
  longitudeDeg: number,
  weather: SpaceWeather,
): AtmosphereState {
  const { dayOfYear, utSeconds } = computeDayOfYear(date);
  const lst = utSeconds / 3600 + longitudeDeg / 15;
  const localSolarTimeHours = ((lst % 24) + 24) % 24;
  const r = evaluateNrlmsise00({
    dayOfYear,
    utSeconds,
    altitudeKm,
    latitudeDeg,
    longitudeDeg,
    localSolarTimeHours,
    ...weather,
  });
  return {
    densityKgM3: r.effectiveMassDensityGCm3 * 1000, // g/cm³ → kg/m³
    exosphericTemperatureK: r.exosphericTemperatureK,
    temperatureK: r.temperatureK,
    localSolarTimeHours,
  };
}
