/**
 * Nodewright calc engine — the one named constants set.
 *
 * Internal units everywhere in lib/calc: km, s, rad (unless a name says otherwise).
 * Every value below names its published source. Where a value is quoted from
 * memory of the source rather than checked against a copy, the source string says so.
 */

/** Bump whenever any result of any kind could change (formula, constant, default, table). */
export const engineVersion = 'nodewright-calc 1.1.0';

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
/**
 * Second zonal harmonic J2 [-], EGM-96: J2 = -sqrt(5) * C̄20 with C̄20 = -4.84165371736e-4
 * (Lemoine et al. 1998, NASA/TP-1998-206861; also Vallado 4th ed. Table D-1). Value from memory of the table.
 */
export const EARTH_J2 = 1.08262668355e-3;
/**
 * Third zonal harmonic J3 [-], EGM-96: J3 = -sqrt(7) * C̄30 with C̄30 = 9.57254173792e-7
 * (Lemoine et al. 1998; Vallado 4th ed. Table D-1). Value from memory of the table.
 */
export const EARTH_J3 = -2.53265648533e-6;
/** Earth's rotation rate (sidereal) [rad/s]. WGS-84 nominal value, NIMA TR8350.2 Table 3.1. */
export const EARTH_ROTATION_RAD_S = 7.292115e-5;
/** Mean tropical year [days of 86400 s] at J2000 (365.24219 d): Explanatory Supplement to the Astronomical Almanac; value from memory. */
export const TROPICAL_YEAR_DAYS = 365.242190;
/** Mean solar day [s]. Definition (86400 SI seconds). */
export const SECONDS_PER_DAY = 86400;
/** Sun's mean motion = sun-synchronous node rate [rad/s]: 2π per tropical year. */
export const SUN_MEAN_MOTION_RAD_S = (2 * Math.PI) / (TROPICAL_YEAR_DAYS * SECONDS_PER_DAY);
/** Astronomical unit [km]. IAU 2012 Resolution B2. */
export const AU_KM = 149597870.7;
/** Julian date of the J2000.0 epoch. IAU; Vallado 4th ed. §3.5. */
export const JD_J2000 = 2451545.0;
/** Julian date of the Unix epoch 1970-01-01T00:00Z. Meeus, Astronomical Algorithms 2nd ed. ch. 7. */
export const JD_UNIX_EPOCH = 2440587.5;

export const DEG = Math.PI / 180;
export const TWO_PI = 2 * Math.PI;

const TABLE: ConstantEntry[] = [
  { name: 'Earth equatorial radius', symbol: 'R⊕', value: EARTH_RADIUS_KM, unit: 'km', source: 'WGS-84, NIMA TR8350.2 3rd ed. (2000) Table 3.1' },
  { name: 'Earth flattening', symbol: 'f', value: EARTH_FLATTENING, unit: '-', source: 'WGS-84, NIMA TR8350.2 3rd ed. (2000) Table 3.1 (1/298.257223563)' },
  { name: 'Earth gravitational parameter', symbol: 'μ', value: EARTH_MU_KM3_S2, unit: 'km^3/s^2', source: 'WGS-84 (EGM-96), NIMA TR8350.2 3rd ed. (2000) Table 3.1' },
  { name: 'Second zonal harmonic', symbol: 'J2', value: EARTH_J2, unit: '-', source: 'EGM-96 (Lemoine et al. 1998, NASA/TP-1998-206861), J2 = −√5·C̄20; value from memory of Vallado 4th ed. Table D-1' },
  { name: 'Third zonal harmonic', symbol: 'J3', value: EARTH_J3, unit: '-', source: 'EGM-96 (Lemoine et al. 1998), J3 = −√7·C̄30; value from memory of Vallado 4th ed. Table D-1' },
  { name: 'Earth rotation rate', symbol: 'ω⊕', value: EARTH_ROTATION_RAD_S, unit: 'rad/s', source: 'WGS-84, NIMA TR8350.2 3rd ed. (2000) Table 3.1' },
  { name: 'Tropical year', symbol: 'Y_trop', value: TROPICAL_YEAR_DAYS, unit: 'd', source: 'Mean tropical year at J2000 (Explanatory Supplement to the Astronomical Almanac); value from memory' },
  { name: 'Sun mean motion (sun-synchronous node rate)', symbol: 'Ω̇_SSO', value: SUN_MEAN_MOTION_RAD_S, unit: 'rad/s', source: '2π / tropical year (= 0.98565 deg/day)' },
  { name: 'Astronomical unit', symbol: 'au', value: AU_KM, unit: 'km', source: 'IAU 2012 Resolution B2' },
];

/** The constants set as rows for a PDF appendix (copies; callers cannot alter the engine's values). */
export function listConstants(): ConstantEntry[] {
  return TABLE.map((row) => ({ ...row }));
}
