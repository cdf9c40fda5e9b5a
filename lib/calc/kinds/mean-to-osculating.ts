import { epochField, inFrame, numberField } from '../fields';
import { REF } from '../references';
import { defineKind } from '../registry';
import { toDeg, toRad } from '../topics/angles';
import type { KeplerElements } from '../topics/kepler-state';
import { meanToOsculating } from '../topics/mean-osculating';
import type { CalcOutputField } from '../types';
import { numOut, orbitWarnings, theory, THEORY_OUTPUT, theoryNotes } from './common';

/** The six element inputs shared by mean-to-osculating and osculating-to-mean; `which` names them in the labels. */
export function elementInputs(which: 'Mean' | 'Osculating') {
  const angle = (label: string, help?: string) =>
    numberField(`${which} ${label}`, 'deg', { min: 0, max: 360, default: 0, help });
  return {
    semiMajorAxisKm: numberField(`${which} semi-major axis`, 'km', {
      min: 6478.137,
      max: 50000,
      default: 7078.137,
      help: 'Equatorial radius 6378.137 km + altitude; at least 100 km altitude',
    }),
    eccentricity: numberField(`${which} eccentricity`, null, { min: 0, max: 0.5, default: 0 }),
    inclinationDeg: inFrame(numberField(`${which} inclination`, 'deg', { min: 0, max: 180, default: 98.19 }), 'TOD'),
    raanDeg: inFrame(angle('RAAN (true-of-date equator and equinox)'), 'TOD'),
    argPerigeeDeg: angle(
      'argument of perigee',
      'For a circular orbit leave 0: the mean anomaly is then the argument of latitude',
    ),
    meanAnomalyDeg: angle(
      'mean anomaly',
      'With argument of perigee 0 and e = 0: argument of latitude (0 = ascending node)',
    ),
    theory: theory(),
  };
}

export function toElements(v: {
  semiMajorAxisKm: number;
  eccentricity: number;
  inclinationDeg: number;
  raanDeg: number;
  argPerigeeDeg: number;
  meanAnomalyDeg: number;
}): KeplerElements {
  return {
    aKm: v.semiMajorAxisKm,
    e: v.eccentricity,
    iRad: toRad(v.inclinationDeg),
    raanRad: toRad(v.raanDeg),
    argPerigeeRad: toRad(v.argPerigeeDeg),
    meanAnomalyRad: toRad(v.meanAnomalyDeg),
  };
}

/** Output fields prefix + SemiMajorAxisKm, … for one element set. */
export function elementOutputs(prefix: 'osc' | 'mean', which: string): CalcOutputField[] {
  return [
    numOut(`${prefix}SemiMajorAxisKm`, `${which} semi-major axis`, 'km', 4),
    numOut(`${prefix}Eccentricity`, `${which} eccentricity`, null, 7),
    numOut(`${prefix}InclinationDeg`, `${which} inclination`, 'deg', 5),
    numOut(`${prefix}RaanDeg`, `${which} RAAN`, 'deg', 5),
    numOut(`${prefix}ArgPerigeeDeg`, `${which} argument of perigee`, 'deg', 4),
    numOut(`${prefix}MeanAnomalyDeg`, `${which} mean anomaly`, 'deg', 4),
  ];
}

export function elementValues(prefix: 'osc' | 'mean', el: KeplerElements): Record<string, number> {
  return {
    [`${prefix}SemiMajorAxisKm`]: el.aKm,
    [`${prefix}Eccentricity`]: el.e,
    [`${prefix}InclinationDeg`]: toDeg(el.iRad),
    [`${prefix}RaanDeg`]: toDeg(el.raanRad),
    [`${prefix}ArgPerigeeDeg`]: toDeg(el.argPerigeeRad),
    [`${prefix}MeanAnomalyDeg`]: toDeg(el.meanAnomalyRad),
  };
}

/** Warnings for an element set (altitude of perigee, eccentricity, near-equatorial orbits). */
export function elementWarnings(el: KeplerElements): string[] {
  const w = orbitWarnings({ altitudeKm: el.aKm * (1 - el.e) - 6378.137, inclinationDeg: toDeg(el.iRad) });
  if (el.e > 0 && el.e < 1e-4)
    w.push(
      'The eccentricity is below 1e-4: argument of perigee and mean anomaly are poorly defined on their own; quote their sum (the argument of latitude of the mean orbit).',
    );
  return w;
}

export const MEAN_OSCULATING_ASSUMPTIONS = [
  'Mean elements = osculating elements minus their first-order J2 short-period variations, which average to zero over one revolution: the mean semi-major axis is the time average of the osculating one. Long-period terms (J3, frozen-orbit motion) stay in the mean elements.',
  "Short-period terms computed along the mean Kepler orbit from Gauss's equations with the J2 acceleration, integrated in a Fourier series of the mean anomaly (exact to 1e-14 for the series); nonsingular elements (a, e cos ω, e sin ω, i, Ω, M + ω) as in Lyddane (1963), so e = 0 is handled. Both theories use these terms; the theory names the secular model the mean elements feed.",
  'Not modelled: second-order J2 and J3–J6 short-period terms (up to a few tens of metres in a in low Earth orbit), drag, third bodies. Valid for perigee heights above about 200 km and e ≤ 0.5; near i = 0° or 180° the node (RAAN) is ill-defined and reported as computed.',
  "Frame: true-of-date equatorial (x toward the equinox of date, z along Earth's axis). Position and velocity in km and km/s.",
  'A launch provider is given the injection target as osculating elements or a state vector at a stated point of the orbit (e.g. at the ascending node: argPerigeeDeg 0 and meanAnomalyDeg 0 for a circular mean orbit); mission design quantities (sun-synchronous inclination, repeat cycle, frozen eccentricity) are mean elements. Quote both.',
];

export const MEAN_OSCULATING_REFERENCES = [
  REF.kozai1959,
  REF.brouwer1959,
  REF.lyddane1963,
  REF.valladoGauss,
  REF.valladoCoe,
  REF.egm96,
  REF.wgs84,
];

const vectorOut = (name: string, label: string, unit: string, precision: number): CalcOutputField => ({
  name,
  label,
  unit,
  precision,
  type: 'vector',
});

export const meanToOsculatingKind = defineKind({
  kind: 'mean-to-osculating',
  title: 'Mean to osculating elements',
  summary:
    'Osculating elements and state vector of a mean orbit at a given point: the injection target to give a launcher.',
  inputs: {
    ...elementInputs('Mean'),
    // Not used by the computation: it dates the state, so that the block can be exported as a CCSDS OPM (rotated to EME2000 at this epoch).
    epoch: epochField('Epoch of the state (UTC)', {
      optional: true,
      help: 'Optional: dates the state for the OPM export (the state is true of date at this epoch)',
    }),
  },
  outputs: [
    ...elementOutputs('osc', 'Osculating'),
    vectorOut('positionKm', 'Position (true-of-date equatorial)', 'km', 4),
    vectorOut('velocityKmS', 'Velocity (true-of-date equatorial)', 'km/s', 7),
    { name: 'injectionTarget', label: 'Injection target', unit: null, precision: 0, type: 'string' },
    THEORY_OUTPUT,
  ],
  model: {
    method:
      "First-order J2 short-period terms (Kozai 1959; Brouwer 1959) added to the mean elements in Lyddane's nonsingular variables; osculating state from Kepler's equation.",
    assumptions: MEAN_OSCULATING_ASSUMPTIONS,
    references: MEAN_OSCULATING_REFERENCES,
  },
  compute(v) {
    const mean = toElements(v);
    const r = meanToOsculating(mean);
    const o = r.osculating;
    const u = (v.argPerigeeDeg + v.meanAnomalyDeg) % 360;
    const point =
      v.eccentricity === 0
        ? `mean argument of latitude ${u.toFixed(3)}°${u === 0 ? ' (ascending node)' : ''}`
        : `mean anomaly ${v.meanAnomalyDeg.toFixed(3)}°`;
    const injectionTarget = `At ${point}: osculating a = ${o.aKm.toFixed(3)} km, e = ${o.e.toFixed(6)}, i = ${toDeg(o.iRad).toFixed(4)}°, RAAN = ${toDeg(o.raanRad).toFixed(4)}°, ω = ${toDeg(o.argPerigeeRad).toFixed(3)}°, M = ${toDeg(o.meanAnomalyRad).toFixed(3)}° (r = ${Math.hypot(...r.positionKm).toFixed(3)} km)`;
    return {
      outputs: {
        ...elementValues('osc', o),
        positionKm: r.positionKm,
        velocityKmS: r.velocityKmS,
        injectionTarget,
        theory: v.theory,
      },
      warnings: elementWarnings(mean),
      modelNotes: theoryNotes(v.theory),
    };
  },
});
