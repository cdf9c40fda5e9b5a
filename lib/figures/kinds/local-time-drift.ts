/**
 * Drift of the node's local time over the mission caused by injection
 * errors: the injection-sensitivity block's drift rates (min/yr) times
 * elapsed time. J2 secular drift is constant in time, so the lines are
 * straight (no correction manoeuvre assumed).
 */
import type { CalcResult } from '@/lib/calc';
import type { FigureKindDefinition } from '../figure-types';
import { axisTitle, layeredFigure } from '../figure-style';
import { readNumber, readOptionalInput } from '../read-result';
import { seriesLayers, type SeriesPoint } from '../series-layers';

/** Input names under which a block may state the mission duration in years. */
export const MISSION_YEARS_INPUTS = ['missionYears', 'durationYears', 'lifetimeYears', 'designLifeYears'] as const;
export const DEFAULT_MISSION_YEARS = 5;

const SERIES: { output: string; label: (r: CalcResult) => string }[] = [
  {
    output: 'driftFromInclinationMinPerYear',
    label: (r) => errorLabel('Inclination error', r.inputs.inclinationErrorDeg, 'deg'),
  },
  { output: 'driftFromAltitudeMinPerYear', label: (r) => errorLabel('Altitude error', r.inputs.altitudeErrorKm, 'km') },
  { output: 'localTimeDriftMinPerYear', label: () => 'Both errors together' },
];

function errorLabel(what: string, value: unknown, unit: string): string {
  return typeof value === 'number' ? `${what} ${value > 0 ? '+' : ''}${value} ${unit}` : what;
}

/** Samples of drift = rate × t for t = 0 … mission duration in quarter years. */
export function driftSeries(result: CalcResult): { points: SeriesPoint[]; names: string[]; years: number } {
  const years = readOptionalInput(result, MISSION_YEARS_INPUTS, DEFAULT_MISSION_YEARS);
  const steps = Math.max(4, Math.round(years * 4));
  const names: string[] = [];
  const points: SeriesPoint[] = [];
  for (const s of SERIES) {
    const rate = readNumber(result, s.output);
    const name = s.label(result);
    names.push(name);
    for (let k = 0; k <= steps; k++) {
      const t = (years * k) / steps;
      points.push({ series: name, x: t, y: rate * t });
    }
  }
  return { points, names, years };
}

export const localTimeDrift: FigureKindDefinition = {
  kind: 'local-time-drift',
  title: 'Local-time drift from injection errors',
  sourceCalcKinds: ['injection-sensitivity'],
  build(result) {
    const { points, names, years } = driftSeries(result);
    return layeredFigure(
      seriesLayers(
        points,
        names,
        { title: axisTitle('Time since injection', 'years'), zero: true },
        { title: axisTitle('Node local-time drift', 'min'), zero: true },
        { markEvery: Math.max(1, Math.round(years)) },
      ),
    );
  },
};
