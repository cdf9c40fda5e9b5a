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
  // A line that crosses the antimeridian (Chukotka, Fiji, Antarctica) jumps from +180° to −180°; on a
  // plate carrée map that step would draw a stray horizontal stroke across the world, so the line is
  // split there into separate pieces.
  let piece = 0;
  for (const coords of lines) {
    let seq = 0;
    let prevLon: number | undefined;
    for (const [lon, lat] of coords) {
      if (prevLon !== undefined && Math.abs(lon - prevLon) > 180) {
        piece++;
        seq = 0;
      }
      rows.push({ line: piece, seq: seq++, lon: Math.round(lon * 1000) / 1000, lat: Math.round(lat * 1000) / 1000 });
      prevLon = lon;
    }
    piece++;
  }
  cached = rows;
  return rows;
}
