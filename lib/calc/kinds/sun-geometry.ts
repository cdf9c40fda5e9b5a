import { numberField } from '../fields';
import { REF } from '../references';
import { defineKind } from '../registry';
import { toDeg, toRad } from '../topics/angles';
import { computeBetaAngle, computeCriticalBeta, computeShadowFractions } from '../topics/eclipse-beta';
import { computeNodalPeriod, computeSecularRates } from '../topics/secular-rates';
import { computeRaanFromLtan, computeSunPosition } from '../topics/sun-and-local-time';
import { semiMajorAxisFromAltitude } from '../topics/sun-synchronous';
import { julianDate } from '../topics/time';
import { CalcInputError } from '../types';
import {
  altitudeKm,
  epoch,
  inclinationDeg,
  ltanHours,
  numOut,
  orbitWarnings,
  rowsOut,
  SECULAR_VALIDITY,
  theory,
  THEORY_OUTPUT,
  theoryNotes,
} from './common';
import { SHADOW_ASSUMPTIONS, shadowModel } from './eclipse-duration';
import { epochDate, epochWarnings } from './node-local-time';

export const MAX_SUN_SAMPLES = 5000;

export const sunGeometryKind = defineKind({
  kind: 'sun-geometry',
  title: 'Beta angle and eclipses over a span',
  summary:
    "Beta angle and time in the Earth's umbra and penumbra of a circular orbit day by day, with the node drifting at its secular rate.",
  inputs: {
    altitudeKm: altitudeKm(),
    inclinationDeg: inclinationDeg(),
    ltanHours: ltanHours(),
    startEpoch: epoch('Start (UTC)'),
    days: numberField('Span', 'd', { min: 0, max: 3660, minExclusive: true, default: 365 }),
    stepDays: numberField('Sample step', 'd', { min: 0.01, max: 30, default: 1 }),
    theory: theory(),
    shadowModel: shadowModel(),
  },
  outputs: [
    numOut('betaMinDeg', 'Minimum beta angle', 'deg', 2),
    numOut('betaMaxDeg', 'Maximum beta angle', 'deg', 2),
    numOut('eclipseMaxMin', 'Longest eclipse per orbit (umbra, or cylinder)', 'min', 2),
    numOut('eclipseMinMin', 'Shortest eclipse per orbit (umbra, or cylinder)', 'min', 2),
    numOut('penumbraMaxMin', 'Longest time in umbra + penumbra per orbit', 'min', 2),
    numOut('eclipseFreeDays', 'Days without eclipse (Sun never even partly hidden)', 'd', 1),
    numOut('criticalBetaDeg', 'Beta angle above which there is no eclipse (cylindrical shadow)', 'deg', 2),
    numOut('nodalPeriodMin', 'Nodal period', 'min', 3),
    rowsOut('series', 'Beta angle and eclipse by date', [
      { name: 'date', label: 'Date (UTC)', unit: null, precision: 0, type: 'string' },
      numOut('betaDeg', 'Beta angle', 'deg', 2),
      numOut('eclipseMin', 'Eclipse per orbit (selected model)', 'min', 2),
      numOut('umbraMin', 'Umbra per orbit', 'min', 2),
      numOut('penumbraMin', 'Umbra + penumbra per orbit', 'min', 2),
    ]),
    THEORY_OUTPUT,
  ],
  figures: [
    {
      name: 'beta-eclipse',
      title: 'Beta angle and eclipse duration',
      rows: 'series',
      x: 'date',
      y: ['betaDeg', 'umbraMin', 'penumbraMin'],
    },
  ],
  model: {
    method:
      'β = asin(ĥ·ŝ) with the node Ω(t) = Ω0 + Ω̇ t (secular rate of the chosen theory) and the Sun from the Astronomical Almanac low-precision formulae; arc of the orbit inside the conical umbra and penumbra (default; Sun at its distance of the day) or the cylindrical shadow (1/π)·acos(√(h² + 2Rh)/((R + h) cos β)), times the nodal period.',
    assumptions: [
      ...SHADOW_ASSUMPTIONS,
      'Eclipse duration = shadow fraction × nodal period; eclipseMin is the umbra for the conical model and the cylinder for the cylindrical one; umbra and penumbra are always reported.',
      'Initial RAAN from the mean-Sun LTAN at the start epoch; node drift from the secular rate only.',
      'eclipseFreeDays counts samples without eclipse times the sample step.',
      SECULAR_VALIDITY,
    ],
    references: [
      REF.valladoSun,
      REF.montenbruckShadow,
      REF.iauSunRadius,
      REF.wertzCoverage,
      REF.valladoGmst,
      REF.brouwer1959,
      REF.kozai1959,
    ],
  },
  compute(v) {
    const samples = Math.floor(v.days / v.stepDays + 1e-9) + 1;
    if (samples > MAX_SUN_SAMPLES)
      throw new CalcInputError(
        'stepDays',
        `${samples} samples exceed the limit of ${MAX_SUN_SAMPLES}: use a larger stepDays or a shorter span`,
      );
    const start = epochDate(v.startEpoch);
    const jd0 = julianDate(start);
    const aKm = semiMajorAxisFromAltitude(v.altitudeKm);
    const iRad = toRad(v.inclinationDeg);
    const rates = computeSecularRates(aKm, 0, iRad, v.theory);
    const periodMin = computeNodalPeriod(rates) / 60;
    const raan0 = computeRaanFromLtan(jd0, v.ltanHours, 'mean');
    const series = [];
    let betaMin = Infinity;
    let betaMax = -Infinity;
    let eclMax = 0;
    let eclMin = Infinity;
    let penMax = 0;
    let free = 0;
    for (let k = 0; k < samples; k++) {
      const dt = k * v.stepDays;
      const sun = computeSunPosition(jd0 + dt);
      const beta = computeBetaAngle(iRad, raan0 + rates.nodeRate * dt * 86400, sun.unit);
      const shadow = computeShadowFractions(aKm, beta, sun.distanceKm);
      const umbraMin = shadow.umbra * periodMin;
      const penumbraMin = shadow.penumbra * periodMin;
      const eclipseMin = v.shadowModel === 'conical' ? umbraMin : shadow.cylindrical * periodMin;
      const betaDeg = toDeg(beta);
      betaMin = Math.min(betaMin, betaDeg);
      betaMax = Math.max(betaMax, betaDeg);
      eclMax = Math.max(eclMax, eclipseMin);
      eclMin = Math.min(eclMin, eclipseMin);
      penMax = Math.max(penMax, penumbraMin);
      if ((v.shadowModel === 'conical' ? penumbraMin : eclipseMin) === 0) free++;
      series.push({
        date: new Date(start.getTime() + dt * 86400000).toISOString(),
        betaDeg,
        eclipseMin,
        umbraMin,
        penumbraMin,
      });
    }
    const end = new Date(start.getTime() + v.days * 86400000);
    return {
      outputs: {
        betaMinDeg: betaMin,
        betaMaxDeg: betaMax,
        eclipseMaxMin: eclMax,
        eclipseMinMin: eclMin,
        penumbraMaxMin: penMax,
        eclipseFreeDays: free * v.stepDays,
        criticalBetaDeg: toDeg(computeCriticalBeta(v.altitudeKm)),
        nodalPeriodMin: periodMin,
        series,
        theory: v.theory,
      },
      warnings: [...orbitWarnings(v), ...epochWarnings(start, end)],
      modelNotes: theoryNotes(v.theory),
    };
  },
});
