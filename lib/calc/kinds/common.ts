/** Field definitions and warnings shared by several kinds. */
import type { CalcOutputField } from '../types';
import { enumField, epochField, inFrame, numberField } from '../fields';
import { computeAltitudeConventions } from '../topics/altitude-conventions';
import { DEFAULT_THEORY, describeTheory, SECULAR_THEORIES, type SecularTheory } from '../topics/secular-rates';

export const MIN_ALTITUDE_KM = 100;

export const altitudeKm = (max = 6000, def?: number) =>
  numberField('Mean altitude (mean semi-major axis − equatorial radius)', 'km', {
    min: MIN_ALTITUDE_KM,
    max,
    default: def ?? 700,
    help: 'Mean semi-major axis minus the WGS-84 equatorial radius 6378.137 km. Not the altitude at the equator or above the ellipsoid that handbooks often quote: see the altitude-convention outputs of sso-inclination and repeat-orbit',
  });

export const eccentricity = () =>
  numberField('Eccentricity', null, {
    min: 0,
    max: 0.5,
    default: 0,
    help: 'Mean eccentricity; the near-circular formulas lose accuracy above about 0.05',
  });

export const inclinationDeg = (def = 98.2) =>
  inFrame(numberField('Inclination', 'deg', { min: 0, max: 180, default: def }), 'TOD');

export const ltanHours = (def = 10.5) =>
  numberField('Local time of ascending node (mean Sun)', 'h', { min: 0, max: 24, maxExclusive: true, default: def });

export const epoch = (label = 'Epoch (UTC)', def = '2025-03-20T00:00:00Z') =>
  epochField(label, { default: def, help: 'ISO 8601 UTC, e.g. 2025-03-20T12:00:00Z' });

/** The secular-theory switch of every kind that uses secular rates. */
export const theory = () =>
  enumField(
    'Secular theory',
    SECULAR_THEORIES,
    DEFAULT_THEORY,
    'zonal: J2 to second order + J4, J6 (Brouwer mean elements, default); j2: first-order J2 (textbook comparison)',
  );

/** Output naming the secular theory of a result. */
export const THEORY_OUTPUT: CalcOutputField = {
  name: 'theory',
  label: 'Secular theory',
  unit: null,
  precision: 0,
  type: 'string',
};

/** The model-note sentence of a result computed in `t`. */
export function theoryNotes(t: SecularTheory): string[] {
  return [describeTheory(t)];
}

/** Where the secular-rate kinds stop being valid (one sentence for their model notes; orbitWarnings flags inputs there). */
export const SECULAR_VALIDITY =
  'Valid for near-circular orbits (e ≲ 0.05) between about 300 km (below, drag dominates) and 3000 km (above, Sun and Moon gravity, not modelled, move the node noticeably); mean elements near the critical inclinations 63.4°/116.6° have long-period terms this secular model leaves out.';

/** Altitude above which Sun and Moon gravity on the node is no longer negligible for this model [km]. */
export const LUNISOLAR_WARNING_ALTITUDE_KM = 3000;
/** Distance from a critical inclination (63.43°, 116.57°) within which a warning is given [deg]. */
export const CRITICAL_INCLINATION_WARNING_DEG = 2;

/** Standard warnings for a near-circular LEO input (the limits named in SECULAR_VALIDITY). */
export function orbitWarnings(o: { altitudeKm?: number; eccentricity?: number; inclinationDeg?: number }): string[] {
  const w: string[] = [];
  if (o.altitudeKm !== undefined && o.altitudeKm < 300) {
    w.push(
      `Altitude ${o.altitudeKm} km is in the drag-dominated regime below 300 km: the orbit decays within weeks to months and gravity-only secular rates ignore drag.`,
    );
  }
  if (o.altitudeKm !== undefined && o.altitudeKm > LUNISOLAR_WARNING_ALTITUDE_KM) {
    w.push(
      `Altitude ${o.altitudeKm} km is above ${LUNISOLAR_WARNING_ALTITUDE_KM} km: Sun and Moon gravity, not modelled here, add a node drift that is no longer negligible.`,
    );
  }
  if (o.eccentricity !== undefined && o.eccentricity > 0.05) {
    w.push(`Eccentricity ${o.eccentricity} is above 0.05: the near-circular formulas used here lose accuracy.`);
  }
  if (o.inclinationDeg !== undefined) {
    const critical = Math.min(Math.abs(o.inclinationDeg - 63.435), Math.abs(o.inclinationDeg - 116.565));
    if (critical < CRITICAL_INCLINATION_WARNING_DEG) {
      w.push(
        `Inclination is ${critical.toFixed(2)}° from a critical inclination (63.4°/116.6°): the perigee rate nearly vanishes and long-period terms, not in this secular model, grow.`,
      );
    }
  }
  if (o.inclinationDeg !== undefined && Math.abs(Math.sin((o.inclinationDeg * Math.PI) / 180)) < 1e-3) {
    w.push('The orbit is (nearly) equatorial: the node and its local time are ill-defined.');
  }
  return w;
}

/** A numeric output field. */
export function numOut(name: string, label: string, unit: string | null, precision: number): CalcOutputField {
  return { name, label, unit, precision, type: 'number' };
}

/** Output fields shared by several orbit kinds. */
export const SHARED_OUTPUTS = {
  nodalPeriodMin: numOut('nodalPeriodMin', 'Nodal period', 'min', 3),
  revsPerDay: numOut('revsPerDay', 'Revolutions per mean solar day', null, 4),
  nodeRateDegPerDay: numOut('nodeRateDegPerDay', 'Node rate', 'deg/d', 5),
  localTimeDriftMinPerYear: numOut('localTimeDriftMinPerYear', 'Node local-time drift vs mean Sun', 'min/yr', 2),
} as const;

/** An integer output field. */
export function intOut(name: string, label: string, unit: string | null = null): CalcOutputField {
  return { name, label, unit, precision: 0, type: 'integer' };
}

/** A table output (array of row objects) with its columns. */
export function rowsOut(name: string, label: string, columns: CalcOutputField[]): CalcOutputField {
  return { name, label, unit: null, precision: 0, type: 'rows', columns };
}

/** Outputs of the three altitude conventions of a mean orbit, side by side (the mean altitude first). */
export function altitudeConventionOutputs(aKm: number, e: number, iRad: number): Record<string, number> {
  const c = computeAltitudeConventions({ aKm, e, iRad, raanRad: 0, argPerigeeRad: Math.PI / 2, meanAnomalyRad: 0 });
  return {
    meanAltitudeKm: c.meanAltitudeKm,
    altitudeAtAscendingNodeKm: c.altitudeAtAscendingNodeKm,
    meanAltitudeAboveEllipsoidKm: c.meanAltitudeAboveEllipsoidKm,
  };
}

/** The three altitude conventions, shown side by side in the results (mean altitude first). */
export const ALTITUDE_CONVENTION_OUTPUTS: CalcOutputField[] = [
  numOut('meanAltitudeKm', 'Mean altitude (a − equatorial radius)', 'km', 3),
  numOut('altitudeAtAscendingNodeKm', 'Altitude at the ascending node', 'km', 3),
  numOut('meanAltitudeAboveEllipsoidKm', 'Mean height above the WGS-84 ellipsoid', 'km', 3),
];

/** Model-note sentences on the altitude conventions (kinds with ALTITUDE_CONVENTION_OUTPUTS). */
export const ALTITUDE_CONVENTION_NOTES = [
  'Three altitudes describe the same orbit: the mean altitude (mean semi-major axis − equatorial radius, the input and the basis of every rate), the altitude at the ascending node (osculating radius where the orbit crosses the equator northward − equatorial radius, first-order J2 short-period terms) and the mean height above the WGS-84 ellipsoid (time average along the osculating orbit). For e > 0 the perigee is taken at ω = 90° (frozen-orbit convention).',
  'A handbook or agency altitude is usually either the altitude at the equator or the mean altitude, and says so only in passing: USGS gives Landsat 8 "705 km altitude at the Equator" (Landsat 8 Data Users Handbook, LSDS-1574, §2.1) for the 233/16 orbit of mean semi-major axis 7077.7 km (699.6 km mean altitude), while AVISO\'s ERS-1 orbit page gives "mean altitude 782 km" for a semi-major axis of 7159.5 km. Compare a quoted figure with both before typing it in as the mean altitude: at 700 km a 6 km mix-up moves the sun-synchronous inclination by about 0.025°, the 15 km to the mean height above the ellipsoid by about 0.06°.',
];
