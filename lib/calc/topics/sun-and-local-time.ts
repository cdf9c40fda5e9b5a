/**
 * Sun position (low precision) and the local time of the orbit node.
 *
 * Sun: Astronomical Almanac low-precision formulae as given in Vallado 4th ed.
 * Algorithm 29 (SUN): mean longitude λ_M = 280.460° + 36000.771 T, mean anomaly
 * M = 357.5291092° + 35999.05034 T, ecliptic longitude λ = λ_M + 1.914666471° sin M
 * + 0.019994643° sin 2M, distance r = 1.000140612 − 0.016708617 cos M − 0.000139589 cos 2M au,
 * obliquity ε = 23.439291° − 0.0130042 T (T in Julian centuries from J2000, TT taken = UT1).
 * Stated accuracy 0.01° for 1950–2050. Output is in the (true) equator and equinox of date.
 *
 * Mean Sun: α_meanSun = GMST − 15°·(UT − 12 h), so the mean solar time at a node of
 * right ascension Ω is 12 h + (Ω − α_meanSun)/15° = UT + (Ω − GMST)/15°; GMST from
 * IAU 1982 (Vallado 4th ed. eq. 3-47).
 * Equation of time E = apparent − mean solar time = (α_meanSun − α_Sun)/15° (Meeus,
 * Astronomical Algorithms 2nd ed. ch. 28, which uses GAST; the GMST form differs by the
 * equation of the equinoxes, ≤ 1.2 s).
 */
import { AU_KM, DEG } from '../constants';
import { toDeg, toRad, wrapHours, wrapPi, wrapTwoPi } from './angles';
import { centuriesSinceJ2000, gmstRad, utHours } from './time';

export interface SunPosition {
  /** unit vector of the Sun direction, equator of date */
  unit: [number, number, number];
  distanceKm: number;
  rightAscensionRad: number;
  declinationRad: number;
  eclipticLongitudeRad: number;
}

/** Geocentric Sun position at Julian date jd (UT), Vallado 4th ed. Algorithm 29. Valid 1950–2050 (0.01°). */
export function computeSunPosition(jd: number): SunPosition {
  const t = centuriesSinceJ2000(jd);
  const meanLong = (280.46 + 36000.771 * t) * DEG;
  const m = (357.5291092 + 35999.05034 * t) * DEG;
  const lambda = meanLong + (1.914666471 * Math.sin(m) + 0.019994643 * Math.sin(2 * m)) * DEG;
  const r = 1.000140612 - 0.016708617 * Math.cos(m) - 0.000139589 * Math.cos(2 * m);
  const eps = (23.439291 - 0.0130042 * t) * DEG;
  const x = Math.cos(lambda);
  const y = Math.cos(eps) * Math.sin(lambda);
  const z = Math.sin(eps) * Math.sin(lambda);
  return {
    unit: [x, y, z],
    distanceKm: r * AU_KM,
    rightAscensionRad: wrapTwoPi(Math.atan2(y, x)),
    declinationRad: Math.asin(z),
    eclipticLongitudeRad: wrapTwoPi(lambda),
  };
}

/** Right ascension of the mean Sun [rad] at Julian date jd (UT): GMST − 15°(UT − 12 h). */
export function computeMeanSunRightAscension(jd: number): number {
  return wrapTwoPi(gmstRad(jd) - toRad(15 * (utHours(jd) - 12)));
}

/** Equation of time [min] (apparent minus mean solar time) at Julian date jd. */
export function computeEquationOfTimeMin(jd: number): number {
  const diff = wrapPi(computeMeanSunRightAscension(jd) - computeSunPosition(jd).rightAscensionRad);
  return toDeg(diff) * 4;
}

export interface NodeLocalTime {
  raanRad: number;
  /** mean-Sun local time of the ascending node [h] */
  ltanHours: number;
  ltdnHours: number;
  /** true (apparent) Sun local time of the ascending node [h] */
  ltanTrueSunHours: number;
  equationOfTimeMin: number;
  meanSunRaRad: number;
  sun: SunPosition;
  gmstRad: number;
}

/** Local times of the node of right ascension raanRad [rad] at jd. */
export function computeNodeLocalTime(jd: number, raanRad: number): NodeLocalTime {
  const meanSunRaRad = computeMeanSunRightAscension(jd);
  const sun = computeSunPosition(jd);
  const ltanHours = wrapHours(12 + toDeg(raanRad - meanSunRaRad) / 15);
  return {
    raanRad: wrapTwoPi(raanRad),
    ltanHours,
    ltdnHours: wrapHours(ltanHours + 12),
    ltanTrueSunHours: wrapHours(12 + toDeg(raanRad - sun.rightAscensionRad) / 15),
    equationOfTimeMin: toDeg(wrapPi(meanSunRaRad - sun.rightAscensionRad)) * 4,
    meanSunRaRad,
    sun,
    gmstRad: gmstRad(jd),
  };
}

/** RAAN [rad] whose mean-Sun (or true-Sun) local time of ascending node is ltanHours at jd. */
export function computeRaanFromLtan(jd: number, ltanHours: number, convention: 'mean' | 'true' = 'mean'): number {
  const ra = convention === 'mean' ? computeMeanSunRightAscension(jd) : computeSunPosition(jd).rightAscensionRad;
  return wrapTwoPi(ra + toRad(15 * (ltanHours - 12)));
}
