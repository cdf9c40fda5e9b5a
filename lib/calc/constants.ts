/**
 * Nodewright calc engine — the one named constants set.
 *
 * Internal units everywhere in lib/calc: km, s, rad (unless a name says otherwise).
 * Every value below names its published source. Where a value is quoted from
 * memory of the source rather than checked against a copy, the source string says so.
 */

/** Bump whenever any result of any kind could change (formula, constant, default, table), with an entry in engineChanges.ts. */
export const engineVersion = 'nodewright-calc 2.0.0';

export interface ConstantEntry {
  name: string;
  symbol: string;
  value: number;
  unit: string;
  source: string;
}

/** WGS-84 equatorial radius [km]. NIMA TR8350.2, 3rd ed. (2000), Table 3.1. */
export const EARTH_RADIUS_KM = 6378.137;
/** WGS-84 flattening [-]. NIMA TR8350.2, 3rd ed. (2000), Table 3.1. */
export const EARTH_FLATTENING = 1 / 298.257223563;
/** WGS-84 (EGM-96 consistent) geocentric gravitational constant [km^3/s^2]. NIMA TR8350.2, Table 3.1/3.3. */
export const EARTH_MU_KM3_S2 = 398600.4418;
/*
 * Zonal harmonics J2…J9 [-] of EGM-96 (Lemoine et al. 1998, "The Development of the Joint NASA GSFC and
 * NIMA Geopotential Model EGM96", NASA/TP-1998-206861), unnormalised: J_n = −√(2n+1)·C̄n0.
 * The fully normalised C̄n0 below were checked against two public copies of the EGM-96 coefficient file
 * (the NGA "egm-96spherical" distribution and the ICGEM EGM96.gfc file, as reproduced in open-source
 * repositories; both agree digit for digit). Each J_n is rounded to the 12 significant digits of the
 * coefficient file, so the listed value carries no floating-point noise; tests/lib/calc/constants.test.ts
 * recomputes −√(2n+1)·C̄n0 from the coefficients and checks the rounding.
 */
/** EGM-96 normalised zonal coefficients C̄n0, n = 2…9 (NASA/TP-1998-206861; NGA EGM96 coefficient file). */
export const EGM96_NORMALISED_ZONALS: Readonly<Record<2 | 3 | 4 | 5 | 6 | 7 | 8 | 9, number>> = Object.freeze({
  2: -0.484165371736e-3,
  3: 0.957254173792e-6,
  4: 0.539873863789e-6,
  5: 0.68532347563e-7,
  6: -0.149957994714e-6,
  7: 0.90978937145e-7,
  8: 0.496711667324e-7,
  9: 0.276714300853e-7,
});
/** J2 [-] = −√5·C̄20, EGM-96. */
export const EARTH_J2 = 1.08262668355e-3;
/** J3 [-] = −√7·C̄30, EGM-96. */
export const EARTH_J3 = -2.53265648533e-6;
/** J4 [-] = −3·C̄40, EGM-96. */
export const EARTH_J4 = -1.61962159137e-6;
/** J5 [-] = −√11·C̄50, EGM-96. */
export const EARTH_J5 = -2.27296082869e-7;
/** J6 [-] = −√13·C̄60, EGM-96. */
export const EARTH_J6 = 5.40681239107e-7;
/** J7 [-] = −√15·C̄70, EGM-96. */
export const EARTH_J7 = -3.52359908418e-7;
/** J8 [-] = −√17·C̄80, EGM-96. */
export const EARTH_J8 = -2.04799466985e-7;
/** J9 [-] = −√19·C̄90, EGM-96. */
export const EARTH_J9 = -1.20616967365e-7;
/** Zonal harmonics by degree, J[n] for n = 2…9 (index 0 and 1 unused, 0). */
export const EARTH_ZONALS: readonly number[] = Object.freeze([
  0,
  0,
  EARTH_J2,
  EARTH_J3,
  EARTH_J4,
  EARTH_J5,
  EARTH_J6,
  EARTH_J7,
  EARTH_J8,
  EARTH_J9,
]);
/**
 * Earth's rotation rate relative to the mean equinox of date [rad/s] — the engine's one rotation rate,
 * used by the repeat condition, nodal days, ground-track angles and to advance GMST along a ground track.
 * It is the time derivative of the IAU 1982 GMST expression (Aoki et al. 1982, Astron. Astrophys. 105,
 * 359–361; Vallado 4th ed. eq. 3-47): (876600·3600 + 8640184.812866) s per Julian century of 36525 days
 * = 1.002737909350795 turns per UT1 day = 7.2921158553e-5 rad/s. (WGS-84's nominal 7.292115e-5 rad/s,
 * NIMA TR8350.2 Table 3.1, is this rate rounded; mixing the two shifts a 16-day repeat track by ≈ 75 m.)
 */
export const EARTH_ROTATION_RAD_S = 7.2921158553e-5;
/**
 * Mean tropical year [days of 86400 s] at J2000 (365.24219 d). Checked against: the Astronomical Almanac Online glossary,
 * "year, tropical" (365 d 5 h 48 min 45 s = 365.2421875 d), and NASA/JPL NAIF SPICE TYEAR (Explanatory Supplement 1992,
 * p. 80: 31 556 925.9747 s = 365.2421988 d).
 */
export const TROPICAL_YEAR_DAYS = 365.24219;
/** Mean solar day [s]. Definition (86400 SI seconds). */
export const SECONDS_PER_DAY = 86400;
/** Sun's mean motion = sun-synchronous node rate [rad/s]: 2π per tropical year. */
export const SUN_MEAN_MOTION_RAD_S = (2 * Math.PI) / (TROPICAL_YEAR_DAYS * SECONDS_PER_DAY);
/** Astronomical unit [km]. IAU 2012 Resolution B2. */
export const AU_KM = 149597870.7;
/** Heliocentric gravitational constant GM☉ [km³/s²], TDB-compatible: IAU 2009 System of Astronomical Constants (Luzum et al. 2011, Celest. Mech. Dyn. Astr. 110, 293). */
export const SUN_MU_KM3_S2 = 1.32712440041e11;
/** Eccentricity of the Earth's orbit at J2000: the cos M coefficient of the Sun-distance series of Vallado 4th ed. Algorithm 29. */
export const EARTH_ORBIT_ECCENTRICITY = 0.016708617;
/** Nominal solar radius [km]: IAU 2015 Resolution B3 (Mamajek et al. 2015, arXiv:1510.07674), exact by definition. */
export const SUN_RADIUS_KM = 695700;
/** Julian date of the J2000.0 epoch. IAU; Vallado 4th ed. §3.5. */
export const JD_J2000 = 2451545.0;
/** Julian date of the Unix epoch 1970-01-01T00:00Z. Meeus, Astronomical Algorithms 2nd ed. ch. 7. */
export const JD_UNIX_EPOCH = 2440587.5;

export const DEG = Math.PI / 180;
export const TWO_PI = 2 * Math.PI;

const TABLE: ConstantEntry[] = [
  {
    name: 'Earth equatorial radius',
    symbol: 'R⊕',
    value: EARTH_RADIUS_KM,
    unit: 'km',
    source: 'WGS-84, NIMA TR8350.2 3rd ed. (2000) Table 3.1',
  },
  {
    name: 'Earth flattening',
    symbol: 'f',
    value: EARTH_FLATTENING,
    unit: '-',
    source: 'WGS-84, NIMA TR8350.2 3rd ed. (2000) Table 3.1 (1/298.257223563)',
  },
  {
    name: 'Earth gravitational parameter',
    symbol: 'μ',
    value: EARTH_MU_KM3_S2,
    unit: 'km^3/s^2',
    source: 'WGS-84 (EGM-96), NIMA TR8350.2 3rd ed. (2000) Table 3.1',
  },
  {
    name: 'Second zonal harmonic',
    symbol: 'J2',
    value: EARTH_J2,
    unit: '-',
    source: 'EGM-96 (Lemoine et al. 1998, NASA/TP-1998-206861; NGA EGM96 coefficient file): J2 = −√5·C̄20',
  },
  {
    name: 'Third zonal harmonic',
    symbol: 'J3',
    value: EARTH_J3,
    unit: '-',
    source: 'EGM-96 (Lemoine et al. 1998, NASA/TP-1998-206861; NGA EGM96 coefficient file): J3 = −√7·C̄30',
  },
  {
    name: 'Fourth zonal harmonic',
    symbol: 'J4',
    value: EARTH_J4,
    unit: '-',
    source: 'EGM-96 (Lemoine et al. 1998, NASA/TP-1998-206861; NGA EGM96 coefficient file): J4 = −3·C̄40',
  },
  {
    name: 'Fifth zonal harmonic',
    symbol: 'J5',
    value: EARTH_J5,
    unit: '-',
    source: 'EGM-96 (Lemoine et al. 1998, NASA/TP-1998-206861; NGA EGM96 coefficient file): J5 = −√11·C̄50',
  },
  {
    name: 'Sixth zonal harmonic',
    symbol: 'J6',
    value: EARTH_J6,
    unit: '-',
    source: 'EGM-96 (Lemoine et al. 1998, NASA/TP-1998-206861; NGA EGM96 coefficient file): J6 = −√13·C̄60',
  },
  {
    name: 'Seventh zonal harmonic',
    symbol: 'J7',
    value: EARTH_J7,
    unit: '-',
    source: 'EGM-96 (Lemoine et al. 1998, NASA/TP-1998-206861; NGA EGM96 coefficient file): J7 = −√15·C̄70',
  },
  {
    name: 'Eighth zonal harmonic',
    symbol: 'J8',
    value: EARTH_J8,
    unit: '-',
    source: 'EGM-96 (Lemoine et al. 1998, NASA/TP-1998-206861; NGA EGM96 coefficient file): J8 = −√17·C̄80',
  },
  {
    name: 'Ninth zonal harmonic',
    symbol: 'J9',
    value: EARTH_J9,
    unit: '-',
    source: 'EGM-96 (Lemoine et al. 1998, NASA/TP-1998-206861; NGA EGM96 coefficient file): J9 = −√19·C̄90',
  },
  {
    name: 'Earth rotation rate (relative to the mean equinox of date)',
    symbol: 'ω⊕',
    value: EARTH_ROTATION_RAD_S,
    unit: 'rad/s',
    source:
      'Rate of the IAU 1982 GMST expression (Aoki et al. 1982, Astron. Astrophys. 105, 359; Vallado 4th ed. (2013) eq. 3-47), turns per UT1 day; WGS-84 (NIMA TR8350.2 Table 3.1) quotes it rounded as 7.292115 × 10⁻⁵ rad/s',
  },
  {
    name: 'Tropical year',
    symbol: 'Y_trop',
    value: TROPICAL_YEAR_DAYS,
    unit: 'd',
    source:
      'Mean tropical year at J2000, value as published in the Astronomical Almanac Online glossary, "year, tropical" (365 d 5 h 48 min 45 s); the NASA/JPL NAIF SPICE toolkit documentation (naif.jpl.nasa.gov, routine TYEAR) gives 365.2421988 d from the Explanatory Supplement to the Astronomical Almanac (1992) p. 80',
  },
  {
    name: 'Sun mean motion (sun-synchronous node rate)',
    symbol: 'Ω̇_SSO',
    value: SUN_MEAN_MOTION_RAD_S,
    unit: 'rad/s',
    source: '2π / tropical year (= 0.98565 deg/day)',
  },
  { name: 'Astronomical unit', symbol: 'au', value: AU_KM, unit: 'km', source: 'IAU 2012 Resolution B2' },
  {
    name: 'Heliocentric gravitational constant (solar third body)',
    symbol: 'GM☉',
    value: SUN_MU_KM3_S2,
    unit: 'km^3/s^2',
    source:
      'IAU 2009 System of Astronomical Constants, TDB-compatible (Luzum et al. 2011, Celest. Mech. Dyn. Astr. 110, 293–304)',
  },
  {
    name: "Eccentricity of the Earth's orbit (solar third body)",
    symbol: 'e☉',
    value: EARTH_ORBIT_ECCENTRICITY,
    unit: '-',
    source:
      'Sun-distance series of the Astronomical Almanac low-precision formulae (Vallado 4th ed. (2013) Algorithm 29): r = 1.000140612 − 0.016708617 cos M …',
  },
  {
    name: 'Nominal solar radius (shadow cones)',
    symbol: 'R☉',
    value: SUN_RADIUS_KM,
    unit: 'km',
    source: 'IAU 2015 Resolution B3 (nominal solar radius, exact)',
  },
];

/** The constants set as rows for a PDF appendix (copies; callers cannot alter the engine's values). */
export function listConstants(): ConstantEntry[] {
  return TABLE.map((row) => ({ ...row }));
}
