import { enumField, numberField } from '../fields';
import { defineKind } from '../registry';
import { CYCLE_25_DEFAULTS, PREVIOUS_CYCLE, computeSolarActivity, type SolarCycleParameters } from '../topics/solarActivity/solarCycle';
import { epoch, numOut, rowsOut } from './common';
import { epochDate } from './nodeLocalTime';

/** The cycle inputs of a kind (solar-activity and the lifetime kinds share their names) as model parameters. */
export function solarCycleParametersOf(v: {
  cycleStartEpoch: string;
  cycleMaxSunspotNumber: number;
  nextCyclesMaxSunspotNumber: number;
  cyclePeriodYears: number;
  amplitudeSigmaPercent: number;
  apMean: number;
}): SolarCycleParameters {
  return {
    cycleStart: epochDate(v.cycleStartEpoch),
    cycleMaxSunspotNumber: v.cycleMaxSunspotNumber,
    nextCyclesMaxSunspotNumber: v.nextCyclesMaxSunspotNumber,
    cyclePeriodYears: v.cyclePeriodYears,
    amplitudeSigmaPercent: v.amplitudeSigmaPercent,
    apMean: v.apMean,
  };
}

const MAX_SERIES_YEARS = 50;
/** The current cycle must start well after the previous (built-in) one. */
const EARLIEST_CYCLE_START = new Date(Date.UTC(2016, 0, 1));

export const solarActivityKind = defineKind({
  kind: 'solar-activity',
  title: 'Solar activity over time',
  summary: 'F10.7 (daily and 81-day mean) and Ap at a date from a parametric solar-cycle model, with a monthly series for a figure; low/mean/high levels for sensitivity runs.',
  inputs: {
    epoch: epoch('Date (UTC)', '2026-01-01T00:00:00Z'),
    years: numberField('Series length from the date', 'yr', { min: 0.1, max: MAX_SERIES_YEARS, default: 11 }),
    level: enumField('Activity level', ['low', 'mean', 'high'] as const, 'mean', 'low/high: every cycle amplitude (from the current cycle on) −/+ 2σ'),
    cycleStartEpoch: epoch('Current cycle start (minimum)', CYCLE_25_DEFAULTS.cycleStartEpoch),
    cycleMaxSunspotNumber: numberField('Current cycle maximum smoothed sunspot number (version 2)', null, { min: 20, max: 400, default: CYCLE_25_DEFAULTS.cycleMaxSunspotNumber }),
    nextCyclesMaxSunspotNumber: numberField('Later cycles maximum smoothed sunspot number (version 2)', null, { min: 20, max: 400, default: CYCLE_25_DEFAULTS.nextCyclesMaxSunspotNumber }),
    cyclePeriodYears: numberField('Cycle length (minimum to minimum)', 'yr', { min: 8, max: 15, default: CYCLE_25_DEFAULTS.cyclePeriodYears }),
    amplitudeSigmaPercent: numberField('Cycle amplitude uncertainty (1σ)', null, { min: 0, max: 50, default: CYCLE_25_DEFAULTS.amplitudeSigmaPercent, help: 'percent of the amplitude; low/high use ∓ 2σ' }),
    apMean: numberField('Geomagnetic index Ap (daily, held constant)', null, { min: 0, max: 100, default: CYCLE_25_DEFAULTS.apMean }),
  },
  check(v): Record<string, string> {
    const out: Record<string, string> = {};
    const start = epochDate(v.cycleStartEpoch);
    if (start < EARLIEST_CYCLE_START) out.cycleStartEpoch = `cycleStartEpoch: the current cycle must start after ${EARLIEST_CYCLE_START.toISOString().slice(0, 10)} (the previous cycle, from December 2008, is built in)`;
    if (epochDate(v.epoch) < PREVIOUS_CYCLE.start) out.epoch = 'epoch: the cycle model starts at the cycle 24 minimum (December 2008); use your own table for earlier dates';
    return out;
  },
  outputs: [
    numOut('f107', 'F10.7, daily', 'sfu', 1),
    numOut('f107Average', 'F10.7, 81-day mean', 'sfu', 1),
    numOut('ap', 'Ap, daily', null, 1),
    numOut('sunspotNumber', 'Smoothed sunspot number (version 2)', null, 1),
    rowsOut('series', 'Monthly solar activity', [
      { name: 'date', label: 'Date (UTC)', unit: null, precision: 0, type: 'string' },
      numOut('years', 'Years from the date', 'yr', 2),
      numOut('sunspotNumber', 'Smoothed sunspot number', null, 1),
      numOut('f107Average', 'F10.7, 81-day mean', 'sfu', 1),
      numOut('ap', 'Ap', null, 1),
    ]),
  ],
  figures: [{ name: 'solar-flux', title: 'Solar flux F10.7 over time', rows: 'series', x: 'date', y: ['f107Average'] }],
  model: {
    method:
      'Smoothed sunspot number from the cycle shape of Hathaway, Wilson & Reichmann (1994), R = a τ³/(exp(τ²/b²) − 0.71) with b = 27.12 + 25.15/(10³a)^¼ (τ in months from the cycle minimum), summed over overlapping cycles; F10.7 from the Holland & Vaughn (1984) relation F = 67 + 0.97 R + 17.6 (exp(−0.035 R) − 1) with R on the original (version 1) sunspot scale, version 2 = 1.45 × version 1.',
    assumptions: [
      'Cycle 24 is built in (minimum December 2008, maximum smoothed sunspot number 116.4); the current cycle starts at the given minimum (default December 2019, as declared by SIDC) with the given maximum (default 140, which passes within 1 % of SILSO’s smoothed value 124.7 for June 2025); later cycles follow every cycle length with their own maximum.',
      'Levels: low and high scale the amplitudes of the current and later cycles by 1 ∓ 2σ (σ = 10 % by default: Hathaway et al. 1994 find a cycle amplitude determined to within about 10 % at 42 months into the cycle; earlier in a cycle or for cycles not yet begun the uncertainty is larger, so set σ accordingly).',
      'Daily F10.7 is taken equal to the 81-day mean: the model has no 27-day solar rotation or day-to-day variability. Ap is held constant (default 12, within the 13-month smoothed Ap of about 4 at solar minimum to 14 in the declining phase in NASA MSFC solar-cycle prediction tables).',
      'For observed or forecast values use the analyst’s own table instead of this model.',
    ],
    references: [
      'D. H. Hathaway, R. M. Wilson and E. J. Reichmann, The shape of the sunspot cycle, Solar Physics 151 (1994) 177, doi:10.1007/BF00654090',
      'D. H. Hathaway, The Solar Cycle, Living Rev. Solar Phys. 7 (2010) 1, eq. 3 (Holland & Vaughn 1984 F10.7–sunspot relation)',
      'WDC-SILSO, Royal Observatory of Belgium, Sunspot Number Version 2.0: new data and conventions (2015); monthly bulletin of 1 January 2026 (smoothed sunspot number 124.7 for June 2025)',
      'NASA Marshall Space Flight Center, Solar Cycle 25 Status (31 October 2023): cycle 24 maximum 116.4 in April 2014, cycle 25 minimum December 2019',
      'STCE (Royal Observatory of Belgium) news, "Monthly sunspot number exceeds 100!": cycle minima December 2008 and December 2019',
    ],
  },
  compute(v) {
    const date = epochDate(v.epoch);
    const params = solarCycleParametersOf(v);
    const now = computeSolarActivity(date, params, v.level);
    // rows at the date and on the first day of each following month, up to date + years
    const yearMs = 365.25 * 86_400_000;
    const endMs = date.getTime() + v.years * yearMs;
    const series = [];
    for (let m = 0; ; m++) {
      const at = m === 0 ? date : new Date(Date.UTC(date.getUTCFullYear(), date.getUTCMonth() + m, 1));
      if (at.getTime() > endMs) break;
      const s = computeSolarActivity(at, params, v.level);
      series.push({ date: at.toISOString(), years: (at.getTime() - date.getTime()) / yearMs, sunspotNumber: s.sunspotNumber, f107Average: s.f107Average, ap: s.ap });
    }
    const warnings: string[] = [];
    const horizonYears = (endMs - params.cycleStart.getTime()) / yearMs;
    if (v.level !== 'mean' && endMs < params.cycleStart.getTime()) warnings.push(`The ${v.level} level changes only the current and later cycles; these dates lie in the built-in previous cycle, so the level has no effect.`);
    if (horizonYears > params.cyclePeriodYears) warnings.push('The series reaches into cycles that have not begun: their timing and size are assumptions (see the later-cycles maximum and the cycle length).');
    return {
      outputs: { f107: now.f107, f107Average: now.f107Average, ap: now.ap, sunspotNumber: now.sunspotNumber, series },
      warnings,
    };
  },
});
