/**
 * World coastlines for ground-track maps: Natural Earth 1:110m land
 * (public domain, naturalearthdata.com) as packaged in world-atlas'
 * land-110m TopoJSON, turned into line strings with topojson-client's
 * mesh(). Coordinates are longitude/latitude in degrees, which an
 * equirectangular (plate carrée) map draws on linear axes.
 */
import { mesh } from 'topojson-client';
import type { GeometryCollection, Topology } from 'topojson-specification';
import land110m from 'world-atlas/land-110m.json';

export interface CoastlinePoint {
  /** Index of the line string the point belongs to. */
  line: number;
  /** Order of the point along its line. */
  seq: number;
  lon: number;
  lat: number;
}

let cached: CoastlinePoint[] | undefined;

/** Every coastline vertex as a row (about 5 000 rows); computed once per process. */
export function coastlinePoints(): CoastlinePoint[] {
  if (cached) return cached;
  const topology = land110m as unknown as Topology<{ land: GeometryCollection }>;
  const lines = mesh(topology, topology.objects.land).coordinates;
  const rows: CoastlinePoint[] = [];
  lines.forEach((coords, line) => {
    coords.forEach(([lon, lat], seq) => rows.push({ line, seq, lon: Math.round(lon * 1000) / 1000, lat: Math.round(lat * 1000) / 1000 }));
  });
  cached = rows;
  return rows;
}
