/**
 * Beta angle and eclipse duration over the span of a sun-geometry block's series, in two panels sharing the date
 * axis. Results with the conical shadow (engine 2.0.0 on) draw the umbra and umbra + penumbra; older results the
 * one eclipse column they carry.
 */
import type { FigureKindDefinition } from '../figure-types';
import { axisTitle, PLOT_HEIGHT, stackedFigure } from '../figure-style';
import { readRows, rowDate, rowNumber } from '../read-result';
import { seriesLayers, type SeriesPoint } from '../series-layers';

const BETA = 'Beta angle';
const ECLIPSE = 'Eclipse duration';
const UMBRA = 'Umbra';
const PENUMBRA = 'Umbra + penumbra';

export const betaEclipseYear: FigureKindDefinition = {
  kind: 'beta-eclipse-year',
  title: 'Beta angle and eclipse duration over a year',
  sourceCalcKinds: ['sun-geometry'],
  build(result) {
    const rows = readRows(result, 'series');
    const beta: SeriesPoint[] = rows.map((r) => ({
      series: BETA,
      x: rowDate(r, 'sun geometry'),
      y: rowNumber(r, 'betaDeg', 'sun geometry'),
    }));
    const conical =
      rows.length > 0 && rows.every((r) => typeof r.umbraMin === 'number' && typeof r.penumbraMin === 'number');
    const eclipseNames = conical ? [UMBRA, PENUMBRA] : [ECLIPSE];
    const eclipse: SeriesPoint[] = conical
      ? rows.flatMap((r) => [
          { series: UMBRA, x: rowDate(r, 'sun geometry'), y: rowNumber(r, 'umbraMin', 'sun geometry') },
          { series: PENUMBRA, x: rowDate(r, 'sun geometry'), y: rowNumber(r, 'penumbraMin', 'sun geometry') },
        ])
      : rows.map((r) => ({
          series: ECLIPSE,
          x: rowDate(r, 'sun geometry'),
          y: rowNumber(r, 'eclipseMin', 'sun geometry'),
        }));
    const markEvery = Math.max(1, Math.round(rows.length / 24));
    const date = { title: 'Date (UTC)', temporal: true };
    return stackedFigure(
      [
        seriesLayers(
          beta,
          [BETA],
          { ...date, title: '' },
          { title: axisTitle(BETA, 'deg'), zero: true },
          { markEvery, name: 'beta' },
        ),
        seriesLayers(
          eclipse,
          eclipseNames,
          date,
          { title: axisTitle(ECLIPSE, 'min'), zero: true },
          { markEvery, firstStyle: 1, name: 'eclipse' },
        ),
      ],
      Math.round(PLOT_HEIGHT * 0.6),
    );
  },
};
