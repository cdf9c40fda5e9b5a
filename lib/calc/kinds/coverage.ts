import { integerField, numberField } from '../fields';
import { REF } from '../references';
import { defineKind } from '../registry';
import { toDeg, toRad } from '../topics/angles';
import { computeEquatorSpacingKm, computeGroundTrackAngle, computeSidelapPercent } from '../topics/coverage';
import { gcd, solveRepeatOrbit } from '../topics/repeat-ground-track';
import { semiMajorAxisFromAltitude, solveSsoInclination } from '../topics/sun-synchronous';
import { altitudeKm, numOut, orbitWarnings, theory, THEORY_OUTPUT, theoryNotes } from './common';
import { optionalInclination } from './repeat-orbit';

export const coverageKind = defineKind({
  kind: 'coverage',
  title: 'Swath coverage of a repeat cycle',
  summary: 'Track spacing at the equator for a repeat cycle and whether a swath of given width covers it without gaps.',
  inputs: {
    altitudeKm: altitudeKm(),
    swathKm: numberField('Swath width', 'km', { min: 0.01, max: 10000, minExclusive: true, default: 185 }),
    revolutions: integerField('Revolutions per repeat cycle', null, { min: 1, max: 2000, default: 233 }),
    days: integerField('Repeat cycle', 'd', { min: 1, max: 100, default: 16 }),
    inclinationDeg: optionalInclination(),
    theory: theory(),
  },
  check(v): Record<string, string> {
    const k = gcd(v.revolutions, v.days);
    return k === 1 ? {} : { revolutions: `revolutions: ${v.revolutions} and days ${v.days} share the factor ${k}` };
  },
  outputs: [
    numOut('equatorSpacingKm', 'Track spacing along the equator', 'km', 2),
    numOut('sidelapPercent', 'Sidelap at the equator (along the equator)', '%', 2),
    { name: 'gapless', label: 'Gapless at the equator', unit: null, precision: 0, type: 'boolean' },
    numOut('swathForGaplessKm', 'Smallest gapless swath (along the equator)', 'km', 2),
    numOut('crossTrackSpacingKm', 'Track spacing perpendicular to the track', 'km', 2),
    numOut('sidelapCrossTrackPercent', 'Sidelap perpendicular to the track', '%', 2),
    numOut('groundTrackAngleDeg', 'Ground-track angle to the equator', 'deg', 3),
    THEORY_OUTPUT,
  ],
  model: {
    method:
      'Equator spacing 2πR⊕/R for R revolutions per cycle; sidelap (swath − spacing)/swath; perpendicular spacing = spacing · sin ψ with ψ the ground-track angle including Earth rotation.',
    assumptions: [
      'Swath is the full cross-track width on the ground, centred on the track; Earth curvature across the swath neglected.',
      'sidelapPercent and gapless use the along-equator spacing (the convention of mission handbooks); the perpendicular figures are the stricter geometric test.',
      'Inclination: sun-synchronous at the given altitude unless inclinationDeg is set (secular rates of the chosen theory).',
      'Valid while the swath is small against the Earth (flat-swath geometry) and the repeat cycle exists at the given altitude (a warning says when it does not).',
    ],
    references: [REF.wertzCoverage],
  },
  compute(v) {
    const aKm = semiMajorAxisFromAltitude(v.altitudeKm);
    const iRad = v.inclinationDeg === undefined ? solveSsoInclination(aKm, 0, v.theory) : toRad(v.inclinationDeg);
    const spacing = computeEquatorSpacingKm(v.revolutions);
    const psi = computeGroundTrackAngle(aKm, iRad, v.theory);
    const cross = spacing * Math.abs(Math.sin(psi));
    const warnings = orbitWarnings(v);
    try {
      const repeat = solveRepeatOrbit(
        v.revolutions,
        v.days,
        0,
        v.inclinationDeg === undefined ? undefined : iRad,
        v.theory,
      );
      if (Math.abs(repeat.altitudeKm - v.altitudeKm) > 20) {
        warnings.push(
          `${v.revolutions} revolutions in ${v.days} days corresponds to about ${repeat.altitudeKm.toFixed(0)} km, not ${v.altitudeKm} km: check the inputs.`,
        );
      }
    } catch {
      warnings.push(
        `No repeat orbit with ${v.revolutions} revolutions in ${v.days} days exists at these inclinations; the spacing still follows from the revolution count.`,
      );
    }
    return {
      outputs: {
        equatorSpacingKm: spacing,
        sidelapPercent: computeSidelapPercent(v.swathKm, spacing),
        gapless: v.swathKm >= spacing,
        swathForGaplessKm: spacing,
        crossTrackSpacingKm: cross,
        sidelapCrossTrackPercent: computeSidelapPercent(v.swathKm, cross),
        groundTrackAngleDeg: toDeg(psi),
        theory: v.theory,
      },
      warnings,
      modelNotes: theoryNotes(v.theory),
    };
  },
});
