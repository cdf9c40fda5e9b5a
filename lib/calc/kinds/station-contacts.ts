import { REF } from '../references';
import { defineKind } from '../registry';
import { computeSitePasses, contactOrbitNodalPeriod, type Pass } from '../topics/station-contacts';
import { numOut, orbitWarnings, rowsOut, SECULAR_VALIDITY, THEORY_OUTPUT, theoryNotes } from './common';
import { epochWarnings } from './node-local-time';
import { checkSiteWork, readSiteOrbit, SITE_ASSUMPTIONS, SITE_KIND_COST, siteOrbitInputs } from './site-inputs';

/** Contact intervals merged across sites (a moment seen by two stations counts once). */
function mergeIntervals(passes: Pass[]): [number, number][] {
  const sorted = passes.map((p) => [p.startS, p.endS] as [number, number]).sort((a, b) => a[0] - b[0]);
  const out: [number, number][] = [];
  for (const [s, e] of sorted) {
    const last = out.at(-1);
    if (last && s <= last[1]) last[1] = Math.max(last[1], e);
    else out.push([s, e]);
  }
  return out;
}

/** Longest time [s] without contact in [0, spanS], counting the start and end of the span. */
function longestGap(intervals: [number, number][], spanS: number): number {
  let gap = 0;
  let t = 0;
  for (const [s, e] of intervals) {
    gap = Math.max(gap, s - t);
    t = Math.max(t, e);
  }
  return Math.max(gap, spanS - t);
}

export const stationContactsKind = defineKind({
  kind: 'station-contacts',
  title: 'Station contacts',
  summary:
    'Passes over each ground station of an uploaded site list: passes per day, mean and longest pass, daily contact minutes and the longest gap.',
  inputs: siteOrbitInputs(),
  check: checkSiteWork,
  ...SITE_KIND_COST,
  outputs: [
    rowsOut('stations', 'Per station', [
      { name: 'site', label: 'Station', unit: null, precision: 0, type: 'string' },
      numOut('latDeg', 'Latitude', 'deg', 3),
      numOut('lonDeg', 'Longitude', 'deg', 3),
      numOut('passesPerDay', 'Passes per day', null, 2),
      numOut('meanPassMin', 'Mean pass', 'min', 2),
      numOut('maxPassMin', 'Longest pass', 'min', 2),
      numOut('dailyContactMin', 'Contact per day', 'min', 1),
      numOut('longestGapHours', 'Longest gap', 'h', 2),
      numOut('maxElevationDeg', 'Highest elevation', 'deg', 1),
    ]),
    numOut('dailyContactMin', 'Contact per day, all stations (overlaps counted once)', 'min', 1),
    numOut('passesPerDay', 'Passes per day, all stations', null, 2),
    numOut('longestGapHours', 'Longest gap without any station', 'h', 2),
    numOut('nodalPeriodMin', 'Nodal period', 'min', 3),
    THEORY_OUTPUT,
  ],
  model: {
    method:
      "Elevation of the satellite above each station's horizon sampled along the secular circular orbit, each rise and set found by bisection; per station and over all stations: passes per day, pass durations, contact per day and the longest gap.",
    assumptions: [
      ...SITE_ASSUMPTIONS,
      'Mean pass and longest pass count complete passes only when there are any; contact per day includes the cut passes.',
      SECULAR_VALIDITY,
    ],
    references: [REF.smadGeometry, REF.valladoGmst, REF.wgs84, REF.brouwer1959, REF.kozai1959],
  },
  compute(v) {
    const { sites, orbit, spanS, start } = readSiteOrbit(v);
    const passes = computeSitePasses(orbit, sites, spanS, v.stepSec);
    const days = spanS / 86400;
    const stations = sites.map((site, k) => {
      const all = passes[k];
      const complete = all.filter((p) => !p.clipped);
      const durations = (complete.length ? complete : all).map((p) => (p.endS - p.startS) / 60);
      const merged = mergeIntervals(all);
      return {
        site: site.name,
        latDeg: site.latDeg,
        lonDeg: site.lonDeg,
        passesPerDay: all.length / days,
        meanPassMin: durations.length ? durations.reduce((a, b) => a + b, 0) / durations.length : 0,
        maxPassMin: durations.length ? Math.max(...durations) : 0,
        dailyContactMin: all.reduce((a, p) => a + (p.endS - p.startS), 0) / 60 / days,
        longestGapHours: longestGap(merged, spanS) / 3600,
        maxElevationDeg: all.length ? Math.max(...all.map((p) => p.maxElevationDeg)) : 0,
      };
    });
    const union = mergeIntervals(passes.flat());
    const warnings = [...orbitWarnings(v), ...epochWarnings(start)];
    for (const s of stations) if (s.passesPerDay === 0) warnings.push(`${s.site} sees no pass in the span.`);
    return {
      outputs: {
        stations,
        dailyContactMin: union.reduce((a, [s, e]) => a + (e - s), 0) / 60 / days,
        passesPerDay: passes.flat().length / days,
        longestGapHours: longestGap(union, spanS) / 3600,
        nodalPeriodMin: contactOrbitNodalPeriod(orbit) / 60,
        theory: v.theory,
      },
      warnings,
      modelNotes: theoryNotes(v.theory),
    };
  },
});
