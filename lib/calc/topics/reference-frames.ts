/**
 * Earth-centred quasi-inertial reference frames and the rotations between them:
 *
 * - `EME2000`: mean equator and mean equinox of J2000.0 (the frame of CCSDS
 *   OEM/OPM messages, `REF_FRAME = EME2000`).
 * - `TOD`: true equator and true equinox of date (IAU-76 precession + IAU-1980
 *   nutation applied to EME2000). The engine's secular theory and its local-time
 *   functions work in the frame of date; TOD is what the design kinds expect.
 * - `TEME`: true equator, mean equinox of date — the frame of SGP4 and TLEs
 *   (Vallado, Crawford, Hujsak & Kelso, "Revisiting Spacetrack Report #3",
 *   AIAA 2006-6753, §"Coordinate frames" / Appendix C): TOD turned about its z
 *   axis by the equation of the equinoxes Δψ cos ε̄ **without** the two 1997
 *   terms (0.00264″ sin Ω + 0.000063″ sin 2Ω).
 *
 * Methods (D. A. Vallado, Fundamentals of Astrodynamics and Applications, 4th ed.
 * (2013), §3.7 "IAU-76/FK5 reduction"; numbers of equations from memory):
 * - precession, IAU 1976 (J. H. Lieske et al., Astron. Astrophys. 58 (1977) 1–16):
 *   ζ = 2306.2181″T + 0.30188″T² + 0.017998″T³, θ = 2004.3109″T − 0.42665″T² − 0.041833″T³,
 *   z = 2306.2181″T + 1.09468″T² + 0.018203″T³; r_MOD = R3(−z) R2(θ) R3(−ζ) r_EME2000;
 * - nutation, IAU 1980, all 106 terms (`nutation-1980-series.ts`), fundamental
 *   arguments of the Explanatory Supplement (1992) §3.222;
 *   mean obliquity ε̄ = 84381.448″ − 46.8150″T − 0.00059″T² + 0.001813″T³;
 *   r_TOD = R1(−ε) R3(−Δψ) R1(ε̄) r_MOD, ε = ε̄ + Δε;
 * - TEME: r_TEME = R3(Δψ cos ε̄) r_TOD.
 * R1, R2, R3 are the frame rotations of Vallado §3.3 (R3(α) = [[c, s, 0], [−s, c, 0], [0, 0, 1]]).
 *
 * Simplifications and what they cost (all far below the accuracy of a TLE or
 * of the engine's secular theory):
 * - No Earth-orientation parameters. The observed celestial-pole offsets δΔψ, δΔε
 *   against the IAU-1980 model are left out: tens of milliarcseconds (Vallado's
 *   Example 3-15 uses δΔψ = −0.052195″, δΔε = −0.003875″ for 2004), which is
 *   ≈ 2.5e-7 rad: 1.7 m at 7000 km and 1.4e-5° in inclination or RAAN.
 * - TT is taken equal to UTC (TT − UTC = 69.184 s since 2017): precession moves
 *   by 1e-4″ and nutation by less in that time (< 5 mm at 7000 km).
 * - UT1 = UTC: does not enter here at all (no Earth rotation between these frames).
 * - EME2000 is taken as the J2000 mean equator and equinox of IAU-76/FK5; its
 *   frame bias against the GCRF (≈ 0.02″) is ignored, as CCSDS EME2000 does.
 * Valid for epochs 1900–2100 (the polynomials are fitted over centuries; the
 * engine's epoch fields accept 1900–2100).
 */
import { DEG, JD_J2000, TWO_PI } from '../constants';
import { julianDate } from './time';
import { NUTATION_1980_TERMS } from './nutation-1980-series';

export type ReferenceFrame = 'EME2000' | 'TOD' | 'TEME';

export const REFERENCE_FRAMES: readonly [ReferenceFrame, ...ReferenceFrame[]] = ['EME2000', 'TOD', 'TEME'];

type Vec3 = [number, number, number];
type Mat3 = number[][];

const ARCSEC = DEG / 3600;
/** Frame rotation about x (Vallado §3.3). */
function rot1(a: number): Mat3 {
  const c = Math.cos(a);
  const s = Math.sin(a);
  return [
    [1, 0, 0],
    [0, c, s],
    [0, -s, c],
  ];
}

/** Frame rotation about y. */
function rot2(a: number): Mat3 {
  const c = Math.cos(a);
  const s = Math.sin(a);
  return [
    [c, 0, -s],
    [0, 1, 0],
    [s, 0, c],
  ];
}

/** Frame rotation about z. */
function rot3(a: number): Mat3 {
  const c = Math.cos(a);
  const s = Math.sin(a);
  return [
    [c, s, 0],
    [-s, c, 0],
    [0, 0, 1],
  ];
}

function multiply(a: Mat3, b: Mat3): Mat3 {
  const m: Mat3 = [
    [0, 0, 0],
    [0, 0, 0],
    [0, 0, 0],
  ];
  for (let i = 0; i < 3; i++)
    for (let j = 0; j < 3; j++) m[i][j] = a[i][0] * b[0][j] + a[i][1] * b[1][j] + a[i][2] * b[2][j];
  return m;
}

function transpose(a: Mat3): Mat3 {
  return [0, 1, 2].map((i) => [a[0][i], a[1][i], a[2][i]]);
}

function apply(m: Mat3, v: Vec3): Vec3 {
  return [
    m[0][0] * v[0] + m[0][1] * v[1] + m[0][2] * v[2],
    m[1][0] * v[0] + m[1][1] * v[1] + m[1][2] * v[2],
    m[2][0] * v[0] + m[2][1] * v[1] + m[2][2] * v[2],
  ];
}

const IDENTITY: Mat3 = [
  [1, 0, 0],
  [0, 1, 0],
  [0, 0, 1],
];

/** Julian centuries of TT since J2000.0, with TT taken as UTC (see the module note). */
function centuriesTt(epochUtc: Date): number {
  return (julianDate(epochUtc) - JD_J2000) / 36525;
}

/** IAU-76 precession angles ζ, θ, z [rad] at T Julian centuries of TT from J2000 (Lieske et al. 1977; Vallado §3.7). */
export function precessionAngles1976(t: number): { zeta: number; theta: number; z: number } {
  return {
    zeta: (2306.2181 * t + 0.30188 * t * t + 0.017998 * t * t * t) * ARCSEC,
    theta: (2004.3109 * t - 0.42665 * t * t - 0.041833 * t * t * t) * ARCSEC,
    z: (2306.2181 * t + 1.09468 * t * t + 0.018203 * t * t * t) * ARCSEC,
  };
}

/** Mean obliquity of the ecliptic ε̄ [rad], IAU 1976 (Lieske et al. 1977; Vallado §3.7). */
export function meanObliquity1980(t: number): number {
  return (84381.448 - 46.815 * t - 0.00059 * t * t + 0.001813 * t * t * t) * ARCSEC;
}

/**
 * Nutation in longitude Δψ and obliquity Δε [rad], IAU 1980 theory, all 106
 * terms, at T Julian centuries of TT from J2000. Fundamental arguments of the
 * Explanatory Supplement to the Astronomical Almanac (1992) §3.222 (Delaunay
 * arguments l, l′, F, D, Ω as polynomials in arcseconds plus whole revolutions).
 */
export function nutation1980(t: number): { dPsi: number; dEps: number } {
  const t2 = t * t;
  const t3 = t2 * t;
  const arg = (arcsec0: number, revolutions: number, arcsec1: number, arcsec2: number, arcsec3: number) =>
    (((arcsec0 + arcsec1 * t + arcsec2 * t2 + arcsec3 * t3) * ARCSEC) % TWO_PI) + ((revolutions * t) % 1) * TWO_PI;
  const l = arg(485866.733, 1325, 715922.633, 31.31, 0.064); // Moon's mean anomaly
  const lp = arg(1287099.804, 99, 1292581.224, -0.577, -0.012); // Sun's mean anomaly
  const f = arg(335778.877, 1342, 295263.137, -13.257, 0.011); // Moon's argument of latitude
  const d = arg(1072261.307, 1236, 1105601.328, -6.891, 0.019); // Moon's mean elongation from the Sun
  const om = arg(450160.28, -5, -482890.539, 7.455, 0.008); // longitude of the Moon's ascending node
  let dPsi = 0;
  let dEps = 0;
  // Smallest terms first, to add them before the large ones.
  for (let j = NUTATION_1980_TERMS.length - 1; j >= 0; j--) {
    const [nl, nlp, nf, nd, nom, a, at, b, bt] = NUTATION_1980_TERMS[j];
    const theta = nl * l + nlp * lp + nf * f + nd * d + nom * om;
    dPsi += (a + at * t) * Math.sin(theta);
    dEps += (b + bt * t) * Math.cos(theta);
  }
  const unit = 1e-4 * ARCSEC;
  return { dPsi: dPsi * unit, dEps: dEps * unit };
}

/** Equation of the equinoxes as SGP4's TEME uses it: Δψ cos ε̄ without the 1997 terms [rad] (Vallado et al. 2006). */
export function equationOfEquinoxesTeme(t: number): number {
  return nutation1980(t).dPsi * Math.cos(meanObliquity1980(t));
}

/** IAU-76 precession matrix P: r_MOD = P · r_EME2000, at T Julian centuries of TT. */
export function precessionMatrix1976(t: number): number[][] {
  const { zeta, theta, z } = precessionAngles1976(t);
  return multiply(rot3(-z), multiply(rot2(theta), rot3(-zeta)));
}

/** IAU-1980 nutation matrix N: r_TOD = N · r_MOD, at T Julian centuries of TT. */
export function nutationMatrix1980(t: number): number[][] {
  const epsBar = meanObliquity1980(t);
  const { dPsi, dEps } = nutation1980(t);
  return multiply(rot1(-(epsBar + dEps)), multiply(rot3(-dPsi), rot1(epsBar)));
}

/** Rotations EME2000 → MOD, MOD → TOD and TOD → TEME at one epoch. */
function chain(epochUtc: Date): { precession: Mat3; nutation: Mat3; teme: Mat3 } {
  const t = centuriesTt(epochUtc);
  return {
    precession: precessionMatrix1976(t),
    nutation: nutationMatrix1980(t),
    teme: rot3(equationOfEquinoxesTeme(t)),
  };
}

/** Rotation from EME2000 to each frame. */
function fromEme2000(frame: ReferenceFrame, c: ReturnType<typeof chain>): Mat3 {
  switch (frame) {
    case 'EME2000':
      return IDENTITY;
    case 'TOD':
      return multiply(c.nutation, c.precession);
    case 'TEME':
      return multiply(c.teme, multiply(c.nutation, c.precession));
  }
}

function checkEpoch(epochUtc: Date): void {
  if (!(epochUtc instanceof Date) || !Number.isFinite(epochUtc.getTime()))
    throw new RangeError('epochUtc must be a valid Date');
}

/** 3×3 rotation taking vectors in `from` to `to` at the UTC epoch (row-major): v_to = M · v_from. */
export function frameRotation(from: ReferenceFrame, to: ReferenceFrame, epochUtc: Date): number[][] {
  checkEpoch(epochUtc);
  if (from === to) return IDENTITY.map((row) => [...row]);
  const c = chain(epochUtc);
  return multiply(fromEme2000(to, c), transpose(fromEme2000(from, c)));
}

/**
 * Position (km) and velocity (km/s) rotated between frames; no Earth-rotation
 * terms (all three are quasi-inertial: the rotation's own rate, ≈ 2e-11 rad/s for
 * precession, changes a LEO velocity by < 2e-7 m/s and is left out).
 */
export function transformState(
  state: { positionKm: [number, number, number]; velocityKmS: [number, number, number] },
  from: ReferenceFrame,
  to: ReferenceFrame,
  epochUtc: Date,
): { positionKm: [number, number, number]; velocityKmS: [number, number, number] } {
  const m = frameRotation(from, to, epochUtc);
  return { positionKm: apply(m, state.positionKm), velocityKmS: apply(m, state.velocityKmS) };
}

/**
 * Inclination and RAAN (deg) of an orbit's plane expressed in another frame.
 * The orbit normal ĥ = (sin i sin Ω, −sin i cos Ω, cos i) is rotated and read
 * back (Vallado §2.5: i = acos ĥ_z, Ω = atan2(ĥ_x, −ĥ_y)). For an equatorial
 * plane (sin i < 1e-12 after rotation) the node is undefined and RAAN is 0.
 * Output RAAN in [0, 360).
 */
export function transformOrbitPlane(
  input: { inclinationDeg: number; raanDeg: number },
  from: ReferenceFrame,
  to: ReferenceFrame,
  epochUtc: Date,
): { inclinationDeg: number; raanDeg: number } {
  const i = input.inclinationDeg * DEG;
  const o = input.raanDeg * DEG;
  const h = apply(frameRotation(from, to, epochUtc), [
    Math.sin(i) * Math.sin(o),
    -Math.sin(i) * Math.cos(o),
    Math.cos(i),
  ]);
  const inclinationDeg = Math.acos(Math.max(-1, Math.min(1, h[2]))) / DEG;
  const sinI = Math.hypot(h[0], h[1]);
  if (sinI < 1e-12) return { inclinationDeg, raanDeg: 0 };
  const raan = Math.atan2(h[0], -h[1]) / DEG;
  return { inclinationDeg, raanDeg: raan < 0 ? raan + 360 : raan };
}
