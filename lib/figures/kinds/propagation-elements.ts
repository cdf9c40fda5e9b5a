/**
 * Element histories of a propagation-check block: semi-major axis,
 * inclination and RAAN against time, one panel per element sharing the time
 * axis; the numerical (osculating) history against the analytic J2 secular
 * one wherever the engine provides the analytic column. Columns are found
 * from the kind's descriptor (names and units), so the figure follows the
 * engine's own naming.
 */
import { getCalcKind, type CalcOutputField, type CalcResult } from '@/lib/calc';
import { FigureDataError, type FigureKindDefinition } from '../figure-types';
import { axisTitle, PLOT_HEIGHT, stackedFigure } from '../figure-style';
import { readRows, rowNumber } from '../read-result';
import { seriesLayers, type SeriesPoint } from '../series-layers';

const ELEMENTS = [
  { label: 'Semi-major axis', match: /^(sma|semiMajorAxis)(?=[A-Z_]|$)/ },
  { label: 'Inclination', match: /^(inc|inclination)(?=[A-Z_]|$)/ },
  { label: 'RAAN', match: /^raan(?=[A-Z_]|$)/ },
] as const;
const ANALYTIC = /Analytic|Secular/;
const TIME = /^t(Days|Hours|Min|Sec|S)?$/;

export const NUMERICAL = 'Numerical (osculating)';
export const ANALYTIC_J2 = 'Analytic J2 secular';

export interface ElementColumns {
  rows: string;
  time: CalcOutputField;
  elements: { label: string; numerical: CalcOutputField; analytic?: CalcOutputField }[];
}

/** Which rows output and columns hold time and each element's histories. */
export function findElementColumns(result: CalcResult): ElementColumns {
  const descriptor = getCalcKind(result.kind);
  const rows = descriptor?.outputs.find((o) => o.type === 'rows' && o.columns?.some((c) => TIME.test(c.name)));
  const columns = rows?.columns ?? [];
  const time = columns.find((c) => TIME.test(c.name));
  if (!rows || !time) throw new FigureDataError(`the ${result.kind} kind has no rows output with a time column`);
  const elements = ELEMENTS.map((e) => {
    const matching = columns.filter((c) => e.match.test(c.name));
    const numerical = matching.find((c) => !ANALYTIC.test(c.name));
    if (!numerical) throw new FigureDataError(`the ${result.kind} history has no ${e.label} column`);
    return { label: e.label, numerical, analytic: matching.find((c) => ANALYTIC.test(c.name)) };
  });
  return { rows: rows.name, time, elements };
}

export const propagationElements: FigureKindDefinition = {
  kind: 'propagation-elements',
  title: 'Element histories: numerical against analytic',
  sourceCalcKinds: ['propagation-check'],
  build(result) {
    const cols = findElementColumns(result);
    const rows = readRows(result, cols.rows);
    const markEvery = Math.max(1, Math.round(rows.length / 16));
    const panels = cols.elements.map((e, index) => {
      const names = e.analytic ? [NUMERICAL, ANALYTIC_J2] : [NUMERICAL];
      const points: SeriesPoint[] = rows.flatMap((r) => {
        const t = rowNumber(r, cols.time.name, 'propagation history');
        const own = [{ series: NUMERICAL, x: t, y: rowNumber(r, e.numerical.name, 'propagation history') }];
        return e.analytic
          ? [...own, { series: ANALYTIC_J2, x: t, y: rowNumber(r, e.analytic.name, 'propagation history') }]
          : own;
      });
      const last = index === cols.elements.length - 1;
      const x = { title: last ? axisTitle('Time', cols.time.unit) : '' };
      return seriesLayers(
        points,
        names,
        x,
        { title: axisTitle(e.label, e.numerical.unit) },
        { markEvery, name: `element${index}` },
      );
    });
    return stackedFigure(panels, Math.round(PLOT_HEIGHT * 0.42));
  },
};
