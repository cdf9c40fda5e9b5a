/**
 * The Sun as a distant third body acting on a near-circular orbit, averaged over the satellite's revolution and
 * over the Sun's year, and the node local-time history that follows.
 *
 * Model (derived here; method of the single-averaged third-body model, Solórzano & Prado 2007, Math. Probl. Eng.
 * 2007, 40475, kept to the quadrupole term (a/r☉)², circular satellite orbit):
 *  - tidal acceleration of a point-mass Sun, F = (μ☉/r☉³)(3(r·ŝ)ŝ − r) (point-mass third body, Montenbruck & Gill,
 *    Satellite Orbits (2000), the direct minus indirect term expanded to first order in r/r☉);
 *  - its torque averaged over a circular orbit of radius a, using ⟨(r·ŝ) r⟩ = (a²/2)(ŝ − (ĥ·ŝ)ĥ), turns the unit
 *    angular-momentum vector at  dĥ/dt = −K (ĥ·ŝ)(ĥ × ŝ),  K = 3μ☉ / (2 n r☉³)  (n: satellite mean motion);
 *  - with ĥ = (sin i sin Ω, −sin i cos Ω, cos i) and the Sun on the ecliptic, ŝ = (cos λ, cos ε sin λ, sin ε sin λ),
 *    a node that follows the mean Sun (Ω = λ + H, H = 15°·(LTAN − 12 h)) and the mean of 1/r☉³ over the Earth's
 *    orbit, 1/(a☉³(1 − e☉²)^{3/2}), the average over one year of the Sun's longitude λ is
 *        di/dt = K (1 + cos ε)²/8 · sin i · sin 2H,
 *        dΩ/dt = K [ (1 + cos ε)²/8 · cos 2H − (3 cos²ε − 1)/4 ] cos i.
 *    The second term of dΩ/dt is the familiar ring-averaged solar node rate −(3/8)(n☉²/n) cos i (3cos²ε − 1); the
 *    terms in 2H exist only because the node turns with the Sun (a sun-synchronous or nearly sun-synchronous orbit).
 *    The averaging over λ was done symbolically (the annual and semiannual terms average to zero over a year).
 *
 * Local time: the node rate of the zonal theory depends on inclination (dΩ̇/di = −sin i · dΩ̇/dcos i), so an
 * inclination drifting at a constant rate turns the node's local time along a parabola
 *        ΔLTAN(t) = (d₀ + D·b) t + ½ D (di/dt) t²,
 * with d₀ the nominal drift against the mean Sun (zonal + solar node rate − Sun's mean motion), D = dΩ̇/di and b an
 * injection bias of the inclination. Linear in Δi: over 0.3° the neglected second-order term moves the node by less
 * than 0.01° per year.
 *
 * Units: km, s, rad inside; valid for near-circular orbits (e ≲ 0.05) well inside the Sun's distance (a/r☉ terms of
 * the next order are 5 orders of magnitude smaller in LEO). The Moon is not modelled (see the kind's assumptions).
 */
import {
  AU_KM,
  EARTH_MU_KM3_S2,
  EARTH_ORBIT_ECCENTRICITY,
  SECONDS_PER_DAY,
  SUN_MEAN_MOTION_RAD_S,
  SUN_MU_KM3_S2,
  TROPICAL_YEAR_DAYS,
} from '../constants';
import { computeMeanMotion, computeNodeRateWithSlope, type SecularTheory } from './secular-rates';

/** Seconds in one tropical year. */
export const YEAR_S = TROPICAL_YEAR_DAYS * SECONDS_PER_DAY;
/** Minutes of local time per radian of right ascension (24 h per 2π). */
export const MIN_PER_RAD = (24 * 60) / (2 * Math.PI);

/** Obliquity of the ecliptic [rad] at Julian centuries t from J2000 (Vallado 4th ed. Algorithm 29: 23.439291° − 0.0130042° T). */
export function obliquityRad(centuriesFromJ2000: number): number {
  return ((23.439291 - 0.0130042 * centuriesFromJ2000) * Math.PI) / 180;
}

/** K = 3 μ☉ ⟨1/r☉³⟩ / (2n) [rad/s] for a circular orbit of semi-major axis aKm [km]. */
export function solarTorqueFactor(aKm: number): number {
  const meanInvR3 = 1 / (AU_KM ** 3 * (1 - EARTH_ORBIT_ECCENTRICITY ** 2) ** 1.5);
  return (3 * SUN_MU_KM3_S2 * meanInvR3) / (2 * computeMeanMotion(aKm));
}

/** Hour angle of the node from the mean Sun, H = 15°·(LTAN − 12 h) [rad]. */
export function nodeHourAngleRad(ltanHours: number): number {
  return ((ltanHours - 12) * Math.PI) / 12;
}

export interface SolarSecularRates {
  /** di/dt [rad/s] */
  inclinationRate: number;
  /** dΩ/dt from the Sun [rad/s] */
  nodeRate: number;
}

/**
 * Year-averaged secular rates of inclination and node caused by the Sun for a circular orbit of semi-major axis
 * aKm [km] and inclination iRad [rad] whose node keeps the mean-Sun local time ltanHours [h], obliquity epsRad [rad].
 */
export function computeSolarSecularRates(
  aKm: number,
  iRad: number,
  ltanHours: number,
  epsRad: number,
): SolarSecularRates {
  const k = solarTorqueFactor(aKm);
  const h2 = 2 * nodeHourAngleRad(ltanHours);
  const c = Math.cos(epsRad);
  const synchronous = (1 + c) ** 2 / 8;
  return {
    inclinationRate: k * synchronous * Math.sin(iRad) * Math.sin(h2),
    nodeRate: k * (synchronous * Math.cos(h2) - (3 * c * c - 1) / 4) * Math.cos(iRad),
  };
}

export interface LocalTimeParabola {
  /** ΔLTAN(t) = linearMinPerYear·t + quadraticMinPerYear2·t², t in years, without bias */
  linearMinPerYear: number;
  quadraticMinPerYear2: number;
  /** change of the linear term per radian of inclination bias [min/yr per rad] */
  biasGainMinPerYearPerRad: number;
  /** di/dt [rad/s] */
  inclinationRate: number;
  /** dΩ/dt of the Sun [rad/s] */
  solarNodeRate: number;
}

/**
 * Coefficients of the local-time parabola of a circular orbit (aKm [km], iRad [rad], ltanHours [h]) under the
 * node rate of `theory` and the Sun's secular rates, obliquity epsRad [rad]. Times in years, local time in minutes.
 */
export function computeLocalTimeParabola(
  aKm: number,
  iRad: number,
  ltanHours: number,
  epsRad: number,
  theory: SecularTheory,
): LocalTimeParabola {
  const sun = computeSolarSecularRates(aKm, iRad, ltanHours, epsRad);
  const zonal = computeNodeRateWithSlope(aKm, 0, Math.cos(iRad), theory);
  const dNodeRateDi = -Math.sin(iRad) * zonal.slope; // rad/s per rad
  const perYear = MIN_PER_RAD * YEAR_S; // rad/s → min/yr
  return {
    linearMinPerYear: (zonal.rate + sun.nodeRate - SUN_MEAN_MOTION_RAD_S) * perYear,
    quadraticMinPerYear2: 0.5 * dNodeRateDi * sun.inclinationRate * YEAR_S * perYear,
    biasGainMinPerYearPerRad: dNodeRateDi * perYear,
    inclinationRate: sun.inclinationRate,
    solarNodeRate: sun.nodeRate,
  };
}

/** Local-time deviation [min] after `years` with inclination bias biasRad [rad]. */
export function localTimeDeviationMin(p: LocalTimeParabola, biasRad: number, years: number): number {
  return (p.linearMinPerYear + p.biasGainMinPerYearPerRad * biasRad) * years + p.quadraticMinPerYear2 * years * years;
}

/**
 * First time [yr] after which |A t + B t²| exceeds toleranceMin, or Infinity when it never does. A [min/yr], B [min/yr²].
 */
export function yearsUntilOutside(linear: number, quadratic: number, toleranceMin: number): number {
  const roots: number[] = [];
  for (const side of [toleranceMin, -toleranceMin]) {
    // B t² + A t − side = 0
    if (Math.abs(quadratic) < 1e-15) {
      if (Math.abs(linear) > 0) roots.push(side / linear);
      continue;
    }
    const disc = linear * linear + 4 * quadratic * side;
    if (disc < 0) continue;
    const sq = Math.sqrt(disc);
    roots.push((-linear + sq) / (2 * quadratic), (-linear - sq) / (2 * quadratic));
  }
  // A root where the parabola only touches an edge (the turning point of the optimal bias) is not an exit.
  const value = (t: number) => linear * t + quadratic * t * t;
  const exits = roots.filter((t) => t > 0 && Math.abs(value(t + 1e-6 * Math.max(1, t))) > toleranceMin * (1 + 1e-9));
  return exits.length ? Math.min(...exits) : Infinity;
}

export interface OptimalBias {
  /** inclination bias [rad] */
  biasRad: number;
  /** time within ± tolerance [yr] (Infinity when the inclination does not drift) */
  years: number;
}

/**
 * The inclination bias that keeps |ΔLTAN| ≤ toleranceMin longest: the local time first moves against the curvature
 * of the parabola, turns at +tolerance (or −) and leaves through the other edge, which gives a linear term
 * A* = 2√(T|B|)·sign(−B) and a time (1 + √2)√(T/|B|) (the classic dead-band parabola; Lee, Eun & Webb 1997 use the
 * same construction for the ground track).
 */
export function computeOptimalBias(p: LocalTimeParabola, toleranceMin: number): OptimalBias {
  const b = p.quadraticMinPerYear2;
  if (Math.abs(b) < 1e-12 || p.biasGainMinPerYearPerRad === 0) {
    return {
      biasRad: p.biasGainMinPerYearPerRad === 0 ? 0 : -p.linearMinPerYear / p.biasGainMinPerYearPerRad,
      years: Infinity,
    };
  }
  const target = 2 * Math.sqrt(toleranceMin * Math.abs(b)) * -Math.sign(b);
  return {
    biasRad: (target - p.linearMinPerYear) / p.biasGainMinPerYearPerRad,
    years: (1 + Math.SQRT2) * Math.sqrt(toleranceMin / Math.abs(b)),
  };
}

/** Speed of a circular orbit [km/s] at semi-major axis aKm [km]: √(μ/a). */
export function circularSpeedKmS(aKm: number): number {
  return Math.sqrt(EARTH_MU_KM3_S2 / aKm);
}
