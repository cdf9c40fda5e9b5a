/**
 * Ground track of a ground-track block on an equirectangular world map
 * (longitude and latitude on linear axes), Natural Earth coastlines behind,
 * ascending-node crossings marked.
 */
import type { CalcResult } from '@/lib/calc';
import type { FigureKindDefinition, FigureAxis } from '../figure-types';
import { coastlinePoints } from '../coastlines';
import { axisTitle, FIGURE_COLOURS, layeredFigure } from '../figure-style';
import { readRows, rowNumber, type Row } from '../read-result';

export interface TrackSample {
  segment: number;
  t: number;
  lonDeg: number;
  latDeg: number;
}

/** Splits the track where it wraps at the antimeridian so that no line crosses the map. */
export function segmentTrack(points: readonly Row[]): TrackSample[] {
  let segment = 0;
  let previousLon: number | undefined;
  return points.map((row) => {
    const lonDeg = rowNumber(row, 'lonDeg', 'ground track');
    if (previousLon !== undefined && Math.abs(lonDeg - previousLon) > 180) segment++;
    previousLon = lonDeg;
    return {
      segment,
      t: rowNumber(row, 't', 'ground track'),
      lonDeg,
      latDeg: rowNumber(row, 'latDeg', 'ground track'),
    };
  });
}

/**
 * Ascending-node crossings: the engine's ascendingNodes rows when present,
 * else the samples where latitude changes sign from south to north
 * (longitude interpolated linearly between the two samples).
 */
export function ascendingNodes(
  result: CalcResult,
  samples: readonly TrackSample[],
): { t: number; lonDeg: number; latDeg: number }[] {
  if (Array.isArray(result.outputs.ascendingNodes)) {
    return readRows(result, 'ascendingNodes').map((row) => ({
      t: rowNumber(row, 't', 'ascending nodes'),
      lonDeg: rowNumber(row, 'lonDeg', 'ascending nodes'),
      latDeg: 0,
    }));
  }
  const out: { t: number; lonDeg: number; latDeg: number }[] = [];
  for (let k = 1; k < samples.length; k++) {
    const a = samples[k - 1];
    const b = samples[k];
    if (a.segment !== b.segment || !(a.latDeg < 0 && b.latDeg >= 0)) continue;
    const f = -a.latDeg / (b.latDeg - a.latDeg);
    out.push({ t: a.t + f * (b.t - a.t), lonDeg: a.lonDeg + f * (b.lonDeg - a.lonDeg), latDeg: 0 });
  }
  return out;
}

const TRACK = 'Ground track';
const NODES = 'Ascending node';

/** The world map's axes: longitude −180…180°, latitude −90…90° (shared with the sites map). */
export const WORLD_LON_AXIS: FigureAxis = {
  field: 'lon',
  type: 'quantitative',
  title: axisTitle('Longitude', 'deg'),
  scale: { domain: [-180, 180], nice: false },
  axis: { values: [-180, -120, -60, 0, 60, 120, 180] },
};
export const WORLD_LAT_AXIS: FigureAxis = {
  field: 'lat',
  type: 'quantitative',
  title: axisTitle('Latitude', 'deg'),
  scale: { domain: [-90, 90], nice: false },
  axis: { values: [-90, -60, -30, 0, 30, 60, 90] },
};

export const groundTrackMap: FigureKindDefinition = {
  kind: 'ground-track-map',
  title: 'Ground track on a world map',
  sourceCalcKinds: ['ground-track'],
  build(result) {
    const samples = segmentTrack(readRows(result, 'points'));
    const nodes = ascendingNodes(result, samples);
    const x = WORLD_LON_AXIS;
    const y = WORLD_LAT_AXIS;
    const legend = {
      colour: {
        field: 'series',
        type: 'nominal',
        scale: { domain: [TRACK, NODES], range: [FIGURE_COLOURS.orbit, FIGURE_COLOURS.ember] },
        legend: { symbolType: 'stroke' },
      },
    } as const;
    return layeredFigure([
      {
        name: 'coastline',
        data: { values: coastlinePoints() },
        mark: { type: 'line', color: FIGURE_COLOURS.land, strokeWidth: 0.5, clip: true },
        encoding: { x, y, detail: { field: 'line', type: 'nominal' }, order: { field: 'seq', type: 'quantitative' } },
      },
      {
        name: 'track',
        data: {
          values: samples.map((s) => ({ series: TRACK, segment: s.segment, t: s.t, lon: s.lonDeg, lat: s.latDeg })),
        },
        mark: { type: 'line', strokeWidth: 1.2, clip: true },
        encoding: {
          x,
          y,
          color: legend.colour,
          detail: { field: 'segment', type: 'nominal' },
          order: { field: 't', type: 'quantitative' },
        },
      },
      {
        name: 'ascending_nodes',
        data: { values: nodes.map((n) => ({ series: NODES, t: n.t, lon: n.lonDeg, lat: n.latDeg })) },
        mark: {
          type: 'point',
          shape: 'triangle-up',
          size: 45,
          filled: true,
          stroke: FIGURE_COLOURS.ink,
          strokeWidth: 0.5,
        },
        encoding: { x, y, color: legend.colour },
      },
    ]);
  },
};
