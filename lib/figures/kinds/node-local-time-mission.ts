/**
 * Local time of the node over the mission: the deviation of the node's local time from the reference, month by
 * month, from a solar-inclination-drift block (the parabola solar gravity bends it into), with the tolerance band
 * when the block gives one. When the block's bias is not the optimal one, the parabola with the optimal bias is
 * drawn beside it from a second run of the same kind (never a formula of the figure's own).
 */
import { runCalc, type CalcResult } from '@/lib/calc';
import { FigureDataError, type FigureKindDefinition, type FigureLayer } from '../figure-types';
import { axisTitle, FIGURE_COLOURS, layeredFigure } from '../figure-style';
import { readNumber, readRows, rowNumber } from '../read-result';
import { seriesLayers, type SeriesPoint } from '../series-layers';

const WHAT = 'solar inclination drift';

/** "22:30" from 22.5 h. */
function clock(hours: number): string {
  const total = Math.round((((hours % 24) + 24) % 24) * 60);
  return `${String(Math.floor(total / 60) % 24).padStart(2, '0')}:${String(total % 60).padStart(2, '0')}`;
}

const signed = (v: number, decimals: number) => `${v >= 0 ? '+' : '−'}${Math.abs(v).toFixed(decimals)}`;

function deviationPoints(result: CalcResult, series: string): SeriesPoint[] {
  return readRows(result, 'series').map((r) => ({
    series,
    x: rowNumber(r, 'years', WHAT),
    y: rowNumber(r, 'ltanDeviationMin', WHAT),
  }));
}

/** The tolerance band ±T over the mission, shaded, with its edges dashed. */
function toleranceBand(toleranceMin: number, years: number, x: { title: string }, y: { title: string }): FigureLayer[] {
  const values = [{ x0: 0, x1: years, y0: -toleranceMin, y1: toleranceMin }];
  const edges = [
    { x0: 0, x1: years, y: toleranceMin, label: `+${toleranceMin} min` },
    { x0: 0, x1: years, y: -toleranceMin, label: `−${toleranceMin} min` },
  ];
  return [
    {
      name: 'tolerance_band',
      data: { values },
      mark: { type: 'rect', color: FIGURE_COLOURS.moss, opacity: 0.12 },
      encoding: {
        x: { field: 'x0', type: 'quantitative', title: x.title },
        x2: { field: 'x1' },
        y: { field: 'y0', type: 'quantitative', title: y.title },
        y2: { field: 'y1' },
      },
    },
    {
      name: 'tolerance_edges',
      data: { values: edges },
      mark: { type: 'rule', color: FIGURE_COLOURS.moss, strokeDash: [4, 3], strokeWidth: 1 },
      encoding: {
        x: { field: 'x0', type: 'quantitative' },
        x2: { field: 'x1' },
        y: { field: 'y', type: 'quantitative' },
      },
    },
    {
      name: 'tolerance_labels',
      data: { values: edges },
      mark: { type: 'text', align: 'left', dx: 4, dy: -5, color: FIGURE_COLOURS.moss },
      encoding: {
        x: { field: 'x0', type: 'quantitative' },
        y: { field: 'y', type: 'quantitative' },
        text: { field: 'label' },
      },
    },
  ];
}

export const nodeLocalTimeMission: FigureKindDefinition = {
  kind: 'node-local-time-mission',
  title: 'Local time of the node over the mission',
  sourceCalcKinds: ['solar-inclination-drift'],
  build(result) {
    const ltan = result.inputs.ltanHours;
    const years = result.inputs.years;
    const bias = result.inputs.inclinationBiasDeg;
    if (typeof ltan !== 'number' || typeof years !== 'number' || typeof bias !== 'number')
      throw new FigureDataError(`${WHAT}: the result lacks its local time, mission length or bias inputs`);
    const tolerance = typeof result.inputs.ltanToleranceMin === 'number' ? result.inputs.ltanToleranceMin : undefined;
    const asGiven = bias === 0 ? 'No bias' : `Bias ${signed(bias, 3)}°`;
    const points = deviationPoints(result, asGiven);
    const names = [asGiven];
    if (tolerance !== undefined) {
      const optimal = readNumber(result, 'optimalBiasDeg');
      if (Math.abs(optimal - bias) > 5e-4) {
        const name = `Optimal bias ${signed(optimal, 3)}°`;
        const rerun = runCalc(result.kind, { ...result.inputs, inclinationBiasDeg: optimal });
        if (!rerun.ok) throw new FigureDataError(`${WHAT} with the optimal bias: ${rerun.error}`);
        points.push(...deviationPoints(rerun.result, name));
        names.push(name);
      }
    }
    const x = { title: axisTitle('Time since injection', 'years'), zero: true };
    const y = { title: axisTitle(`Node local time − reference ${clock(ltan)}`, 'min'), zero: true };
    const band = tolerance !== undefined ? toleranceBand(tolerance, years, x, y) : [];
    return layeredFigure([...band, ...seriesLayers(points, names, x, y, { markEvery: 6 })]);
  },
};
