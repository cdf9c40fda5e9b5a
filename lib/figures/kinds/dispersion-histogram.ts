/**
 * Distribution of the node local-time drift from an injection-dispersion block: the Monte-Carlo histogram as bars,
 * the normal curve of the samples' mean and standard deviation scaled to counts (count per bin = N · width · φ), and
 * the ±99.73 % drift values as dashed rules. Every number comes from the block's result.
 */
import type { UnitSpec } from 'vega-lite/types_unstable/spec/index.js';
import { FigureDataError, type FigureAxis, type FigureKindDefinition } from '../figure-types';
import { axisTitle, FIGURE_COLOURS, layeredFigure } from '../figure-style';
import { readNumber, readRows, rowNumber } from '../read-result';

const WHAT = 'injection dispersion';
/** Points of the normal curve across the histogram. */
const CURVE_POINTS = 121;

export const dispersionHistogram: FigureKindDefinition = {
  kind: 'dispersion-histogram',
  title: 'Dispersion histogram of the local-time drift',
  sourceCalcKinds: ['injection-dispersion'],
  build(result) {
    const rows = readRows(result, 'histogram');
    if (rows.length === 0) throw new FigureDataError(`${WHAT}: the result has no histogram bins`);
    const bins = rows.map((r) => ({
      from: rowNumber(r, 'binLowMinPerYear', WHAT),
      to: rowNumber(r, 'binHighMinPerYear', WHAT),
      count: rowNumber(r, 'count', WHAT),
    }));
    const samples = bins.reduce((s, b) => s + b.count, 0);
    const width = bins[0].to - bins[0].from;
    const mean = readNumber(result, 'meanDriftMinPerYear');
    const sigma = readNumber(result, 'ltanDriftSigmaMinPerYear');
    const p997 = readNumber(result, 'ltanDriftP997MinPerYear');
    const lo = bins[0].from;
    const hi = bins[bins.length - 1].to;
    const curve =
      sigma > 0
        ? Array.from({ length: CURVE_POINTS }, (_, k) => {
            const x = lo + ((hi - lo) * k) / (CURVE_POINTS - 1);
            const z = (x - mean) / sigma;
            return { x, count: (samples * width * Math.exp(-0.5 * z * z)) / (sigma * Math.sqrt(2 * Math.PI)) };
          })
        : [];
    const x: FigureAxis = {
      field: 'from',
      type: 'quantitative',
      title: axisTitle('Node local-time drift', 'min/yr'),
      scale: { domain: [lo, hi], nice: false },
    };
    const y: FigureAxis = { field: 'count', type: 'quantitative', title: axisTitle('Samples per bin', null) };
    const bars: UnitSpec<string> = {
      name: 'bins',
      data: { values: bins },
      mark: {
        type: 'rect',
        fill: FIGURE_COLOURS.orbit,
        fillOpacity: 0.35,
        stroke: FIGURE_COLOURS.orbit,
        strokeWidth: 0.5,
      },
      encoding: { x, x2: { field: 'to' }, y, y2: { datum: 0 } },
    };
    const normal: UnitSpec<string> = {
      name: 'normal_curve',
      data: { values: curve },
      mark: { type: 'line', color: FIGURE_COLOURS.ember, strokeWidth: 1.2 },
      encoding: { x: { ...x, field: 'x' }, y },
    };
    const limits: UnitSpec<string> = {
      name: 'p997_limits',
      data: { values: [{ x: -p997 }, { x: p997 }] },
      mark: { type: 'rule', color: FIGURE_COLOURS.sunline, strokeDash: [6, 3], strokeWidth: 1 },
      encoding: { x: { ...x, field: 'x' } },
    };
    const labels: UnitSpec<string> = {
      name: 'p997_labels',
      data: { values: [{ x: p997, label: `99.73 %: ±${p997.toFixed(2)} min/yr` }] },
      mark: {
        type: 'text',
        align: 'right',
        baseline: 'top',
        dx: -4,
        dy: 3,
        fontSize: 9,
        color: FIGURE_COLOURS.inkSoft,
      },
      encoding: { x: { ...x, field: 'x' }, y: { value: 0 }, text: { field: 'label' } },
    };
    return layeredFigure([bars, normal, limits, labels]);
  },
};
