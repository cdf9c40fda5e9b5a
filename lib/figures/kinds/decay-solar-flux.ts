/**
 * Mean altitude over the dates of a drag-decay block, with the solar flux F10.7 (81-day mean) that drove it in a
 * second panel sharing the date axis. Needs the NRLMSISE-00 path (the exponential tables have no solar flux).
 */
import { FigureDataError, type FigureKindDefinition } from '../figure-types';
import { axisTitle, PLOT_HEIGHT, stackedFigure } from '../figure-style';
import { readRows, rowDate, rowNumber } from '../read-result';
import { seriesLayers, type SeriesPoint } from '../series-layers';

const ALTITUDE = 'Mean altitude';
const FLUX = 'F10.7, 81-day mean';

export const decaySolarFlux: FigureKindDefinition = {
  kind: 'decay-solar-flux',
  title: 'Decay over dates with the solar flux',
  sourceCalcKinds: ['drag-decay'],
  build(result) {
    const rows = readRows(result, 'series');
    if (rows.length < 2 || rows.some((r) => typeof r.f107Average !== 'number')) {
      throw new FigureDataError(
        'drag decay: this figure needs the decay over dates (atmosphere nrlmsise-00); the exponential tables carry no solar flux',
      );
    }
    const altitude: SeriesPoint[] = rows.map((r) => ({
      series: ALTITUDE,
      x: rowDate(r, 'drag decay'),
      y: rowNumber(r, 'altitudeKm', 'drag decay'),
    }));
    const flux: SeriesPoint[] = rows.map((r) => ({
      series: FLUX,
      x: rowDate(r, 'drag decay'),
      y: rowNumber(r, 'f107Average', 'drag decay'),
    }));
    const markEvery = Math.max(1, Math.round(rows.length / 24));
    const date = { title: 'Date (UTC)', temporal: true };
    return stackedFigure(
      [
        seriesLayers(
          altitude,
          [ALTITUDE],
          { ...date, title: '' },
          { title: axisTitle(ALTITUDE, 'km'), zero: false },
          { markEvery, name: 'altitude' },
        ),
        seriesLayers(
          flux,
          [FLUX],
          date,
          { title: axisTitle('F10.7', 'sfu'), zero: false },
          { markEvery, firstStyle: 1, name: 'flux' },
        ),
      ],
      Math.round(PLOT_HEIGHT * 0.6),
    );
  },
};
