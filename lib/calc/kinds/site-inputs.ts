import { numberField, stringField } from '../fields';
import { toRad } from '../topics/angles';
import { computeRaanFromLtan } from '../topics/sun-and-local-time';
import { semiMajorAxisFromAltitude } from '../topics/sun-synchronous';
import { julianDate } from '../topics/time';
import { parseSiteList, SITE_LIST_LIMITS, type Site } from '../topics/site-list';
import type { ContactOrbit } from '../topics/station-contacts';
import type { SecularTheory } from '../topics/secular-rates';
import { altitudeKm, epoch, inclinationDeg, ltanHours, theory } from './common';
import { epochDate } from './node-local-time';

/** Inputs shared by station-contacts and site-revisit: the site list, the circular orbit and the span. */
export const siteOrbitInputs = () => ({
  sites: stringField('Sites (CSV: name, latitude, longitude, altitude, minimum elevation)', {
    maxLength: SITE_LIST_LIMITS.maxChars,
    multiline: true,
    help: 'One header line, then one site per line: name, latitude [deg], longitude [deg], altitude [m, or km with "(km)" in the header], minimum elevation [deg]. Paste it or upload the CSV file.',
  }),
  altitudeKm: altitudeKm(),
  inclinationDeg: inclinationDeg(),
  ltanHours: ltanHours(),
  startEpoch: epoch('Ascending-node crossing (UTC)', '2027-09-15T00:00:00Z'),
  days: numberField('Span', 'd', { min: 0.1, max: 30, default: 7 }),
  stepSec: numberField('Sample step', 's', {
    min: 1,
    max: 120,
    default: 20,
    help: 'Passes shorter than about one step can be missed',
  }),
  theory: theory(),
});

export interface SiteOrbitValues {
  sites: string;
  altitudeKm: number;
  inclinationDeg: number;
  ltanHours: number;
  startEpoch: string;
  days: number;
  stepSec: number;
  theory: SecularTheory;
}

/** The parsed sites and the circular mean orbit from the ascending node at the start epoch (RAAN from the mean-Sun LTAN). */
export function readSiteOrbit(v: SiteOrbitValues): { sites: Site[]; orbit: ContactOrbit; spanS: number; start: Date } {
  const start = epochDate(v.startEpoch);
  const jd0 = julianDate(start);
  return {
    sites: parseSiteList(v.sites),
    orbit: {
      aKm: semiMajorAxisFromAltitude(v.altitudeKm),
      iRad: toRad(v.inclinationDeg),
      raan0: computeRaanFromLtan(jd0, v.ltanHours, 'mean'),
      jd0,
      theory: v.theory,
    },
    spanS: v.days * 86400,
    start,
  };
}

export const SITE_ASSUMPTIONS = [
  'Circular mean orbit from an ascending-node crossing at the start epoch, RAAN from the mean-Sun LTAN; argument of latitude and node advance at the secular rates of the theory (as ground-track); short-period motion (a few km) and drag are not modelled.',
  "Sites on the WGS-84 ellipsoid at their geodetic latitude, longitude and height; elevation above the ellipsoid's local horizontal, no refraction or terrain masking.",
  'Elevation sampled every step and each crossing of the limit found by bisection to 0.01 s: a pass shorter than about one step can be missed. Passes under way at the start or end of the span are cut there.',
];

/** Most elevation samples one call may take (sites × span / step): about a second of work on this machine's cores. */
export const MAX_SITE_SAMPLES = 3_000_000;

/** Cross-field check: the work a call asks for stays bounded (counted on the raw site lines, before parsing). */
export function checkSiteWork(v: { sites: string; days: number; stepSec: number }): Record<string, string> {
  const siteLines = Math.max(
    1,
    v.sites.split(/\r\n|\r|\n/).filter((l) => l.trim() !== '' && !l.trim().startsWith('#')).length - 1,
  );
  const samples = siteLines * Math.ceil((v.days * 86400) / v.stepSec);
  return samples <= MAX_SITE_SAMPLES
    ? {}
    : {
        days: `days: ${siteLines} sites × ${v.days} days every ${v.stepSec} s is ${samples.toLocaleString('en-GB')} samples, more than ${MAX_SITE_SAMPLES.toLocaleString('en-GB')}: shorten the span, enlarge the step or use fewer sites`,
      };
}

/** Both site kinds run in the worker pool: a month of samples over 50 sites takes seconds. */
export const SITE_KIND_COST = {
  heavy: true,
  costInputs: { days: 'a shorter span', stepSec: 'a larger sample step', sites: 'fewer sites' },
} as const;
