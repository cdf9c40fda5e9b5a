import { inFrame, numberField, parseUtcEpoch } from '../fields';
import { REF } from '../references';
import { defineKind } from '../registry';
import { toDeg, toRad } from '../topics/angles';
import { computeNodeLocalTime, computeRaanFromLtan } from '../topics/sun-and-local-time';
import { julianDate } from '../topics/time';
import { epoch, numOut } from './common';

/** Warning for epochs outside the range where the almanac Sun formulae are quoted to 0.01°. */
export function epochWarnings(date: Date, endDate: Date = date): string[] {
  const y0 = date.getUTCFullYear();
  const y1 = endDate.getUTCFullYear();
  return y0 < 1950 || y1 > 2050
    ? ['Epoch outside 1950–2050: the low-precision Sun formulae are quoted to 0.01° only inside that range.']
    : [];
}

/** Parse an epoch field already validated by its schema. */
export function epochDate(text: string): Date {
  const d = parseUtcEpoch(text);
  if (!d) throw new Error(`epoch ${text} passed validation but could not be parsed`);
  return d;
}

export const nodeLocalTimeKind = defineKind({
  kind: 'node-local-time',
  title: 'Node local time and right ascension',
  summary:
    'Converts between the right ascension of the ascending node and its local solar time (mean Sun by default, true Sun alongside) at an epoch.',
  inputs: {
    epoch: epoch(),
    ltanHours: numberField('Local time of ascending node (mean Sun)', 'h', {
      min: 0,
      max: 24,
      maxExclusive: true,
      optional: true,
      help: 'Give this or raanDeg',
    }),
    raanDeg: inFrame(
      numberField('Right ascension of ascending node', 'deg', {
        min: 0,
        max: 360,
        maxExclusive: true,
        optional: true,
        help: 'Give this or ltanHours',
      }),
      'TOD',
    ),
  },
  check(v): Record<string, string> {
    const both = v.ltanHours !== undefined && v.raanDeg !== undefined;
    const neither = v.ltanHours === undefined && v.raanDeg === undefined;
    if (both) return { raanDeg: 'raanDeg: give either ltanHours or raanDeg, not both' };
    if (neither) return { ltanHours: 'ltanHours: give either ltanHours or raanDeg' };
    return {};
  },
  outputs: [
    numOut('raanDeg', 'Right ascension of ascending node', 'deg', 4),
    numOut('ltanHours', 'Local time of ascending node (mean Sun)', 'h', 4),
    numOut('ltdnHours', 'Local time of descending node (mean Sun)', 'h', 4),
    numOut('ltanTrueSunHours', 'Local time of ascending node (true Sun)', 'h', 4),
    numOut('raanTrueSunDeg', 'RAAN giving this LTAN in true solar time', 'deg', 4),
    numOut('equationOfTimeMin', 'Equation of time (apparent − mean)', 'min', 2),
    numOut('sunRightAscensionDeg', 'Sun right ascension', 'deg', 4),
    numOut('sunDeclinationDeg', 'Sun declination', 'deg', 4),
    numOut('meanSunRightAscensionDeg', 'Mean Sun right ascension', 'deg', 4),
    numOut('gmstDeg', 'Greenwich mean sidereal time', 'deg', 6),
  ],
  model: {
    method:
      'Mean solar time of the node = 12 h + (Ω − α_meanSun)/15°, α_meanSun = GMST − 15°(UT − 12 h), GMST per IAU 1982; true Sun from the Astronomical Almanac low-precision formulae; equation of time = (α_meanSun − α_Sun)/15°.',
    assumptions: [
      'UTC is used for UT1 and TT (|UT1 − UTC| < 0.9 s; TT − UT ≈ 69 s moves the Sun by 0.0008°).',
      'Right ascensions refer to the equator and equinox of date (the frame of GMST); precession from J2000 is not applied.',
      'Sun position good to about 0.01° for 1950–2050; equation of time to about 0.1 min.',
      'Valid for epochs 1950–2050, where the low-precision Sun formulae are quoted; outside those years the kind warns.',
    ],
    references: [REF.valladoGmst, REF.valladoSun, REF.meeus],
  },
  compute(v) {
    const date = epochDate(v.epoch);
    const jd = julianDate(date);
    const raan = v.raanDeg !== undefined ? toRad(v.raanDeg) : computeRaanFromLtan(jd, v.ltanHours ?? 0, 'mean');
    const t = computeNodeLocalTime(jd, raan);
    return {
      outputs: {
        raanDeg: toDeg(t.raanRad),
        ltanHours: t.ltanHours,
        ltdnHours: t.ltdnHours,
        ltanTrueSunHours: t.ltanTrueSunHours,
        raanTrueSunDeg: toDeg(computeRaanFromLtan(jd, t.ltanHours, 'true')),
        equationOfTimeMin: t.equationOfTimeMin,
        sunRightAscensionDeg: toDeg(t.sun.rightAscensionRad),
        sunDeclinationDeg: toDeg(t.sun.declinationRad),
        meanSunRightAscensionDeg: toDeg(t.meanSunRaRad),
        gmstDeg: toDeg(t.gmstRad),
      },
      warnings: epochWarnings(date),
    };
  },
});
