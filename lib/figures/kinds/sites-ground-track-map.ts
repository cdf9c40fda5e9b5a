/**
 * The sites of a station-contacts or site-revisit block on the world map, over
 * the ground track of the same orbit for the first day (at most) of its span:
 * the track is the engine's ground-track kind run with the block's orbit inputs,
 * the sites are the block's own rows (latitude, longitude as the site list gave them).
 */
import { runCalc } from '@/lib/calc';
import { FigureDataError, type FigureKindDefinition, type FigureLayer, type FigureSpec } from '../figure-types';
import { FIGURE_COLOURS } from '../figure-style';
import { readRows, rowNumber } from '../read-result';
import { groundTrackMap, WORLD_LAT_AXIS, WORLD_LON_AXIS } from './ground-track-map';

/** A site list may give longitudes 0…360° east; the map runs −180…180°. */
const eastOfGreenwich = (lonDeg: number) => (lonDeg > 180 ? lonDeg - 360 : lonDeg);

/** Hours of ground track drawn: one day shows the pattern without filling the map. */
const TRACK_HOURS = 24;

export const sitesGroundTrackMap: FigureKindDefinition = {
  kind: 'sites-ground-track-map',
  title: 'Sites on the ground track',
  sourceCalcKinds: ['station-contacts', 'site-revisit'],
  build(result) {
    const rowsName = result.kind === 'station-contacts' ? 'stations' : 'sites';
    const sites = readRows(result, rowsName).map((row) => ({
      name: String(row.site),
      lat: rowNumber(row, 'latDeg', 'sites'),
      lon: eastOfGreenwich(rowNumber(row, 'lonDeg', 'sites')),
    }));
    const i = result.inputs;
    const days = typeof i.days === 'number' ? i.days : 1;
    const track = runCalc('ground-track', {
      altitudeKm: i.altitudeKm,
      inclinationDeg: i.inclinationDeg,
      ltanHours: i.ltanHours,
      startEpoch: i.startEpoch,
      hours: Math.min(TRACK_HOURS, days * 24),
      stepSec: 60,
      theory: i.theory,
    });
    if (!track.ok)
      throw new FigureDataError(`the ground track of the block's orbit could not be computed: ${track.error}`);
    const base = groundTrackMap.build(track.result) as { layer: FigureLayer[] };
    const layers: FigureLayer[] = [
      {
        name: 'sites',
        data: { values: sites },
        mark: {
          type: 'point',
          shape: 'square',
          size: 50,
          filled: true,
          color: FIGURE_COLOURS.moss,
          stroke: FIGURE_COLOURS.ink,
          strokeWidth: 0.5,
        },
        encoding: { x: WORLD_LON_AXIS, y: WORLD_LAT_AXIS, tooltip: { field: 'name', type: 'nominal' } },
      },
      {
        name: 'site_names',
        data: { values: sites },
        mark: { type: 'text', align: 'left', dx: 6, dy: -6, fontSize: 9, color: FIGURE_COLOURS.ink },
        encoding: { x: WORLD_LON_AXIS, y: WORLD_LAT_AXIS, text: { field: 'name', type: 'nominal' } },
      },
    ];
    return { ...base, layer: [...base.layer, ...layers] } as FigureSpec;
  },
};
