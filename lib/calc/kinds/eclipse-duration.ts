import { enumField, numberField } from '../fields';
import { REF } from '../references';
import { defineKind } from '../registry';
import { toDeg, toRad } from '../topics/angles';
import { computeCriticalBeta, computeShadowFractions } from '../topics/eclipse-beta';
import { keplerPeriod } from '../topics/kepler-state';
import { semiMajorAxisFromAltitude } from '../topics/sun-synchronous';
import { altitudeKm, numOut, orbitWarnings } from './common';

/** The shadow-model switch shared with sun-geometry. */
export const shadowModel = () =>
  enumField(
    'Shadow model',
    ['conical', 'cylindrical'] as const,
    'conical',
    'conical: umbra and penumbra cones of the Sun and Earth discs; cylindrical: shadow cylinder of the Earth radius (textbook comparison)',
  );

export const SHADOW_ASSUMPTIONS = [
  'Circular orbit; spherical Earth of the WGS-84 equatorial radius 6378.137 km, no atmosphere (refraction and the ≈ 50 km absorbing layer lengthen the dark time slightly); Sun a sphere of the IAU nominal radius.',
  'Conical shadow: umbra = Sun fully hidden, penumbra = Sun partly hidden; the penumbra time given is umbra plus penumbra (the time any part of the Sun is hidden). The cylindrical shadow lies between the two.',
];

export const eclipseDurationKind = defineKind({
  kind: 'eclipse-duration',
  title: 'Eclipse duration per orbit (umbra, penumbra)',
  summary:
    "Time in the Earth's umbra and penumbra during one orbit of a circular orbit at a given beta angle, with the cylindrical-shadow value for comparison.",
  inputs: {
    altitudeKm: altitudeKm(),
    betaDeg: numberField('Beta angle (Sun above the orbit plane)', 'deg', { min: -90, max: 90, default: 0 }),
    shadowModel: shadowModel(),
  },
  outputs: [
    numOut('umbraMin', 'Time in umbra per orbit', 'min', 2),
    numOut('penumbraMin', 'Time in umbra + penumbra per orbit', 'min', 2),
    numOut('cylindricalMin', 'Time in the cylindrical shadow per orbit', 'min', 2),
    numOut('eclipseMin', 'Eclipse per orbit, selected model (umbra or cylinder)', 'min', 2),
    numOut('criticalBetaDeg', 'Beta angle above which there is no eclipse (cylinder)', 'deg', 2),
    numOut('orbitPeriodMin', 'Keplerian period of the mean semi-major axis', 'min', 3),
  ],
  model: {
    method:
      'Arc of a circular orbit inside the umbra cone (ρ < (L_u − x) tan α_u), the penumbra cone (ρ < (L_p + x) tan α_p) and the cylinder ρ < R, each boundary solved in closed form for x = a cos β cos φ; times = arc fraction × Keplerian period 2π√(a³/μ) of the mean semi-major axis.',
    assumptions: [
      ...SHADOW_ASSUMPTIONS,
      "Sun at 1 au (its distance varies by ±1.7 % over the year, which changes the penumbra time by under 0.02 min in low Earth orbit); the orbit's own motion during the eclipse (node drift) is ignored.",
      'Altitude is the mean semi-major axis minus the equatorial radius; the duration uses the Keplerian period of that semi-major axis (the J2 nodal period differs by about 0.1 %).',
      'Valid for near-circular orbits (e ≲ 0.01: the duration scales with the local speed) above about 200 km.',
    ],
    references: [REF.montenbruckShadow, REF.iauSunRadius, REF.wgs84],
  },
  compute(v) {
    const aKm = semiMajorAxisFromAltitude(v.altitudeKm);
    const f = computeShadowFractions(aKm, toRad(v.betaDeg));
    const periodMin = keplerPeriod(aKm) / 60;
    return {
      outputs: {
        umbraMin: f.umbra * periodMin,
        penumbraMin: f.penumbra * periodMin,
        cylindricalMin: f.cylindrical * periodMin,
        eclipseMin: (v.shadowModel === 'conical' ? f.umbra : f.cylindrical) * periodMin,
        criticalBetaDeg: toDeg(computeCriticalBeta(v.altitudeKm)),
        orbitPeriodMin: periodMin,
      },
      warnings: orbitWarnings({ altitudeKm: v.altitudeKm }),
    };
  },
});
