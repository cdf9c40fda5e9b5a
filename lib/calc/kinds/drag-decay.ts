import { numberField } from '../fields';
import { REF } from '../references';
import { defineKind } from '../registry';
import { EARTH_MU_KM3_S2, EARTH_RADIUS_KM, SECONDS_PER_DAY, TROPICAL_YEAR_DAYS } from '../constants';
import { REENTRY_ALTITUDE_KM, computeLifetimeSeconds, summariseDrag } from '../topics/drag-lifetime';
import { integrateDecay, type DecayRow } from '../topics/orbit-lifetime/averaged-decay';
import { cachedWeather } from '../topics/orbit-lifetime/density-models';
import { numOut, rowsOut } from './common';
import {
  checkLifetimeInputs,
  CIRCULAR_SAMPLES,
  decayModelOf,
  LIFETIME_HORIZON_YEARS,
  LIFETIME_NOTE,
  lifetimeFields,
  spacecraftDragFields,
  NRLMSISE_REENTRY_KM,
  solarSourceOf,
  solarSourceWarnings,
  type LifetimeInputs,
} from './lifetime-inputs';
import { epochDate } from './node-local-time';

const SERIES_ROWS = 80;
const MAX_SERIES_ROWS = 400;

/** Every k-th row and the last, so that a century of monthly rows stays a readable figure. */
function thinRows<T>(rows: T[]): T[] {
  const k = Math.ceil(rows.length / MAX_SERIES_ROWS);
  return k <= 1 ? rows : rows.filter((_, i) => i % k === 0 || i === rows.length - 1);
}
const MS_PER_DAY = 86_400_000;

/** Decay series of the static exponential path: time to fall from h0 to h is L(h0) − L(h) (density of altitude only). */
function exponentialSeries(start: Date, h0: number, b: number, v: LifetimeInputs, lifetimeDays: number): DecayRow[] {
  const rows: DecayRow[] = [];
  if (h0 <= REENTRY_ALTITUDE_KM) return rows;
  for (let k = 0; k <= SERIES_ROWS; k++) {
    const h = h0 - ((h0 - REENTRY_ALTITUDE_KM) * k) / SERIES_ROWS;
    const days = lifetimeDays - computeLifetimeSeconds(h, b, v.solarActivity) / SECONDS_PER_DAY;
    rows.push({
      date: new Date(start.getTime() + days * MS_PER_DAY).toISOString(),
      days,
      years: days / 365.25,
      altitudeKm: h,
      perigeeAltitudeKm: h,
    });
  }
  return rows;
}

export const dragDecayKind = defineKind({
  kind: 'drag-decay',
  title: 'Drag decay and lifetime',
  summary:
    'Orbit-averaged decay over dates with NRLMSISE-00 and the solar cycle (or the static exponential tables): lifetime, re-entry date, decay series, and the yearly ΔV to hold altitude, for a circular orbit.',
  inputs: {
    altitudeKm: numberField('Mean altitude above the equatorial radius', 'km', { min: 150, max: 1000, default: 500 }),
    ...spacecraftDragFields(),
    ...lifetimeFields('Start date (UTC)'),
  },
  check(v): Record<string, string> {
    return checkLifetimeInputs(v, v.altitudeKm);
  },
  outputs: [
    numOut('densityKgM3', 'Atmospheric density (orbit mean at the start)', 'kg/m^3', 15),
    numOut('ballisticCoefficientKgM2', 'Ballistic coefficient m/(C_D A)', 'kg/m^2', 1),
    numOut('decayKmPerDay', 'Decay rate at the start', 'km/d', 5),
    numOut('lifetimeDays', 'Lifetime to re-entry', 'd', 0),
    numOut('lifetimeYears', 'Lifetime to re-entry', 'yr', 2),
    { name: 'reentryEpoch', label: 'Re-entry date (UTC)', unit: null, precision: 0, type: 'string' },
    {
      name: 'reentersWithinHorizon',
      label: `Re-enters within ${LIFETIME_HORIZON_YEARS} years`,
      unit: null,
      precision: 0,
      type: 'boolean',
    },
    numOut('reentryAltitudeKm', 'Re-entry altitude (end point)', 'km', 0),
    numOut('maintenanceDeltaVMpsPerYear', 'ΔV per year to hold altitude (at the start)', 'm/s', 3),
    numOut('dragAccelerationMps2', 'Drag acceleration (at the start)', 'm/s^2', 12),
    rowsOut('series', 'Decay over time', [
      { name: 'date', label: 'Date (UTC)', unit: null, precision: 0, type: 'string' },
      numOut('days', 'Days from the start', 'd', 1),
      numOut('years', 'Years from the start', 'yr', 2),
      numOut('altitudeKm', 'Mean altitude', 'km', 1),
      numOut('f107Average', 'F10.7, 81-day mean', 'sfu', 1),
    ]),
  ],
  figures: [{ name: 'decay', title: 'Mean altitude over time', rows: 'series', x: 'date', y: ['altitudeKm'] }],
  heavy: true,
  costInputs: {
    altitudeKm: 'a lower altitude (a shorter lifetime to integrate)',
    atmosphere: 'the exponential atmosphere',
  },
  model: {
    method: `${LIFETIME_NOTE.method} With atmosphere = exponential: the original model, circular decay rate da/dt = −ρ (C_D A/m) √(μ a) (King-Hele) integrated by Gauss–Legendre quadrature down to 200 km. ΔV/yr = ½ ρ v² (C_D A/m) × 1 yr at the start.`,
    assumptions: [
      ...LIFETIME_NOTE.assumptions,
      'exponential: moderate = Vallado 4th ed. Table 8-4 exponential atmosphere (a static mean model); low / high = MSISE-90 densities for low and high solar activity (Hedin 1991) tabulated every 20 km and interpolated exponentially between the nodes; lifetimes order-of-magnitude, the re-entry date is the start date plus the lifetime.',
      `Lifetimes longer than ${LIFETIME_HORIZON_YEARS} years are reported as ${LIFETIME_HORIZON_YEARS} years (a lower bound) with a warning.`,
      'Valid for circular orbits from 150 km to the top of the chosen density table; below 300 km lifetimes are weeks to months and the kind warns, as it does for implausible ballistic coefficients.',
    ],
    references: [...LIFETIME_NOTE.references, REF.kingHele, REF.valladoAtmosphere, REF.msise90],
  },
  compute(v) {
    const start = epochDate(v.startEpoch);
    const b = (v.dragCoefficient * v.areaM2) / v.massKg;
    const ballistic = 1 / b;
    const warnings: string[] = [];
    if (ballistic < 5 || ballistic > 1000)
      warnings.push(
        `Ballistic coefficient ${ballistic.toFixed(1)} kg/m² is unusual for a satellite (typically 10–200 kg/m²); check mass and area.`,
      );
    const aKm = EARTH_RADIUS_KM + v.altitudeKm;
    const vMs = Math.sqrt(EARTH_MU_KM3_S2 / aKm) * 1000;
    if (v.atmosphere === 'exponential') {
      const s = summariseDrag(v.altitudeKm, v.massKg, v.areaM2, v.dragCoefficient, v.solarActivity);
      if (v.altitudeKm <= REENTRY_ALTITUDE_KM)
        warnings.push(
          'The altitude is at or below the 200 km end point: lifetime is reported as 0; decay from here takes days.',
        );
      else if (v.altitudeKm < 300) warnings.push('Below 300 km the orbit decays within weeks to months.');
      warnings.push(...solarSourceWarnings(v, undefined));
      return {
        outputs: {
          densityKgM3: s.densityKgM3,
          ballisticCoefficientKgM2: ballistic,
          decayKmPerDay: s.decayKmPerDay,
          lifetimeDays: s.lifetimeDays,
          lifetimeYears: s.lifetimeDays / 365.25,
          reentryEpoch: new Date(start.getTime() + s.lifetimeDays * MS_PER_DAY).toISOString(),
          reentersWithinHorizon: true,
          reentryAltitudeKm: REENTRY_ALTITUDE_KM,
          maintenanceDeltaVMpsPerYear: s.maintenanceDeltaVMpsPerYear,
          dragAccelerationMps2: s.dragAccelerationMps2,
          series: exponentialSeries(start, v.altitudeKm, b, v, s.lifetimeDays).map(
            ({ perigeeAltitudeKm: _p, ...r }) => r,
          ),
        },
        warnings,
      };
    }
    const source = solarSourceOf(v);
    const { orbit, reentryAltitudeKm } = decayModelOf(v, v.altitudeKm, b, CIRCULAR_SAMPLES, source);
    const history = integrateDecay(
      { start, altitudeKm: v.altitudeKm, reentryAltitudeKm, horizonYears: LIFETIME_HORIZON_YEARS },
      orbit,
    );
    const weatherOn = cachedWeather(source);
    const series = thinRows(history.rows).map((r) => ({
      date: r.date,
      days: r.days,
      years: r.years,
      altitudeKm: r.altitudeKm,
      f107Average: weatherOn(new Date(r.date)).f107Average,
    }));
    const rho = history.initial.meanDensityKgM3;
    const accel = 0.5 * rho * vMs * vMs * b;
    const lifetimeDays = history.lifetimeSeconds / SECONDS_PER_DAY;
    if (!history.reentered)
      warnings.push(
        `The orbit is still above ${NRLMSISE_REENTRY_KM} km after ${LIFETIME_HORIZON_YEARS} years: the lifetime shown is a lower bound.`,
      );
    if (v.altitudeKm < 300) warnings.push('Below 300 km the orbit decays within weeks to months.');
    if (v.solarFlux === 'cycle' && history.lifetimeSeconds / (365.25 * SECONDS_PER_DAY) > v.cyclePeriodYears)
      warnings.push(
        'The decay runs into solar cycles that have not begun: their timing and size are assumptions (see the later-cycles maximum and the cycle length).',
      );
    return {
      outputs: {
        densityKgM3: rho,
        ballisticCoefficientKgM2: ballistic,
        decayKmPerDay: -history.initial.dadt * SECONDS_PER_DAY,
        lifetimeDays,
        lifetimeYears: lifetimeDays / 365.25,
        reentryEpoch: history.reentered ? new Date(start.getTime() + lifetimeDays * MS_PER_DAY).toISOString() : '',
        reentersWithinHorizon: history.reentered,
        reentryAltitudeKm,
        maintenanceDeltaVMpsPerYear: accel * TROPICAL_YEAR_DAYS * SECONDS_PER_DAY,
        dragAccelerationMps2: accel,
        series,
      },
      warnings: [...warnings, ...solarSourceWarnings(v, source)],
    };
  },
});
