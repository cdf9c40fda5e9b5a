/**
 * Altitude decay over time for a drag-decay block.
 *
 * When the block's result carries a decay series (rows of elapsed days and
 * altitude; every result since drag-decay integrates over dates) it is drawn directly. Otherwise the history is rebuilt from the
 * engine's lifetime: the kind's lifetime L(h) is the time to decay from h to
 * its re-entry altitude with density a function of altitude only (no
 * time-varying solar activity), so the time to fall from the initial
 * altitude h0 to h is L(h0) − L(h). The curve is therefore sampled by
 * calling runCalc('drag-decay') at decreasing altitudes with every other
 * input held, down to the kind's lowest accepted altitude or until the
 * lifetime reaches zero.
 */
import { getCalcKind, runCalc, type CalcResult } from '@/lib/calc';
import { FigureDataError, type FigureKindDefinition } from '../figure-types';
import { axisTitle, FIGURE_COLOURS, layeredFigure } from '../figure-style';
import { readNumber, readRows, rowNumber } from '../read-result';

export interface DecayPoint {
  days: number;
  altitudeKm: number;
}

const SAMPLES = 80;
/** Rows outputs and columns a drag-decay history may use. */
const HISTORY = { output: 'series', days: 'days', altitude: 'altitudeKm' } as const;

function lifetimeDaysAt(result: CalcResult, altitudeKm: number): number {
  // only results stored before drag-decay carried a series reach here; they were all the static exponential model
  const outcome = runCalc(result.kind, { atmosphere: 'exponential', ...result.inputs, altitudeKm });
  if (!outcome.ok) throw new FigureDataError(`drag-decay at ${altitudeKm.toFixed(1)} km: ${outcome.error}`);
  return readNumber(outcome.result, 'lifetimeDays');
}

/** The decay history: the engine's own when present, else rebuilt from lifetimes at decreasing altitude. */
export function decayHistory(result: CalcResult): DecayPoint[] {
  if (Array.isArray(result.outputs[HISTORY.output])) {
    return readRows(result, HISTORY.output).map((r) => ({
      days: rowNumber(r, HISTORY.days, 'decay history'),
      altitudeKm: rowNumber(r, HISTORY.altitude, 'decay history'),
    }));
  }
  const h0 = readNumber(result, 'altitudeKm', 'inputs');
  const total = readNumber(result, 'lifetimeDays');
  const lowest = getCalcKind(result.kind)?.inputs.find((f) => f.name === 'altitudeKm')?.min ?? h0;
  const points: DecayPoint[] = [{ days: 0, altitudeKm: h0 }];
  const step = (h0 - lowest) / SAMPLES;
  if (step <= 0) return points;
  for (let k = 1; k <= SAMPLES; k++) {
    const h = h0 - k * step;
    const remaining = lifetimeDaysAt(result, h);
    points.push({ days: total - remaining, altitudeKm: h });
    if (remaining <= 0) break;
  }
  return points;
}

export const altitudeDecay: FigureKindDefinition = {
  kind: 'altitude-decay',
  title: 'Altitude decay over time',
  sourceCalcKinds: ['drag-decay'],
  build(result) {
    const history = decayHistory(result);
    const years = history.map((p) => ({ years: p.days / 365.25, altitudeKm: p.altitudeKm }));
    return layeredFigure([
      {
        name: 'decay',
        data: { values: years },
        mark: { type: 'line', color: FIGURE_COLOURS.orbit, interpolate: 'monotone' },
        encoding: {
          x: { field: 'years', type: 'quantitative', title: axisTitle('Time from the initial altitude', 'years') },
          y: {
            field: 'altitudeKm',
            type: 'quantitative',
            title: axisTitle('Mean altitude', 'km'),
            scale: { zero: false },
          },
        },
      },
    ]);
  },
};
