/**
 * Input fields and model set-up shared by the kinds that integrate drag decay over dates
 * (drag-decay, disposal-compliance, altitude-maintenance): the atmosphere, the solar-activity source
 * (the solar-activity kind's cycle inputs, or constant F10.7/Ap) and the orbit's plane and local time.
 */
import { enumField, inFrame, numberField } from '../fields';
import { toRad } from '../topics/angles';
import { ATMOSPHERE_REF } from '../topics/atmosphere/sources';
import type { DecayOrbit } from '../topics/orbit-lifetime/averaged-decay';
import { nrlmsiseDensityModel, tableDensityModel, type SolarSource } from '../topics/orbit-lifetime/density-models';
import { REENTRY_ALTITUDE_KM, TABLE_TOP_KM, type SolarActivity } from '../topics/drag-lifetime';
import { CYCLE_25_DEFAULTS, PREVIOUS_CYCLE } from '../topics/solar-activity/solar-cycle';
import { semiMajorAxisFromAltitude, solveSsoInclination } from '../topics/sun-synchronous';
import { epoch, ltanHours } from './common';
import { epochDate } from './node-local-time';
import {
  checkSolarTable,
  SOLAR_TABLE_FIELD,
  SOLAR_CYCLE_FIELDS,
  SOLAR_TABLE_FIELDS,
  solarCycleParametersOf,
  solarTableRows,
  solarTableWarnings,
  tableSolarSource,
} from './solar-activity';

/** Re-entry altitude of the NRLMSISE-00 path [km] (perigee); the exponential path keeps its 200 km end point. */
export const NRLMSISE_REENTRY_KM = 120;
/** Orbit-average density samples per revolution (circular orbits) — see the brute-force check in the tests. */
export const CIRCULAR_SAMPLES = 12;
/** Longest span integrated when reporting a lifetime [years]. */
export const LIFETIME_HORIZON_YEARS = 100;

export const ATMOSPHERES = ['nrlmsise-00', 'exponential'] as const;
export type Atmosphere = (typeof ATMOSPHERES)[number];

const EARLIEST_CYCLE_START = new Date(Date.UTC(2016, 0, 1));

/** Fields of the atmosphere and solar-activity source; `startLabel` names the date the integration starts. */
export function lifetimeFields(startLabel: string, startDefault = '2026-01-01T00:00:00Z') {
  return {
    atmosphere: enumField(
      'Atmosphere model',
      ATMOSPHERES,
      'nrlmsise-00',
      'nrlmsise-00: orbit-averaged NRLMSISE-00 over dates (re-entry at 120 km); exponential: static tables, no dates (re-entry at 200 km)',
    ),
    solarActivity: enumField(
      'Solar activity',
      ['low', 'moderate', 'high'] as const,
      'moderate',
      'nrlmsise-00 with the cycle source: cycle amplitude −2σ / mean / +2σ; exponential: MSISE-90 low table / Vallado Table 8-4 / MSISE-90 high table',
    ),
    startEpoch: epoch(startLabel, startDefault),
    inclinationDeg: inFrame(
      numberField('Inclination', 'deg', {
        min: 0,
        max: 180,
        optional: true,
        help: 'empty ⇒ sun-synchronous at the altitude',
      }),
      'TOD',
    ),
    ltanHours: ltanHours(10.5),
    solarFlux: enumField(
      'Solar flux source',
      ['cycle', 'constant', 'table'] as const,
      'cycle',
      'cycle: the solar-activity model over dates; constant: the F10.7 and Ap below at every date; table: the analyst’s table (last inputs)',
    ),
    f107: numberField('F10.7 (constant source)', 'sfu', { min: 60, max: 400, default: 150 }),
    apMean: numberField('Geomagnetic index Ap (daily, held constant)', null, {
      min: 0,
      max: 100,
      default: CYCLE_25_DEFAULTS.apMean,
    }),
    ...SOLAR_CYCLE_FIELDS,
    ...SOLAR_TABLE_FIELDS,
  };
}

export interface LifetimeInputs {
  atmosphere: Atmosphere;
  solarActivity: SolarActivity;
  startEpoch: string;
  inclinationDeg?: number;
  ltanHours: number;
  solarFlux: 'cycle' | 'constant' | 'table';
  solarActivityTableCsv?: string;
  beyondTable: 'refuse' | 'cycle';
  f107: number;
  apMean: number;
  cycleStartEpoch: string;
  cycleMaxSunspotNumber: number;
  nextCyclesMaxSunspotNumber: number;
  cyclePeriodYears: number;
  amplitudeSigmaPercent: number;
}

/** Cross-field checks of the solar source (the cycle model starts at the cycle 24 minimum). */
/** Mass, mean drag area and drag coefficient: the spacecraft inputs of every drag kind (mass label may say when). */
export function spacecraftDragFields(massLabel = 'Mass') {
  return {
    massKg: numberField(massLabel, 'kg', { min: 0.1, max: 1e6, default: 100 }),
    areaM2: numberField('Mean drag area', 'm^2', { min: 0.001, max: 1e4, default: 1 }),
    dragCoefficient: numberField('Drag coefficient', null, { min: 1, max: 4, default: 2.2 }),
  };
}

/**
 * Cross-field checks shared by the lifetime kinds: dates the solar-cycle model covers, and (with `altitudeKm`) an
 * altitude inside the exponential atmosphere's density table.
 */
export function checkLifetimeInputs(v: LifetimeInputs, altitudeKm?: number): Record<string, string> {
  const out: Record<string, string> = {};
  const top = TABLE_TOP_KM[v.solarActivity];
  if (v.atmosphere === 'exponential' && altitudeKm !== undefined && altitudeKm > top)
    out.altitudeKm = `altitudeKm: the ${v.solarActivity} solar-activity density table ends at ${top} km`;
  if (v.atmosphere !== 'nrlmsise-00') return out;
  Object.assign(out, checkSolarTable(v));
  if (v.solarFlux === 'table' && !out[SOLAR_TABLE_FIELD]) {
    const rows = solarTableRows(v.solarActivityTableCsv);
    const start = epochDate(v.startEpoch);
    const [first, last] = [rows[0].date, rows[rows.length - 1].date];
    if (v.beyondTable === 'refuse' && (start < first || start > last)) {
      out.startEpoch = `startEpoch: ${v.startEpoch} is outside the solar-activity table (${first.toISOString().slice(0, 10)} to ${last.toISOString().slice(0, 10)}); extend the table, or set "dates outside the table" to cycle`;
    }
  }
  // the cycle model's own limits, where it is used (its source, or outside the analyst's table on request)
  if (!(v.solarFlux === 'cycle' || (v.solarFlux === 'table' && v.beyondTable === 'cycle'))) return out;
  if (epochDate(v.startEpoch) < PREVIOUS_CYCLE.start)
    out.startEpoch =
      'startEpoch: the solar-cycle model starts at the cycle 24 minimum (December 2008); use the constant solar flux source for earlier dates';
  if (epochDate(v.cycleStartEpoch) < EARLIEST_CYCLE_START)
    out.cycleStartEpoch = `cycleStartEpoch: the current cycle must start after ${EARLIEST_CYCLE_START.toISOString().slice(0, 10)} (the previous cycle, from December 2008, is built in)`;
  return out;
}

export function solarSourceOf(v: LifetimeInputs): SolarSource {
  if (v.solarFlux === 'constant')
    return { kind: 'constant', weather: { f107: v.f107, f107Average: v.f107, ap: v.apMean } };
  const cycle = {
    level: v.solarActivity === 'moderate' ? 'mean' : v.solarActivity,
    parameters: solarCycleParametersOf(v),
  } as const;
  if (v.solarFlux === 'table') return tableSolarSource(v, cycle);
  return { kind: 'cycle', ...cycle };
}

/** Warnings of the solar-activity source of a finished run (table pasted but not used; cycle model used outside it). */
export function solarSourceWarnings(v: LifetimeInputs, source: SolarSource | undefined): string[] {
  if (v.atmosphere === 'exponential')
    return (v.solarActivityTableCsv ?? '').trim() !== ''
      ? ['The exponential atmosphere has no dates: the solar-activity table is not used.']
      : [];
  return solarTableWarnings(v, source);
}

/** Inclination [rad]: the given one, else sun-synchronous at the altitude. */
export function inclinationRadOf(v: { inclinationDeg?: number }, altitudeKm: number): number {
  return v.inclinationDeg !== undefined
    ? toRad(v.inclinationDeg)
    : solveSsoInclination(semiMajorAxisFromAltitude(altitudeKm), 0);
}

/** The decay model of the inputs for a spacecraft of ballistic term bM2PerKg, and its re-entry altitude. */
export function decayModelOf(
  v: LifetimeInputs,
  altitudeKm: number,
  bM2PerKg: number,
  samples = CIRCULAR_SAMPLES,
  source?: SolarSource,
): { orbit: DecayOrbit; reentryAltitudeKm: number } {
  const density =
    v.atmosphere === 'exponential'
      ? tableDensityModel(v.solarActivity)
      : nrlmsiseDensityModel(source ?? solarSourceOf(v));
  return {
    orbit: { bM2PerKg, inclinationRad: inclinationRadOf(v, altitudeKm), ltanHours: v.ltanHours, density, samples },
    reentryAltitudeKm: v.atmosphere === 'exponential' ? REENTRY_ALTITUDE_KM : NRLMSISE_REENTRY_KM,
  };
}

/** Model-note sentences shared by the kinds that integrate over dates. */
export const LIFETIME_NOTE = {
  method:
    'Orbit-averaged decay integrated over dates: Gauss’s equations for tangential drag, da/dt = 2a²vT/μ and de/dt = 2(e + cos ν)T/v with T = −½ρv²C_D A/m, averaged over one revolution with the density sampled at 12 points around a circular orbit (24 on the eccentric disposal orbit) at each point’s altitude, latitude and local solar time (from the node’s local time); for a circular orbit this is King-Hele’s da/dt = −⟨ρ⟩ (C_D A/m) √(μa). Heun steps of at most 15 days and 2 km, re-entry when the perigee reaches 120 km.',
  assumptions: [
    'Atmosphere nrlmsise-00: NRLMSISE-00 total mass density with F10.7 and Ap from the solar-activity model at the chosen level, constant values, or the analyst’s table (linear in time between its rows; dates outside it refused unless the analyst asks for the cycle model there); exponential: the static tables of the original drag-decay (Vallado Table 8-4 / MSISE-90), no dates, re-entry at 200 km.',
    'Lifetimes are estimates: the future solar flux is the largest uncertainty (a factor of several in density over a cycle), then geomagnetic storms, the drag coefficient and the attitude-dependent area; compare the low and high levels.',
    'Limits: 120–1000 km; near-circular orbits (the eccentric form serves the disposal orbit, e below about 0.1); the 12 samples of one orbit average are taken at one instant; F10.7 from the cycle model is interpolated between 30-day nodes; no storms (Ap constant).',
    'Constant drag area and coefficient, no atmospheric rotation or winds, no solar radiation pressure or third-body effects on perigee; the mean altitude is measured from the equatorial radius.',
  ],
  references: [
    'D. G. King-Hele, Methods for predicting satellite orbital lifetimes, Royal Aircraft Establishment Technical Report 77111 (1977)',
    ATMOSPHERE_REF.picone2002,
    'D. H. Hathaway, R. M. Wilson and E. J. Reichmann, The shape of the sunspot cycle, Solar Physics 151 (1994) 177 (the solar-cycle model of the solar activity)',
  ],
};
