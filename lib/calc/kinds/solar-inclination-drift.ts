import { inFrame, numberField } from '../fields';
import { REF } from '../references';
import { defineKind } from '../registry';
import { toDeg, toRad, wrapHours } from '../topics/angles';
import {
  circularSpeedKmS,
  computeLocalTimeParabola,
  computeOptimalBias,
  localTimeDeviationMin,
  obliquityRad,
  YEAR_S,
  yearsUntilOutside,
} from '../topics/solar-third-body';
import { semiMajorAxisFromAltitude, solveSsoInclination } from '../topics/sun-synchronous';
import { centuriesSinceJ2000, julianDate } from '../topics/time';
import type { OutputRow } from '../types';
import {
  altitudeKm,
  epoch,
  ltanHours,
  numOut,
  orbitWarnings,
  rowsOut,
  SECULAR_VALIDITY,
  theory,
  THEORY_OUTPUT,
  theoryNotes,
} from './common';
import { epochDate, epochWarnings } from './node-local-time';

/** Longest time within tolerance that is reported as a number [yr]; beyond it the drift is called negligible. */
export const MAX_REPORTED_YEARS = 100;

/** The start, the same day of each following calendar month while inside the span, and the end of the span. */
function monthlyDates(start: Date, years: number): Date[] {
  const endMs = start.getTime() + years * YEAR_S * 1000;
  const dates = [start];
  for (let k = 1; ; k++) {
    const next = new Date(start);
    next.setUTCMonth(start.getUTCMonth() + k);
    if (next.getTime() >= endMs - 86_400_000) break; // no sliver of a month before the end
    dates.push(next);
  }
  dates.push(new Date(endMs));
  return dates;
}

export const solarInclinationDriftKind = defineKind({
  kind: 'solar-inclination-drift',
  title: 'Inclination drift from solar gravity and the node local time over the mission',
  summary:
    "Secular change of inclination caused by the Sun for the orbit's local time, the parabola the node local time follows without correction, the plane-change ΔV to hold the inclination, and the injection bias that keeps the local time within a tolerance longest.",
  inputs: {
    altitudeKm: altitudeKm(3000),
    inclinationDeg: inFrame(
      numberField('Reference inclination', 'deg', {
        min: 0,
        max: 180,
        optional: true,
        help: 'Leave empty for the sun-synchronous inclination of the chosen theory',
      }),
      'TOD',
    ),
    ltanHours: ltanHours(),
    startEpoch: epoch('Start of the mission (UTC)', '2027-01-01T00:00:00Z'),
    years: numberField('Mission length', 'yr', { min: 0.1, max: 30, default: 5 }),
    inclinationBiasDeg: numberField('Inclination bias at injection (added to the reference)', 'deg', {
      min: -1,
      max: 1,
      default: 0,
    }),
    ltanToleranceMin: numberField('Local-time tolerance (±)', 'min', {
      min: 0.1,
      max: 240,
      optional: true,
      help: 'Give it to get the optimal bias and the time within tolerance',
    }),
    theory: theory(),
  },
  outputs: [
    numOut('inclinationRateDegPerYear', 'Inclination rate from solar gravity', 'deg/yr', 4),
    numOut(
      'ltanDeviationEndMin',
      'Local-time deviation at the end of the mission (no inclination manoeuvre)',
      'min',
      1,
    ),
    numOut('inclinationHoldDeltaVMpsPerYear', 'Plane-change ΔV per year to hold the inclination', 'm/s', 2),
    numOut('optimalBiasDeg', 'Injection bias that keeps the local time within tolerance longest', 'deg', 3),
    numOut('yearsWithinTolerance', 'Time within tolerance with that bias', 'yr', 1),
    numOut('yearsWithinToleranceAsInjected', 'Time within tolerance with the bias given', 'yr', 1),
    numOut('inclinationDeg', 'Reference inclination', 'deg', 3),
    numOut('injectedInclinationDeg', 'Injected inclination (reference + bias)', 'deg', 3),
    numOut('ltanDriftRateStartMinPerYear', 'Local-time drift rate at injection', 'min/yr', 2),
    rowsOut('series', 'Inclination and node local time by month (calendar months from the start, and the end)', [
      { name: 'date', label: 'Date (UTC)', unit: null, precision: 0, type: 'string' },
      numOut('years', 'Years from the start', 'yr', 2),
      numOut('inclinationDeg', 'Inclination', 'deg', 4),
      numOut('ltanHours', 'Local time of the ascending node', 'h', 4),
      numOut('ltanDeviationMin', 'Deviation from the reference local time', 'min', 2),
    ]),
    THEORY_OUTPUT,
  ],
  figures: [
    {
      name: 'node-local-time-mission',
      title: 'Local time of the node over the mission',
      rows: 'series',
      x: 'years',
      y: ['ltanDeviationMin'],
    },
  ],
  model: {
    method:
      "The Sun as a point-mass third body, its tidal torque averaged over a circular orbit (single-averaged model, quadrupole term) and over the Sun's year with the node at a fixed mean-Sun local time: di/dt = K (1 + cos ε)²/8 · sin i · sin 2H and dΩ/dt = K [(1 + cos ε)²/8 · cos 2H − (3 cos²ε − 1)/4] cos i, with K = 3 GM☉ ⟨1/r☉³⟩/(2n), H = 15°·(LTAN − 12 h) and ε the obliquity of the ecliptic at the start. The node rate of the chosen zonal theory changes with inclination, so the local time follows ΔLTAN(t) = (d₀ + D b) t + ½ D (di/dt) t² (d₀: drift at the reference inclination, D = dΩ̇/di, b: bias). Holding the inclination costs Δv = v |di/dt| per year (plane change at the node, circular speed v). The best bias makes the local time turn at one edge of the tolerance band and leave through the other: (1 + √2)√(T/|B|) years for a band ±T and a parabola coefficient B.",
    assumptions: [
      "Near-circular orbit; the Sun's distance averaged over the Earth's elliptical orbit; the annual and semiannual solar terms (a few thousandths of a degree in inclination) are averaged out.",
      "The Moon is not modelled: averaged over its month its pull acts like a ring whose node the orbit's node crosses once a year, so it leaves no secular inclination change for a sun-synchronous orbit, only a small periodic one and a small steady node drift.",
      'Linear in the inclination change (second-order terms of the node rate over a few tenths of a degree are below 0.01° of node per year); no manoeuvre, no drag-induced altitude change of the node rate.',
      SECULAR_VALIDITY,
    ],
    references: [
      REF.solorzanoPrado2007,
      REF.montenbruckThirdBody,
      REF.iau2009Constants,
      REF.valladoSun,
      REF.brouwer1959,
      REF.kozai1959,
      'B.-S. Lee, J.-W. Eun and C. E. Webb, Journal of Astronomy and Space Sciences 15(2) (1997) 355–366 (dead-band parabola)',
    ],
  },
  compute(v) {
    const start = epochDate(v.startEpoch);
    const aKm = semiMajorAxisFromAltitude(v.altitudeKm);
    const iRad = v.inclinationDeg === undefined ? solveSsoInclination(aKm, 0, v.theory) : toRad(v.inclinationDeg);
    const eps = obliquityRad(centuriesSinceJ2000(julianDate(start)));
    const p = computeLocalTimeParabola(aKm, iRad, v.ltanHours, eps, v.theory);
    const biasRad = toRad(v.inclinationBiasDeg);
    const rateDegPerYear = toDeg(p.inclinationRate * YEAR_S);
    const linearWithBias = p.linearMinPerYear + p.biasGainMinPerYearPerRad * biasRad;
    const warnings = [...orbitWarnings({ altitudeKm: v.altitudeKm, inclinationDeg: toDeg(iRad) })];
    if (Math.abs(p.linearMinPerYear) > 1)
      warnings.push(
        `The reference orbit is not sun-synchronous: its node drifts ${p.linearMinPerYear.toFixed(1)} min/yr against the mean Sun before any solar effect.`,
      );
    const series: OutputRow[] = [];
    for (const date of monthlyDates(start, v.years)) {
      const t = (date.getTime() - start.getTime()) / (YEAR_S * 1000);
      const deviation = localTimeDeviationMin(p, biasRad, t);
      series.push({
        date: date.toISOString().slice(0, 10),
        years: t,
        inclinationDeg: toDeg(iRad + biasRad) + rateDegPerYear * t,
        ltanHours: wrapHours(v.ltanHours + deviation / 60),
        ltanDeviationMin: deviation,
      });
    }
    const outputs: Record<string, number | string | OutputRow[]> = {
      inclinationRateDegPerYear: rateDegPerYear,
      ltanDeviationEndMin: localTimeDeviationMin(p, biasRad, v.years),
      inclinationHoldDeltaVMpsPerYear: circularSpeedKmS(aKm) * Math.abs(p.inclinationRate) * YEAR_S * 1000,
      inclinationDeg: toDeg(iRad),
      injectedInclinationDeg: toDeg(iRad + biasRad),
      ltanDriftRateStartMinPerYear: linearWithBias,
      series,
      theory: v.theory,
    };
    if (v.ltanToleranceMin !== undefined) {
      const best = computeOptimalBias(p, v.ltanToleranceMin);
      const asInjected = yearsUntilOutside(linearWithBias, p.quadraticMinPerYear2, v.ltanToleranceMin);
      outputs.optimalBiasDeg = toDeg(best.biasRad);
      outputs.yearsWithinTolerance = Math.min(best.years, MAX_REPORTED_YEARS);
      outputs.yearsWithinToleranceAsInjected = Math.min(asInjected, MAX_REPORTED_YEARS);
      if (best.years > MAX_REPORTED_YEARS || asInjected > MAX_REPORTED_YEARS)
        warnings.push(
          `The local time stays within ±${v.ltanToleranceMin} min for more than ${MAX_REPORTED_YEARS} years: shown as ${MAX_REPORTED_YEARS}.`,
        );
      if (Math.abs(best.biasRad) > toRad(1))
        warnings.push(
          'The optimal bias exceeds 1°: the orbit is far from sun-synchronous or the tolerance is very wide; the linear model is stretched.',
        );
    }
    return {
      outputs,
      warnings: [...warnings, ...epochWarnings(start, new Date(start.getTime() + v.years * YEAR_S * 1000))],
      modelNotes: theoryNotes(v.theory),
    };
  },
});
