import { numberField } from '../fields';
import { REF } from '../references';
import { defineKind } from '../registry';
import { EARTH_RADIUS_KM } from '../constants';
import { toDeg, toRad } from '../topics/angles';
import { computeSitePasses } from '../topics/station-contacts';
import { numOut, orbitWarnings, rowsOut, SECULAR_VALIDITY, THEORY_OUTPUT, theoryNotes } from './common';
import { epochWarnings } from './node-local-time';
import { checkSiteWork, readSiteOrbit, SITE_ASSUMPTIONS, SITE_KIND_COST, siteOrbitInputs } from './site-inputs';

/**
 * Elevation [deg] at which a site is seen at off-nadir angle η from altitude H, spherical Earth of the
 * equatorial radius: cos ε = sin η / sin ρ with sin ρ = R/(R + H) (SMAD 3rd ed. ch. 5, Space Mission Geometry).
 */
export function elevationAtOffNadir(offNadirDeg: number, altitudeKm: number): number {
  const sinRho = EARTH_RADIUS_KM / (EARTH_RADIUS_KM + altitudeKm);
  return toDeg(Math.acos(Math.min(1, Math.sin(toRad(offNadirDeg)) / sinRho)));
}

/** Off-nadir angle [deg] of the swath edge: Earth central angle λ = swath / 2R, tan η = sin ρ sin λ / (1 − sin ρ cos λ). */
export function offNadirOfSwath(swathKm: number, altitudeKm: number): number {
  const sinRho = EARTH_RADIUS_KM / (EARTH_RADIUS_KM + altitudeKm);
  const lambda = swathKm / (2 * EARTH_RADIUS_KM);
  return toDeg(Math.atan2(sinRho * Math.sin(lambda), 1 - sinRho * Math.cos(lambda)));
}

export const siteRevisitKind = defineKind({
  kind: 'site-revisit',
  title: 'Site revisit',
  summary:
    'How often each site of an uploaded list can be observed within an off-nadir or swath limit: accesses per day, mean and longest revisit.',
  inputs: {
    ...siteOrbitInputs(),
    offNadirDeg: numberField('Largest off-nadir angle', 'deg', { min: 0, max: 70, default: 30 }),
    swathKm: numberField('Swath width (instead of the off-nadir angle)', 'km', { min: 1, max: 5000, optional: true }),
  },
  check: checkSiteWork,
  ...SITE_KIND_COST,
  outputs: [
    rowsOut('sites', 'Per site', [
      { name: 'site', label: 'Site', unit: null, precision: 0, type: 'string' },
      numOut('latDeg', 'Latitude', 'deg', 3),
      numOut('lonDeg', 'Longitude', 'deg', 3),
      numOut('accessesPerDay', 'Accesses per day', null, 2),
      numOut('meanRevisitHours', 'Mean revisit', 'h', 2),
      numOut('maxRevisitHours', 'Longest revisit', 'h', 2),
    ]),
    numOut('offNadirDeg', 'Off-nadir limit used', 'deg', 3),
    numOut('minElevationDeg', 'Elevation at that limit', 'deg', 3),
    numOut('meanRevisitHours', 'Mean revisit, all sites', 'h', 2),
    numOut('maxRevisitHours', 'Longest revisit, all sites', 'h', 2),
    THEORY_OUTPUT,
  ],
  model: {
    method:
      "A site is accessible while the satellite sees it within the off-nadir limit (elevation at least arccos(sin η / sin ρ), and at least the site's own minimum elevation); accesses found as station-contacts finds passes; revisit = time between the starts of successive accesses.",
    assumptions: [
      ...SITE_ASSUMPTIONS,
      'Off-nadir limit and swath on a spherical Earth of the equatorial radius at the mean altitude; the swath is taken centred on the ground track.',
      'With fewer than two accesses in the span the revisit is given as the span and a warning says so.',
      SECULAR_VALIDITY,
    ],
    references: [REF.smadGeometry, REF.valladoGmst, REF.wgs84, REF.brouwer1959, REF.kozai1959],
  },
  compute(v) {
    const { sites, orbit, spanS, start } = readSiteOrbit(v);
    const offNadirDeg = v.swathKm !== undefined ? offNadirOfSwath(v.swathKm, v.altitudeKm) : v.offNadirDeg;
    const limitElevationDeg = elevationAtOffNadir(offNadirDeg, v.altitudeKm);
    const limited = sites.map((s) => ({ ...s, minElevationDeg: Math.max(s.minElevationDeg, limitElevationDeg) }));
    const passes = computeSitePasses(orbit, limited, spanS, v.stepSec);
    const days = spanS / 86400;
    const warnings = [...orbitWarnings(v), ...epochWarnings(start)];
    const rows = sites.map((site, k) => {
      const starts = passes[k].map((p) => p.startS);
      const gaps = starts.slice(1).map((t, j) => (t - starts[j]) / 3600);
      if (gaps.length === 0)
        warnings.push(`${site.name}: fewer than two accesses in the span; its revisit is given as the span.`);
      const span = spanS / 3600;
      return {
        site: site.name,
        latDeg: site.latDeg,
        lonDeg: site.lonDeg,
        accessesPerDay: starts.length / days,
        meanRevisitHours: gaps.length ? gaps.reduce((a, b) => a + b, 0) / gaps.length : span,
        maxRevisitHours: gaps.length ? Math.max(...gaps) : span,
      };
    });
    return {
      outputs: {
        sites: rows,
        offNadirDeg,
        minElevationDeg: limitElevationDeg,
        meanRevisitHours: rows.reduce((a, r) => a + r.meanRevisitHours, 0) / rows.length,
        maxRevisitHours: Math.max(...rows.map((r) => r.maxRevisitHours)),
        theory: v.theory,
      },
      warnings,
      modelNotes: theoryNotes(v.theory),
    };
  },
});
