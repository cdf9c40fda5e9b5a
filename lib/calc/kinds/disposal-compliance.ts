import { EARTH_MU_KM3_S2, EARTH_RADIUS_KM, SECONDS_PER_DAY } from '../constants';
import { numberField } from '../fields';
import { defineKind } from '../registry';
import { computeLifetimeSeconds, TABLE_TOP_KM } from '../topics/drag-lifetime';
import { integrateDecay } from '../topics/orbit-lifetime/averaged-decay';
import { solveLogLifetime } from '../topics/orbit-lifetime/search-altitude';
import { epoch, numOut } from './common';
import {
  checkLifetimeInputs,
  CIRCULAR_SAMPLES,
  decayModelOf,
  LIFETIME_HORIZON_YEARS,
  LIFETIME_NOTE,
  lifetimeFields,
  solarSourceOf,
  solarSourceWarnings,
  spacecraftDragFields,
  type LifetimeInputs,
} from './lifetime-inputs';
import { epochDate } from './node-local-time';

const YEAR_S = 365.25 * SECONDS_PER_DAY;
const MIN_ALTITUDE_KM = 150;
/** Density samples per revolution on the eccentric disposal orbit (drag concentrates near perigee). */
const ECCENTRIC_SAMPLES = 24;
const SEARCH_TOLERANCE_KM = 1;
/** Search runs stop at 1.5 × the rule (only the sign of ln(L/rule) matters) and take steps of up to 30 days. */
const SEARCH_HORIZON_FACTOR = 1.5;
const SEARCH_STEP_DAYS = 30;

const { startEpoch: _start, ...sharedFields } = lifetimeFields('End of life (UTC)');

export const disposalComplianceKind = defineKind({
  kind: 'disposal-compliance',
  title: 'Disposal compliance',
  summary:
    'Orbital lifetime after end of life against the post-mission disposal rule (25 or 5 years), the highest compliant circular altitude, and the single perigee-lowering burn that makes the orbit comply.',
  inputs: {
    altitudeKm: numberField('Mean altitude at end of life above the equatorial radius', 'km', {
      min: MIN_ALTITUDE_KM,
      max: 1000,
      default: 700,
    }),
    ...spacecraftDragFields('Mass at end of life'),
    endOfLifeEpoch: epoch('End of life (UTC)', '2035-01-01T00:00:00Z'),
    ruleYears: numberField('Disposal rule: re-entry within', 'yr', {
      min: 1,
      max: 50,
      default: 25,
      help: '25: IADC guidelines / ISO 24113; 5: FCC rule for licensed LEO satellites',
    }),
    ...sharedFields,
  },
  check(v): Record<string, string> {
    const out = checkLifetimeInputs({ ...v, startEpoch: v.endOfLifeEpoch }, v.altitudeKm);
    if (out.startEpoch) {
      out.endOfLifeEpoch = out.startEpoch.replace('startEpoch', 'endOfLifeEpoch');
      delete out.startEpoch;
    }
    return out;
  },
  outputs: [
    numOut('lifetimeYears', 'Lifetime from end of life', 'yr', 2),
    { name: 'compliant', label: 'Re-enters within the rule', unit: null, precision: 0, type: 'boolean' },
    numOut('maxCompliantAltitudeKm', 'Highest circular altitude that re-enters within the rule', 'km', 1),
    numOut('deorbitDeltaVMps', 'Perigee-lowering burn for compliance', 'm/s', 2),
    numOut('disposalPerigeeAltitudeKm', 'Perigee altitude after the burn', 'km', 1),
    numOut('reentryAltitudeKm', 'Re-entry altitude (end point)', 'km', 0),
  ],
  heavy: true,
  costInputs: { atmosphere: 'the exponential atmosphere', altitudeKm: 'a lower altitude' },
  model: {
    method: `${LIFETIME_NOTE.method} The highest compliant altitude and the disposal perigee are found by Illinois regula falsi on ln(lifetime/rule) to 1 km (search runs with steps of up to 30 days, 24 density samples per revolution on the eccentric orbit); the burn is one retrograde impulse at the circular orbit, Δv = v_c − v_a with v_a = √(μ (2/r − 2/(r + r_p))) (vis-viva), leaving the end-of-life altitude as apogee.`,
    assumptions: [
      'Rule: post-mission orbital lifetime in LEO of at most 25 years (IADC Space Debris Mitigation Guidelines; ISO 24113:2019, which references the IADC recommendation) or 5 years where the licensing authority requires it (FCC Second Report and Order, IB Docket 22-271, 2022).',
      ...LIFETIME_NOTE.assumptions,
      'The disposal orbit’s perigee starts at the argument of latitude 0 and moves with the J2 perigee rate; its lifetime ends when the perigee reaches the re-entry altitude.',
      `Lifetimes longer than ${LIFETIME_HORIZON_YEARS} years are reported as ${LIFETIME_HORIZON_YEARS} years (a lower bound).`,
    ],
    references: [
      'Inter-Agency Space Debris Coordination Committee, IADC Space Debris Mitigation Guidelines (iadc-home.org), section on limiting the presence of spacecraft in the LEO region after the end of mission',
      'ISO 24113:2019, Space systems — Space debris mitigation requirements',
      'U.S. Federal Communications Commission, Space Innovation; Mitigation of Orbital Debris in the New Space Age, Second Report and Order, IB Docket Nos. 22-271 and 18-313 (September 2022): five-year rule',
      ...LIFETIME_NOTE.references,
    ],
  },
  compute(v) {
    const inputs: LifetimeInputs = { ...v, startEpoch: v.endOfLifeEpoch };
    const start = epochDate(v.endOfLifeEpoch);
    const b = (v.dragCoefficient * v.areaM2) / v.massKg;
    const topKm = v.atmosphere === 'exponential' ? TABLE_TOP_KM[v.solarActivity] : 1000;
    const searchHorizon = Math.min(LIFETIME_HORIZON_YEARS, SEARCH_HORIZON_FACTOR * v.ruleYears);
    // one solar source for every run of the searches (it records dates taken from the cycle model outside a table)
    const source = v.atmosphere === 'exponential' ? undefined : solarSourceOf(inputs);
    const { reentryAltitudeKm } = decayModelOf(inputs, v.altitudeKm, b, CIRCULAR_SAMPLES, source);
    /** Lifetime [yr] of a circular orbit at h, integrated at most horizonYears. */
    const circularYears = (h: number, horizonYears: number, maxStepDays?: number): number => {
      if (v.atmosphere === 'exponential') return computeLifetimeSeconds(h, b, v.solarActivity) / YEAR_S;
      const { orbit } = decayModelOf(inputs, h, b, CIRCULAR_SAMPLES, source);
      return (
        integrateDecay({ start, altitudeKm: h, reentryAltitudeKm, horizonYears, maxStepDays }, orbit).lifetimeSeconds /
        YEAR_S
      );
    };
    const logRatio = (years: number) => Math.log(Math.max(years, 1e-6) / v.ruleYears);
    const lifetimeYears = circularYears(v.altitudeKm, LIFETIME_HORIZON_YEARS);
    const compliant = lifetimeYears <= v.ruleYears;

    const fCircular = (h: number) => logRatio(circularYears(h, searchHorizon, SEARCH_STEP_DAYS));
    const f0 = logRatio(lifetimeYears);
    const maxCompliantAltitudeKm = compliant
      ? solveLogLifetime(fCircular, v.altitudeKm, f0, topKm, fCircular(topKm), SEARCH_TOLERANCE_KM)
      : solveLogLifetime(fCircular, MIN_ALTITUDE_KM, fCircular(MIN_ALTITUDE_KM), v.altitudeKm, f0, SEARCH_TOLERANCE_KM);

    const r0 = EARTH_RADIUS_KM + v.altitudeKm;
    let perigeeKm = v.altitudeKm;
    if (!compliant) {
      const eccentricYears = (hp: number): number => {
        const rp = EARTH_RADIUS_KM + hp;
        const a = (r0 + rp) / 2;
        const { orbit } = decayModelOf(inputs, v.altitudeKm, b, ECCENTRIC_SAMPLES, source);
        const run = {
          start,
          altitudeKm: a - EARTH_RADIUS_KM,
          eccentricity: (r0 - rp) / (r0 + rp),
          argPerigeeRad: 0,
          reentryAltitudeKm,
          horizonYears: searchHorizon,
          maxStepDays: SEARCH_STEP_DAYS,
        };
        return integrateDecay(run, orbit).lifetimeSeconds / YEAR_S;
      };
      const fEcc = (hp: number) => logRatio(eccentricYears(hp));
      perigeeKm = solveLogLifetime(fEcc, reentryAltitudeKm, logRatio(0), v.altitudeKm, f0, SEARCH_TOLERANCE_KM);
    }
    const rp = EARTH_RADIUS_KM + perigeeKm;
    const vCircular = Math.sqrt(EARTH_MU_KM3_S2 / r0);
    const vApogee = Math.sqrt(EARTH_MU_KM3_S2 * (2 / r0 - 2 / (r0 + rp)));
    const warnings: string[] = [];
    if (v.atmosphere === 'nrlmsise-00' && lifetimeYears >= LIFETIME_HORIZON_YEARS)
      warnings.push(
        `The orbit is still up after ${LIFETIME_HORIZON_YEARS} years: the lifetime shown is a lower bound.`,
      );
    if (maxCompliantAltitudeKm >= topKm - SEARCH_TOLERANCE_KM)
      warnings.push(
        `Every altitude up to ${topKm} km complies: the highest compliant altitude is the model's upper limit.`,
      );
    if (v.atmosphere === 'nrlmsise-00' && v.solarFlux === 'cycle' && v.ruleYears > v.cyclePeriodYears)
      warnings.push(
        'The rule period runs into solar cycles that have not begun: their timing and size are assumptions.',
      );
    return {
      outputs: {
        lifetimeYears,
        compliant,
        maxCompliantAltitudeKm,
        deorbitDeltaVMps: (vCircular - vApogee) * 1000,
        disposalPerigeeAltitudeKm: perigeeKm,
        reentryAltitudeKm,
      },
      warnings: [...warnings, ...solarSourceWarnings(inputs, source)],
    };
  },
});
