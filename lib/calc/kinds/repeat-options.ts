import { integerField, numberField } from '../fields';
import { REF } from '../references';
import { defineKind } from '../registry';
import { toDeg, toRad } from '../topics/angles';
import { listRepeatOptions } from '../topics/repeat-ground-track';
import { intOut, MIN_ALTITUDE_KM, numOut, rowsOut, theory, THEORY_OUTPUT, theoryNotes } from './common';
import { optionalInclination, REPEAT_MODEL_ASSUMPTIONS } from './repeat-orbit';

const bandEdge = (label: string, def: number) =>
  numberField(label, 'km', { min: MIN_ALTITUDE_KM, max: 5000, default: def });

export const repeatOptionsKind = defineKind({
  kind: 'repeat-options',
  title: 'Repeat ground-track options in an altitude band',
  summary:
    'Every repeat cycle (revolutions and days with no common factor, up to a longest cycle) whose orbit lies in an altitude band, sorted by altitude.',
  inputs: {
    minAltitudeKm: bandEdge('Lowest altitude', 600),
    maxAltitudeKm: bandEdge('Highest altitude', 800),
    maxDays: integerField('Longest repeat cycle', 'd', { min: 1, max: 60, default: 16 }),
    inclinationDeg: optionalInclination(),
    theory: theory(),
  },
  check(v): Record<string, string> {
    return v.maxAltitudeKm > v.minAltitudeKm
      ? {}
      : { maxAltitudeKm: 'maxAltitudeKm: must be greater than minAltitudeKm' };
  },
  outputs: [
    intOut('count', 'Number of options'),
    rowsOut('options', 'Repeat options', [
      intOut('revolutions', 'Revolutions'),
      intOut('days', 'Days', 'd'),
      numOut('altitudeKm', 'Altitude', 'km', 2),
      numOut('inclinationDeg', 'Inclination', 'deg', 3),
      numOut('equatorSpacingKm', 'Equator spacing', 'km', 2),
    ]),
    THEORY_OUTPUT,
  ],
  model: {
    method:
      'For each cycle length D up to the longest repeat cycle asked for, every R with gcd(R, D) = 1 between the revolutions-per-day of the band edges is solved with the repeat condition R·T_N = D·T_ND.',
    assumptions: [...REPEAT_MODEL_ASSUMPTIONS, 'Circular orbits (e = 0).'],
    references: [REF.wertzOrbitDesign, REF.kozai1959],
  },
  compute(v) {
    const inc = v.inclinationDeg === undefined ? undefined : toRad(v.inclinationDeg);
    const found = listRepeatOptions(v.minAltitudeKm, v.maxAltitudeKm, v.maxDays, 0, inc, v.theory);
    const warnings =
      v.minAltitudeKm < 300
        ? ['Options below 300 km are in the drag-dominated regime; holding them needs frequent manoeuvres.']
        : [];
    if (v.maxAltitudeKm > 3000)
      warnings.push(
        'Options above 3000 km: Sun and Moon gravity, not modelled here, add a node drift that is no longer negligible.',
      );
    if (found.length === 0)
      warnings.push('No repeat cycle up to the longest repeat cycle asked for lies in this band.');
    return {
      outputs: {
        count: found.length,
        options: found.map((s) => ({
          revolutions: s.revolutions,
          days: s.days,
          altitudeKm: s.altitudeKm,
          inclinationDeg: toDeg(s.inclinationRad),
          equatorSpacingKm: s.equatorSpacingKm,
        })),
        theory: v.theory,
      },
      warnings,
      modelNotes: theoryNotes(v.theory),
    };
  },
});
