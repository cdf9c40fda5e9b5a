/**
 * As flown against the design: the local time of the ascending node and the
 * mean altitude at each TLE epoch of a tle-check block, in two panels over
 * the date, each with the design value as a flat line when the block was
 * given one. The mean altitude is SGP4's (Brouwer mean a − 6378.135 km); the
 * design line is the block's designMeanAltitudeSgp4Km, the design a on the
 * same radius, so the gap shown is the gap in a.
 */
import type { CalcResult } from '@/lib/calc';
import type { FigureKindDefinition } from '../figure-types';
import { axisTitle, PLOT_HEIGHT, stackedFigure } from '../figure-style';
import { readRows, rowDate, rowNumber } from '../read-result';
import { seriesLayers, type SeriesPoint } from '../series-layers';

const FLOWN = 'As flown (TLE)';
const DESIGN = 'Design';

function optionalNumber(result: CalcResult, from: 'inputs' | 'outputs', name: string): number | undefined {
  const v = result[from][name];
  return typeof v === 'number' && Number.isFinite(v) ? v : undefined;
}

/** A flat design line across the dates of the flown points. */
function designLine(series: string, dates: string[], value: number | undefined): SeriesPoint[] {
  return value === undefined || dates.length === 0
    ? []
    : [dates[0], dates[dates.length - 1]].map((x) => ({ series, x, y: value }));
}

export const asFlownLocalTimeAltitude: FigureKindDefinition = {
  kind: 'as-flown-local-time-altitude',
  title: 'As-flown local time and altitude vs design',
  sourceCalcKinds: ['tle-check'],
  build(result) {
    const rows = readRows(result, 'series');
    const dates = rows.map((r) => rowDate(r, 'tle check'));
    const ltan: SeriesPoint[] = rows.map((r, i) => ({
      series: FLOWN,
      x: dates[i],
      y: rowNumber(r, 'ltanHours', 'tle check'),
    }));
    const altitude: SeriesPoint[] = rows.map((r, i) => ({
      series: FLOWN,
      x: dates[i],
      y: rowNumber(r, 'meanAltitudeKm', 'tle check'),
    }));
    const designLtan = optionalNumber(result, 'inputs', 'designLtanHours');
    const designAltitude = optionalNumber(result, 'outputs', 'designMeanAltitudeSgp4Km');
    const date = { title: 'TLE epoch (UTC)', temporal: true };
    const names = (design: number | undefined) => (design === undefined ? [FLOWN] : [FLOWN, DESIGN]);
    return stackedFigure(
      [
        seriesLayers(
          [...ltan, ...designLine(DESIGN, dates, designLtan)],
          names(designLtan),
          { ...date, title: '' },
          { title: axisTitle('LTAN (mean Sun)', 'h') },
          { name: 'ltan' },
        ),
        seriesLayers(
          [...altitude, ...designLine(DESIGN, dates, designAltitude)],
          names(designAltitude),
          date,
          { title: axisTitle('Mean altitude (SGP4)', 'km') },
          { name: 'altitude' },
        ),
      ],
      Math.round(PLOT_HEIGHT * 0.6),
    );
  },
};
