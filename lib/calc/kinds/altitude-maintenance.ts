import { SECONDS_PER_DAY } from '../constants';
import { numberField } from '../fields';
import { defineKind } from '../registry';
import { computeDecayRate } from '../topics/drag-lifetime';
import { computeMeanMotion } from '../topics/secular-rates';
import { computeAveragedRates } from '../topics/orbit-lifetime/averaged-decay';
import { computeDeadbandCycle, computeGroundTrackDriftGain } from '../topics/orbit-lifetime/ground-track-deadband';
import { semiMajorAxisFromAltitude } from '../topics/sun-synchronous';
import { numOut } from './common';
import {
  checkLifetimeInputs,
  CIRCULAR_SAMPLES,
  decayModelOf,
  LIFETIME_NOTE,
  lifetimeFields,
  solarSourceOf,
  solarSourceWarnings,
  spacecraftDragFields,
} from './lifetime-inputs';
import { epochDate } from './node-local-time';

const YEAR_S = 365.25 * SECONDS_PER_DAY;
/** Dates averaged for the yearly ΔV (twice a month, so the semiannual density variation is resolved). */
const YEAR_SAMPLES = 24;

export const altitudeMaintenanceKind = defineKind({
  kind: 'altitude-maintenance',
  title: 'Altitude and ground-track maintenance',
  summary:
    'Manoeuvre cycle that keeps the ground track within a symmetric dead band at the equator against drag: interval, Δa and ΔV per manoeuvre, and ΔV per year.',
  inputs: {
    altitudeKm: numberField('Reference mean altitude above the equatorial radius', 'km', {
      min: 150,
      max: 1000,
      default: 700,
    }),
    ...spacecraftDragFields(),
    deadbandKm: numberField('Ground-track dead band at the equator (±)', 'km', { min: 0.01, max: 100, default: 1 }),
    ...lifetimeFields('Start date (UTC)'),
  },
  check(v): Record<string, string> {
    return checkLifetimeInputs(v, v.altitudeKm);
  },
  outputs: [
    numOut('manoeuvreIntervalDays', 'Time between manoeuvres (at the start date)', 'd', 1),
    numOut('deltaSemiMajorAxisM', 'Semi-major-axis raise per manoeuvre', 'm', 1),
    numOut('deltaVPerManoeuvreMps', 'ΔV per manoeuvre', 'm/s', 4),
    numOut('deltaVPerYearMps', 'ΔV per year (first year from the start date)', 'm/s', 3),
    numOut('decayMPerDay', 'Semi-major-axis decay rate at the start date', 'm/d', 2),
    numOut('groundTrackDriftKmPerDayPerKm', 'Equator drift rate per km of semi-major-axis offset', 'km/d per km', 3),
  ],
  model: {
    method:
      'Parabolic ground-track drift in a symmetric dead band (linearised drift of Lee, Eun & Webb 1997): the equator crossing drifts at dx/dt = K Δa with K = R⊕ d[(ω⊕ − Ω̇)T_N]/da / T_N (first-order J2), Δa falls at the orbit-averaged decay rate; a raise of 2Δa₀ with Δa₀ = 2√(L|ȧ|/K) makes the track sweep from −L to +L and back, interval 4√(L/(K|ȧ|)), ΔV = n Δa₀ per manoeuvre (two small tangential burns). ΔV per year from the decay rate averaged over 24 dates of the first year at the reference altitude.',
    assumptions: [
      'The decay rate is held constant within one manoeuvre cycle (the interval is given at the start date; it shortens as solar activity rises).',
      'Tangential impulsive manoeuvres, no execution or orbit-determination errors, no inclination (local-time) control; the reference orbit is circular at the given altitude and inclination.',
      ...LIFETIME_NOTE.assumptions,
    ],
    references: [
      'B.-S. Lee, J.-W. Eun and C. E. Webb, Ground track acquisition and maintenance maneuver modeling for low-Earth orbit satellite, Journal of Astronomy and Space Sciences 15(2) (1997) 355–366',
      'Y. Kozai, The motion of a close earth satellite, Astron. J. 64 (1959) 367 (first-order J2 rates)',
      ...LIFETIME_NOTE.references,
    ],
  },
  compute(v) {
    const start = epochDate(v.startEpoch);
    const b = (v.dragCoefficient * v.areaM2) / v.massKg;
    const aKm = semiMajorAxisFromAltitude(v.altitudeKm);
    const source = v.atmosphere === 'exponential' ? undefined : solarSourceOf(v);
    const { orbit } = decayModelOf(v, v.altitudeKm, b, CIRCULAR_SAMPLES, source);
    const decayAt = (date: Date): number =>
      v.atmosphere === 'exponential'
        ? -computeDecayRate(v.altitudeKm, b, v.solarActivity)
        : -computeAveragedRates(aKm, 0, 0, v.ltanHours, date, orbit).dadt;
    const decayNow = decayAt(start);
    let decayYear = 0;
    for (let k = 0; k < YEAR_SAMPLES; k++)
      decayYear += decayAt(new Date(start.getTime() + ((k + 0.5) / YEAR_SAMPLES) * YEAR_S * 1000)) / YEAR_SAMPLES;
    const gain = computeGroundTrackDriftGain(aKm, orbit.inclinationRad);
    const n = computeMeanMotion(aKm);
    const cycle = computeDeadbandCycle(v.deadbandKm, decayNow, gain, n);
    const yearCycle = computeDeadbandCycle(v.deadbandKm, decayYear, gain, n);
    const warnings: string[] = [];
    if (cycle.intervalSeconds < SECONDS_PER_DAY)
      warnings.push('Manoeuvres would be needed more than once a day: widen the dead band or raise the orbit.');
    if (v.atmosphere === 'nrlmsise-00' && Math.abs(decayYear / decayNow - 1) > 0.3)
      warnings.push(
        `The decay rate changes by ${Math.round((decayYear / decayNow - 1) * 100)} % over the first year: the interval at the start date is not representative of the whole year.`,
      );
    return {
      outputs: {
        manoeuvreIntervalDays: cycle.intervalSeconds / SECONDS_PER_DAY,
        deltaSemiMajorAxisM: cycle.deltaSemiMajorAxisKm * 1000,
        deltaVPerManoeuvreMps: cycle.deltaVKmS * 1000,
        deltaVPerYearMps: ((yearCycle.deltaVKmS * YEAR_S) / yearCycle.intervalSeconds) * 1000,
        decayMPerDay: decayNow * SECONDS_PER_DAY * 1000,
        groundTrackDriftKmPerDayPerKm: gain * SECONDS_PER_DAY,
      },
      warnings: [...warnings, ...solarSourceWarnings(v, source)],
    };
  },
});
