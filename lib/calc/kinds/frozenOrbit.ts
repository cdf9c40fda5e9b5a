import { EARTH_RADIUS_KM } from '../constants';
import { REF } from '../references';
import { defineKind } from '../registry';
import { toRad } from '../topics/angles';
import { semiMajorAxisFromAltitude } from '../topics/sunSynchronous';
import { computeFrozenArgPerigeeDeg, computeFrozenEccentricity, distanceFromCriticalInclinationDeg } from '../topics/frozenOrbit';
import { altitudeKm, inclinationDeg, numOut, orbitWarnings } from './common';

/** Within this distance [deg] of a critical inclination the J2–J3 frozen condition is not trusted. */
export const CRITICAL_MARGIN_DEG = 5;

export const frozenOrbitKind = defineKind({
  kind: 'frozen-orbit',
  title: 'Frozen orbit (J2–J3)',
  summary: 'Eccentricity and argument of perigee at which the J3 drift of the eccentricity vector is balanced by the J2 perigee rotation.',
  inputs: { altitudeKm: altitudeKm(), inclinationDeg: inclinationDeg() },
  outputs: [
    numOut('eccentricity', 'Frozen eccentricity', null, 6),
    numOut('argPerigeeDeg', 'Frozen argument of perigee', 'deg', 1),
    numOut('perigeeAltitudeKm', 'Perigee altitude', 'km', 2),
    numOut('apogeeAltitudeKm', 'Apogee altitude', 'km', 2),
  ],
  model: {
    method: 'J2–J3 first-order frozen condition: e_f = −J3 R sin i / (2 J2 a), ω = 90°.',
    assumptions: [
      'Only J2 and J3; the higher odd zonals J5, J7, … raise the frozen eccentricity of a sun-synchronous orbit by about 10 %.',
      'The balance fails near the critical inclinations 63.4° and 116.6°, where the J2 perigee rate vanishes.',
      'Altitude is semi-major axis minus the WGS-84 equatorial radius.',
    ],
    references: [REF.chobotov, REF.valladoDesign, REF.egm96],
  },
  compute(v) {
    const aKm = semiMajorAxisFromAltitude(v.altitudeKm);
    const iRad = toRad(v.inclinationDeg);
    const e = computeFrozenEccentricity(aKm, iRad);
    const warnings = orbitWarnings({ altitudeKm: v.altitudeKm });
    const dCrit = distanceFromCriticalInclinationDeg(iRad);
    if (dCrit < CRITICAL_MARGIN_DEG) {
      warnings.push(`Inclination is ${dCrit.toFixed(2)}° from a critical inclination (63.4°/116.6°): the J2 perigee rate nearly vanishes, so the J2–J3 frozen eccentricity does not hold here; higher zonal terms decide the frozen state.`);
    }
    if (Math.sin(iRad) < 0.1) warnings.push('Near-equatorial orbit: the J3 forcing and the frozen eccentricity are close to zero.');
    return {
      outputs: {
        eccentricity: e,
        argPerigeeDeg: computeFrozenArgPerigeeDeg(iRad),
        perigeeAltitudeKm: aKm * (1 - e) - EARTH_RADIUS_KM,
        apogeeAltitudeKm: aKm * (1 + e) - EARTH_RADIUS_KM,
      },
      warnings,
    };
  },
});
