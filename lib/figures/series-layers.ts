/**
 * Lines with point markers for several named series, styled so that each
 * series differs in colour, dash pattern and marker shape (readable in
 * greyscale print), with one legend.
 */
import type { UnitSpec } from 'vega-lite/types_unstable/spec/index.js';
import type { FigureAxis, FigureLayer } from './figure-types';
import { seriesScales } from './figure-style';

export interface SeriesPoint {
  series: string;
  x: number | string;
  y: number;
}

export interface SeriesAxis {
  title: string;
  temporal?: boolean;
  zero?: boolean;
}

export interface SeriesOptions {
  /** Marker on every n-th sample so that dense series stay legible (default 1). */
  markEvery?: number;
  /** Index of the first series style (to keep styles distinct across panels). */
  firstStyle?: number;
  /** Prefix of the layer names (unique per panel). */
  name?: string;
}

export function seriesLayers(
  points: readonly SeriesPoint[],
  names: readonly string[],
  x: SeriesAxis,
  y: SeriesAxis,
  options: SeriesOptions = {},
): FigureLayer[] {
  const { markEvery = 1, firstStyle = 0, name = 'series' } = options;
  const scales = seriesScales(names, firstStyle);
  const xEnc: FigureAxis = x.temporal
    ? { field: 'x', type: 'temporal', title: x.title, scale: { type: 'utc' }, axis: { format: '%b %Y' } }
    : { field: 'x', type: 'quantitative', title: x.title, scale: { zero: x.zero ?? false } };
  const yEnc: FigureAxis = { field: 'y', type: 'quantitative', title: y.title, scale: { zero: y.zero ?? false } };
  const colour = {
    field: 'series',
    type: 'nominal',
    scale: { domain: [...names], range: scales.colour },
    legend: names.length > 1 ? {} : null,
  } as const;
  const dash = {
    field: 'series',
    type: 'nominal',
    scale: { domain: [...names], range: scales.dash },
    legend: names.length > 1 ? {} : null,
  } as const;
  const shape = {
    field: 'series',
    type: 'nominal',
    scale: { domain: [...names], range: scales.shape },
    legend: names.length > 1 ? {} : null,
  } as const;
  const counters = new Map<string, number>();
  const markers = points.filter((p) => {
    const k = counters.get(p.series) ?? 0;
    counters.set(p.series, k + 1);
    return k % markEvery === 0;
  });
  const line: UnitSpec<string> = {
    name: `${name}_lines`,
    data: { values: [...points] },
    mark: { type: 'line' },
    encoding: { x: xEnc, y: yEnc, color: colour, strokeDash: dash },
  };
  const marks: UnitSpec<string> = {
    name: `${name}_markers`,
    data: { values: markers },
    mark: { type: 'point', size: 28, filled: true },
    encoding: { x: xEnc, y: yEnc, color: colour, shape },
  };
  return [line, marks];
}
