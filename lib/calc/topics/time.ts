/**
 * Time scales and sidereal time.
 * UTC is used as UT1 (|UT1 − UTC| < 0.9 s), which moves GMST by < 0.004° — below
 * every tolerance of a preliminary-design result.
 */
import { JD_J2000, JD_UNIX_EPOCH, SECONDS_PER_DAY, TWO_PI } from '../constants';
import { wrapTwoPi } from './angles';

/** Julian date (UT) of a JS Date. Meeus, Astronomical Algorithms 2nd ed. ch. 7 (JD 2440587.5 = 1970-01-01 0h). */
export function julianDate(date: Date): number {
  return date.getTime() / (SECONDS_PER_DAY * 1000) + JD_UNIX_EPOCH;
}

/** Julian centuries of UT1 since J2000.0 (Vallado 4th ed. §3.5; T_UT1 = (JD − 2451545)/36525). */
export function centuriesSinceJ2000(jd: number): number {
  return (jd - JD_J2000) / 36525;
}

/**
 * Greenwich mean sidereal time [rad], IAU 1982 model (Vallado 4th ed. eq. 3-47):
 * θ = 67310.54841 s + (876600·3600 + 8640184.812866) T + 0.093104 T² − 6.2e-6 T³.
 * Valid for UT1 roughly 1900–2100. Input: Julian date UT1.
 */
export function gmstRad(jdUt1: number): number {
  const t = centuriesSinceJ2000(jdUt1);
  const seconds = 67310.54841 + (876600 * 3600 + 8640184.812866) * t + 0.093104 * t * t - 6.2e-6 * t * t * t;
  return wrapTwoPi((seconds % SECONDS_PER_DAY) * (TWO_PI / SECONDS_PER_DAY));
}

/** Universal time of day [h] of a Julian date. */
export function utHours(jd: number): number {
  const f = (jd + 0.5) % 1;
  return (f < 0 ? f + 1 : f) * 24;
}
