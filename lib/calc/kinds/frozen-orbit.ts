import { DEG, TWO_PI } from '../constants';
import { REF } from '../references';
import { defineKind } from '../registry';
import { toRad } from '../topics/angles';
import { computeHeightAboveEllipsoid } from '../topics/altitude-conventions';
import {
  computeFrozenEccentricity,
  computeOsculatingEccentricityRange,
  distanceFromCriticalInclinationDeg,
  FROZEN_ZONAL_DEGREE,
  solveFrozenOrbit,
} from '../topics/frozen-orbit';
import { elementsToState, type KeplerElements } from '../topics/kepler-state';
import { semiMajorAxisFromAltitude } from '../topics/sun-synchronous';
import { altitudeKm, inclinationDeg, numOut, orbitWarnings } from './common';

/** Within this distance [deg] of a critical inclination the frozen condition is not trusted. */
export const CRITICAL_MARGIN_DEG = 5;

export const frozenOrbitKind = defineKind({
  kind: 'frozen-orbit',
  title: `Frozen orbit (zonals J2–J${FROZEN_ZONAL_DEGREE})`,
  summary:
    "Mean eccentricity and argument of perigee at which the odd zonal harmonics' push on the eccentricity vector is balanced by the perigee rotation of the even ones.",
  inputs: { altitudeKm: altitudeKm(), inclinationDeg: inclinationDeg() },
  outputs: [
    numOut('eccentricity', `Frozen mean eccentricity (J2–J${FROZEN_ZONAL_DEGREE})`, null, 7),
    numOut('eccentricityJ2J3', 'Frozen mean eccentricity, classic J2–J3 formula', null, 7),
    numOut('argPerigeeDeg', 'Frozen mean argument of perigee', 'deg', 1),
    numOut('oscEccentricityMin', 'Osculating eccentricity over one orbit, lowest', null, 7),
    numOut('oscEccentricityMax', 'Osculating eccentricity over one orbit, highest', null, 7),
    numOut('perigeeAltitudeKm', 'Perigee height above the WGS-84 ellipsoid (mean orbit)', 'km', 2),
    numOut('apogeeAltitudeKm', 'Apogee height above the WGS-84 ellipsoid (mean orbit)', 'km', 2),
  ],
  model: {
    method: `Mean eccentricity vector at rest under the zonals J2–J${FROZEN_ZONAL_DEGREE} (EGM-96): Gauss's equations averaged over the mean anomaly (first-order averaged equations, as in Cook 1966, evaluated by exact quadrature), dξ/dt = 0 at ξ = e cos ω = 0 solved for η = e sin ω; classic value e = −J3 R sin i / (2 J2 a).`,
    assumptions: [
      'e and ω are MEAN elements (short-period terms removed): the eccentricity a tracking station or GNSS receiver reports is osculating and swings between the osculating minimum and maximum given here within every orbit (first-order J2 short-period terms).',
      "Altitude input: mean semi-major axis minus the WGS-84 equatorial radius 6378.137 km. Perigee and apogee heights are geodetic heights of the mean orbit's perigee and apogee above the WGS-84 ellipsoid (with ω = 90° the perigee lies over the northern high latitudes, where the ellipsoid is up to 21 km below the equatorial radius).",
      `Zonal gravity only (J2–J${FROZEN_ZONAL_DEGREE}, first order; J2² terms change e by about 0.1 %); no drag, Sun or Moon. The higher odd zonals raise the frozen eccentricity of a sun-synchronous orbit by about 15 % over the J2–J3 formula.`,
      'Not valid within about 5° of the critical inclinations 63.4° and 116.6°: the perigee rate vanishes there, the frozen eccentricity depends on zonals beyond J9 and the kind warns or refuses.',
    ],
    references: [REF.cook1966, REF.kozai1959, REF.egm96, REF.wgs84],
  },
  compute(v) {
    const aKm = semiMajorAxisFromAltitude(v.altitudeKm);
    const iRad = toRad(v.inclinationDeg);
    const frozen = solveFrozenOrbit(aKm, iRad);
    const mean: KeplerElements = {
      aKm,
      e: frozen.e,
      iRad,
      raanRad: 0,
      argPerigeeRad: frozen.argPerigeeDeg * DEG,
      meanAnomalyRad: 0,
    };
    const range = computeOsculatingEccentricityRange(mean);
    const heightAt = (meanAnomalyRad: number) =>
      computeHeightAboveEllipsoid(elementsToState({ ...mean, meanAnomalyRad }).positionKm);
    const warnings = orbitWarnings({ altitudeKm: v.altitudeKm });
    const dCrit = distanceFromCriticalInclinationDeg(iRad);
    if (dCrit < CRITICAL_MARGIN_DEG) {
      warnings.push(
        `Inclination is ${dCrit.toFixed(2)}° from a critical inclination (63.4°/116.6°): the perigee rate nearly vanishes, so the frozen eccentricity depends on zonal harmonics beyond J${FROZEN_ZONAL_DEGREE} and on small forces; treat it as indicative only.`,
      );
    }
    if (Math.sin(iRad) < 0.1)
      warnings.push('Near-equatorial orbit: the odd-zonal forcing and the frozen eccentricity are close to zero.');
    return {
      outputs: {
        eccentricity: frozen.e,
        eccentricityJ2J3: computeFrozenEccentricity(aKm, iRad),
        argPerigeeDeg: frozen.argPerigeeDeg,
        oscEccentricityMin: range.min,
        oscEccentricityMax: range.max,
        perigeeAltitudeKm: heightAt(0),
        apogeeAltitudeKm: heightAt(TWO_PI / 2),
      },
      warnings,
    };
  },
});
