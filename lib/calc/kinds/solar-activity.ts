import { enumField, numberField, textField } from '../fields';
import { defineKind } from '../registry';
import { CalcInputError } from '../types';
import {
  parseSolarActivityTable,
  SOLAR_TABLE_MAX_CHARS,
  type SolarActivityRow,
  type SolarTableParse,
} from '../topics/solar-activity/parse-solar-activity-table';
import {
  CYCLE_25_DEFAULTS,
  PREVIOUS_CYCLE,
  computeSolarActivity,
  type SolarActivityLevel,
  type SolarCycleParameters,
} from '../topics/solar-activity/solar-cycle';
import { weatherAt, type SolarSource } from '../topics/orbit-lifetime/density-models';
import { epoch, numOut, rowsOut } from './common';
import { epochDate } from './node-local-time';

export const SOLAR_TABLE_FIELD = 'solarActivityTableCsv';

/** The analyst's own solar-activity table (pasted CSV) and what to do at dates outside it. */
export const SOLAR_TABLE_FIELDS = {
  solarActivityTableCsv: textField('Solar-activity table (CSV: date, f107, f107Average, ap)', {
    maxLength: SOLAR_TABLE_MAX_CHARS,
    help: 'one row per date: ISO date, daily F10.7 (sfu), 81-day mean F10.7 (sfu), daily Ap; optional header line, # comments; dates increasing; used when the solar flux source is table',
  }),
  beyondTable: enumField(
    'Dates outside the table',
    ['refuse', 'cycle'] as const,
    'refuse',
    'refuse: a date outside the table is an error; cycle: the solar-cycle model (inputs below) outside the table, with a warning',
  ),
};

export interface SolarTableInputs {
  solarFlux: string;
  solarActivityTableCsv?: string;
  beyondTable: 'refuse' | 'cycle';
}

/** Parses of recent tables (a lifetime search builds many density models from the same text). */
const PARSED = new Map<string, SolarTableParse>();
const PARSED_KEPT = 8;

function parseCached(text: string): SolarTableParse {
  let parsed = PARSED.get(text);
  if (!parsed) {
    parsed = parseSolarActivityTable(text);
    if (PARSED.size >= PARSED_KEPT) PARSED.delete(PARSED.keys().next().value as string);
    PARSED.set(text, parsed);
  }
  return parsed;
}

/** Field errors of the table source: missing or malformed table (with its line and reason). */
export function checkSolarTable(v: SolarTableInputs): Record<string, string> {
  if (v.solarFlux !== 'table') return {};
  const text = v.solarActivityTableCsv ?? '';
  if (text.trim() === '')
    return {
      [SOLAR_TABLE_FIELD]: `${SOLAR_TABLE_FIELD}: the solar flux source is table, but no table is given; paste the CSV (date, f107, f107Average, ap) or choose another source`,
    };
  const parsed = parseCached(text);
  return parsed.ok ? {} : { [SOLAR_TABLE_FIELD]: `${SOLAR_TABLE_FIELD}: line ${parsed.line}: ${parsed.reason}` };
}

/** The rows of a table that checkSolarTable accepted. */
export function solarTableRows(text: string | undefined): SolarActivityRow[] {
  const parsed = parseCached(text ?? '');
  if (!parsed.ok) throw new CalcInputError(SOLAR_TABLE_FIELD, `line ${parsed.line}: ${parsed.reason}`);
  return parsed.rows;
}

/** The table source of the inputs, with the cycle model outside the table when the analyst asked for it. */
export function tableSolarSource(
  v: SolarTableInputs,
  cycle: { parameters: SolarCycleParameters; level: SolarActivityLevel },
): SolarSource {
  return {
    kind: 'table',
    rows: solarTableRows(v.solarActivityTableCsv),
    field: SOLAR_TABLE_FIELD,
    outside: {},
    ...(v.beyondTable === 'cycle' ? { beyond: { kind: 'cycle', ...cycle } } : {}),
  };
}

const isoDay = (d: Date) => d.toISOString().slice(0, 10);

/** Warnings about the table: pasted but not used, or the cycle model used outside it (and where). */
export function solarTableWarnings(v: SolarTableInputs, source: SolarSource | undefined): string[] {
  const out: string[] = [];
  if (v.solarFlux !== 'table' && (v.solarActivityTableCsv ?? '').trim() !== '')
    out.push(
      `A solar-activity table is pasted but not used: the solar flux source is ${v.solarFlux}; choose table to use it.`,
    );
  if (source?.kind === 'table' && source.outside.first && source.outside.last) {
    const rows = source.rows;
    out.push(
      `From ${isoDay(source.outside.first)} to ${isoDay(source.outside.last)}, outside the solar-activity table (${isoDay(rows[0].date)} to ${isoDay(rows[rows.length - 1].date)}), F10.7 and Ap come from the solar-cycle model, as asked (dates outside the table: cycle).`,
    );
  }
  return out;
}

/** The parameters of the solar-cycle model, as inputs (solar-activity and the lifetime kinds share them). */
export const SOLAR_CYCLE_FIELDS = {
  cycleStartEpoch: epoch('Current cycle start (minimum)', CYCLE_25_DEFAULTS.cycleStartEpoch),
  cycleMaxSunspotNumber: numberField('Current cycle maximum smoothed sunspot number (version 2)', null, {
    min: 20,
    max: 400,
    default: CYCLE_25_DEFAULTS.cycleMaxSunspotNumber,
  }),
  nextCyclesMaxSunspotNumber: numberField('Later cycles maximum smoothed sunspot number (version 2)', null, {
    min: 20,
    max: 400,
    default: CYCLE_25_DEFAULTS.nextCyclesMaxSunspotNumber,
  }),
  cyclePeriodYears: numberField('Cycle length (minimum to minimum)', 'yr', {
    min: 8,
    max: 15,
    default: CYCLE_25_DEFAULTS.cyclePeriodYears,
  }),
  amplitudeSigmaPercent: numberField('Cycle amplitude uncertainty (1σ)', null, {
    min: 0,
    max: 50,
    default: CYCLE_25_DEFAULTS.amplitudeSigmaPercent,
    help: 'percent of the amplitude; low/high use ∓ 2σ',
  }),
};

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
const YEAR_MS = 365.25 * 86_400_000;
/** The current cycle must start well after the previous (built-in) one. */
const EARLIEST_CYCLE_START = new Date(Date.UTC(2016, 0, 1));

export const solarActivityKind = defineKind({
  kind: 'solar-activity',
  title: 'Solar activity over time',
  summary:
    'F10.7 (daily and 81-day mean) and Ap at a date from a parametric solar-cycle model, with a monthly series for a figure; low/mean/high levels for sensitivity runs.',
  inputs: {
    epoch: epoch('Date (UTC)', '2026-01-01T00:00:00Z'),
    years: numberField('Series length from the date', 'yr', { min: 0.1, max: MAX_SERIES_YEARS, default: 11 }),
    level: enumField(
      'Activity level',
      ['low', 'mean', 'high'] as const,
      'mean',
      'low/high: every cycle amplitude (from the current cycle on) −/+ 2σ',
    ),
    ...SOLAR_CYCLE_FIELDS,
    apMean: numberField('Geomagnetic index Ap (daily, held constant)', null, {
      min: 0,
      max: 100,
      default: CYCLE_25_DEFAULTS.apMean,
    }),
    solarFlux: enumField(
      'Solar flux source',
      ['cycle', 'table'] as const,
      'cycle',
      'cycle: the solar-cycle model above; table: the analyst’s table below (dates outside it refused unless asked otherwise)',
    ),
    ...SOLAR_TABLE_FIELDS,
  },
  check(v): Record<string, string> {
    const out: Record<string, string> = checkSolarTable(v);
    if (v.solarFlux === 'table' && v.beyondTable === 'refuse') return out;
    const start = epochDate(v.cycleStartEpoch);
    if (start < EARLIEST_CYCLE_START)
      out.cycleStartEpoch = `cycleStartEpoch: the current cycle must start after ${EARLIEST_CYCLE_START.toISOString().slice(0, 10)} (the previous cycle, from December 2008, is built in)`;
    if (epochDate(v.epoch) < PREVIOUS_CYCLE.start)
      out.epoch =
        'epoch: the cycle model starts at the cycle 24 minimum (December 2008); use your own table for earlier dates';
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
      'For observed or forecast values use the analyst’s own table instead of this model (solar flux source: table): CSV rows of date, daily F10.7, 81-day mean F10.7 and daily Ap, interpolated linearly in time between rows; dates outside the table are refused unless the analyst asks for the cycle model there (then a warning names the dates).',
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
    if (v.solarFlux === 'table')
      return tableActivity(v, date, tableSolarSource(v, { parameters: params, level: v.level }));
    const now = computeSolarActivity(date, params, v.level);
    // rows at the date and on the first day of each following month, up to date + years
    const endMs = date.getTime() + v.years * YEAR_MS;
    const series = monthlyDates(date, v.years).map((at) => {
      const s = computeSolarActivity(at, params, v.level);
      return {
        date: at.toISOString(),
        years: (at.getTime() - date.getTime()) / YEAR_MS,
        sunspotNumber: s.sunspotNumber,
        f107Average: s.f107Average,
        ap: s.ap,
      };
    });
    const warnings: string[] = [];
    const horizonYears = (endMs - params.cycleStart.getTime()) / YEAR_MS;
    if (v.level !== 'mean' && endMs < params.cycleStart.getTime())
      warnings.push(
        `The ${v.level} level changes only the current and later cycles; these dates lie in the built-in previous cycle, so the level has no effect.`,
      );
    if (horizonYears > params.cyclePeriodYears)
      warnings.push(
        'The series reaches into cycles that have not begun: their timing and size are assumptions (see the later-cycles maximum and the cycle length).',
      );
    return {
      outputs: { f107: now.f107, f107Average: now.f107Average, ap: now.ap, sunspotNumber: now.sunspotNumber, series },
      warnings: [...warnings, ...solarTableWarnings(v, undefined)],
    };
  },
});

/** First day of each month after `date` (and `date` itself) up to date + years. */
function monthlyDates(date: Date, years: number): Date[] {
  const endMs = date.getTime() + years * YEAR_MS;
  const out: Date[] = [];
  for (let m = 0; ; m++) {
    const at = m === 0 ? date : new Date(Date.UTC(date.getUTCFullYear(), date.getUTCMonth() + m, 1));
    if (at.getTime() > endMs) return out;
    out.push(at);
  }
}

/** The solar-activity outputs from the analyst's table (no sunspot number: the table carries none). */
function tableActivity(v: { years: number } & SolarTableInputs, date: Date, source: SolarSource) {
  const now = weatherAt(source, date);
  const series = monthlyDates(date, v.years).map((at) => {
    const w = weatherAt(source, at);
    return {
      date: at.toISOString(),
      years: (at.getTime() - date.getTime()) / YEAR_MS,
      f107Average: w.f107Average,
      ap: w.ap,
    };
  });
  return {
    outputs: { f107: now.f107, f107Average: now.f107Average, ap: now.ap, series },
    warnings: [
      'The sunspot number is not given: the analyst’s table carries F10.7 and Ap only.',
      ...solarTableWarnings(v, source),
    ],
  };
}
