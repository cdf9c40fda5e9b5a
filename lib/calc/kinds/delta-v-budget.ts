import { numberField } from '../fields';
import { defineKind } from '../registry';
import type { OutputRow } from '../types';
import { numOut, rowsOut } from './common';

const MPS = { min: 0, max: 10_000, default: 0 } as const;

/** "4.27 m/s per year × 5 years" */
const perYearBasis = (perYear: number, years: number) =>
  `${perYear.toFixed(2)} m/s per year × ${Number(years.toPrecision(4))} ${years === 1 ? 'year' : 'years'}`;

/**
 * The mission's ΔV budget: one line per manoeuvre class, a margin on their sum and the total. Every line is an input
 * that the memo feeds from the block that computes it (injection correction, inclination drift, altitude maintenance,
 * disposal), so the PDF and the editor show beside each number the block it came from. Pure arithmetic. The table
 * holds the five lines (the PDF shows five rows of a table); the total is an output of its own.
 */
export const deltaVBudgetKind = defineKind({
  kind: 'delta-v-budget',
  title: 'ΔV budget',
  summary:
    "The mission's ΔV table: injection correction, inclination hold or bias, altitude maintenance over the mission, disposal, and a margin — each line fed from the block that computes it.",
  inputs: {
    injectionCorrectionMps: numberField('Injection correction for 3-sigma errors', 'm/s', {
      ...MPS,
      help: 'e.g. the plane-change ΔV of injection-sensitivity at the 3σ inclination error',
    }),
    inclinationHoldMpsPerYear: numberField('Inclination hold, per year', 'm/s', {
      ...MPS,
      help: 'e.g. solar-inclination-drift inclinationHoldDeltaVMpsPerYear; 0 when the local time is kept by an injection bias',
    }),
    inclinationTrimMps: numberField('Inclination bias or one-off trim', 'm/s', {
      ...MPS,
      help: 'A single inclination manoeuvre (e.g. a mid-life re-bias), counted once',
    }),
    altitudeMaintenanceMpsPerYear: numberField('Altitude maintenance, per year', 'm/s', {
      ...MPS,
      help: 'e.g. altitude-maintenance deltaVPerYearMps',
    }),
    missionYears: numberField('Mission length', 'yr', { min: 0.1, max: 30, default: 5 }),
    disposalMps: numberField('Disposal', 'm/s', { ...MPS, help: 'e.g. disposal-compliance deorbitDeltaVMps' }),
    marginPercent: numberField('Margin (percent of the sum of the lines)', null, { min: 0, max: 200, default: 10 }),
  },
  outputs: [
    numOut('injectionCorrectionMps', 'Injection correction (3σ)', 'm/s', 2),
    numOut('inclinationMps', 'Inclination hold over the mission, or bias/trim', 'm/s', 2),
    numOut('altitudeMaintenanceMps', 'Altitude maintenance over the mission', 'm/s', 2),
    numOut('disposalMps', 'Disposal', 'm/s', 2),
    numOut('subtotalMps', 'Sum of the lines', 'm/s', 2),
    numOut('marginMps', 'Margin', 'm/s', 2),
    numOut('totalDeltaVMps', 'Total ΔV with margin', 'm/s', 2),
    rowsOut('table', 'ΔV budget lines (the total is among the results)', [
      { name: 'line', label: 'Line', unit: null, precision: 0, type: 'string' },
      { name: 'basis', label: 'Basis', unit: null, precision: 0, type: 'string' },
      numOut('deltaVMps', 'ΔV', 'm/s', 2),
    ]),
  ],
  model: {
    method:
      'Sum of the lines: injection correction + (inclination hold per year × mission length + one-off inclination trim) + altitude maintenance per year × mission length + disposal; margin = percent × sum; total = sum + margin.',
    assumptions: [
      'Each line is taken as given (typed, or fed from the block that computes it, named beside the input); the lines are added, not combined statistically.',
      'Yearly lines are multiplied by the mission length: a yearly figure taken at the start of the mission (e.g. at a solar minimum) can understate later years.',
      "Impulsive ΔV; propellant mass follows from the rocket equation with the thrusters' specific impulse, outside this budget.",
    ],
    references: [
      "The lines' own methods and references: injection-sensitivity, solar-inclination-drift, altitude-maintenance and disposal-compliance (each fed block names them)",
    ],
  },
  compute(v) {
    const inclinationMps = v.inclinationHoldMpsPerYear * v.missionYears + v.inclinationTrimMps;
    const altitudeMaintenanceMps = v.altitudeMaintenanceMpsPerYear * v.missionYears;
    const subtotalMps = v.injectionCorrectionMps + inclinationMps + altitudeMaintenanceMps + v.disposalMps;
    const marginMps = (subtotalMps * v.marginPercent) / 100;
    const inclinationBasis = [
      v.inclinationHoldMpsPerYear > 0 ? perYearBasis(v.inclinationHoldMpsPerYear, v.missionYears) : '',
      v.inclinationTrimMps > 0 ? `one trim of ${v.inclinationTrimMps.toFixed(2)} m/s` : '',
    ]
      .filter(Boolean)
      .join(' + ');
    const table: OutputRow[] = [
      { line: 'Injection correction (3σ)', basis: 'once, after injection', deltaVMps: v.injectionCorrectionMps },
      {
        line: 'Inclination hold or bias',
        basis: inclinationBasis || 'none (local time kept by the injection bias)',
        deltaVMps: inclinationMps,
      },
      {
        line: 'Altitude maintenance',
        basis: perYearBasis(v.altitudeMaintenanceMpsPerYear, v.missionYears),
        deltaVMps: altitudeMaintenanceMps,
      },
      { line: 'Disposal', basis: 'once, at end of life', deltaVMps: v.disposalMps },
      { line: 'Margin', basis: `${v.marginPercent} % of ${subtotalMps.toFixed(2)} m/s`, deltaVMps: marginMps },
    ];
    const warnings: string[] = [];
    if (v.inclinationHoldMpsPerYear > 0 && v.inclinationTrimMps > 0)
      warnings.push(
        'Both an inclination hold per year and a one-off trim are counted: with an injection bias the yearly hold is usually not needed.',
      );
    return {
      outputs: {
        injectionCorrectionMps: v.injectionCorrectionMps,
        inclinationMps,
        altitudeMaintenanceMps,
        disposalMps: v.disposalMps,
        subtotalMps,
        marginMps,
        totalDeltaVMps: subtotalMps + marginMps,
        table,
      },
      warnings,
    };
  },
});
