/** Field definitions and warnings shared by several kinds. */
import type { CalcOutputField } from '../types';
import { epochField, numberField } from '../fields';

export const MIN_ALTITUDE_KM = 100;

export const altitudeKm = (max = 6000, def?: number) =>
  numberField('Mean altitude above the equatorial radius', 'km', {
    min: MIN_ALTITUDE_KM,
    max,
    default: def ?? 700,
    help: 'Semi-major axis minus the WGS-84 equatorial radius 6378.137 km',
  });

export const eccentricity = () =>
  numberField('Eccentricity', null, { min: 0, max: 0.5, default: 0, help: 'Mean eccentricity; the near-circular formulas lose accuracy above about 0.05' });

export const inclinationDeg = (def = 98.2) => numberField('Inclination', 'deg', { min: 0, max: 180, default: def });

export const ltanHours = (def = 10.5) =>
  numberField('Local time of ascending node (mean Sun)', 'h', { min: 0, max: 24, maxExclusive: true, default: def });

export const epoch = (label = 'Epoch (UTC)', def = '2025-03-20T00:00:00Z') => epochField(label, { default: def, help: 'ISO 8601 UTC, e.g. 2025-03-20T12:00:00Z' });

/** Standard warnings for a near-circular LEO input. */
export function orbitWarnings(o: { altitudeKm?: number; eccentricity?: number; inclinationDeg?: number }): string[] {
  const w: string[] = [];
  if (o.altitudeKm !== undefined && o.altitudeKm < 300) {
    w.push(`Altitude ${o.altitudeKm} km is in the drag-dominated regime below 300 km: the orbit decays within weeks to months and J2-only rates ignore drag.`);
  }
  if (o.eccentricity !== undefined && o.eccentricity > 0.05) {
    w.push(`Eccentricity ${o.eccentricity} is above 0.05: the near-circular formulas used here lose accuracy.`);
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
