import { defineKind } from '../registry';
import { CalcInputError, type CalcOutcome, type OutputRow } from '../types';
import { enumField, integerField, numberField, stringField } from '../fields';
import { REF } from '../references';
import { epoch, ltanHours, numOut, rowsOut, theory, THEORY_OUTPUT, theoryNotes } from './common';
import { dragDecayKind } from './drag-decay';
import { injectionSensitivityKind } from './injection-sensitivity';
import { repeatOptionsKind } from './repeat-options';
import { solarInclinationDriftKind } from './solar-inclination-drift';
import { ssoInclinationKind } from './sso-inclination';
import { sunGeometryKind } from './sun-geometry';

const MIN_CANDIDATES = 2;
const MAX_CANDIDATES = 8;
/** Half-width of the band searched for the nearest exact repeat (km). */
const REPEAT_SEARCH_KM = 10;
/** Inclination offset whose local-time drift is reported (deg): a typical launcher dispersion, common practice. */
const DRIFT_PROBE_DEG = 0.01;

/** Parses "600, 650 km, 700" into altitudes in km; undefined with a reason when it cannot. */
export function parseCandidateAltitudes(text: string): { ok: true; values: number[] } | { ok: false; message: string } {
  const parts = text
    .split(/[,;]/)
    .map((s) => s.trim().replace(/\s*km$/i, ''))
    .filter((s) => s.length > 0);
  const values = parts.map(Number);
  const bad = parts.find((s, i) => s === '' || !Number.isFinite(values[i]));
  if (bad !== undefined) return { ok: false, message: `“${bad}” is not an altitude in km` };
  if (values.length < MIN_CANDIDATES || values.length > MAX_CANDIDATES)
    return {
      ok: false,
      message: `give ${MIN_CANDIDATES} to ${MAX_CANDIDATES} altitudes separated by commas (got ${values.length})`,
    };
  const out = values.find((v) => v < 200 || v > 1500);
  if (out !== undefined) return { ok: false, message: `altitude ${out} km is outside 200–1500 km` };
  return { ok: true, values };
}

function need(outcome: CalcOutcome, what: string, candidate: number): Record<string, unknown> {
  if (!outcome.ok)
    throw new CalcInputError('candidateAltitudesKm', `candidate ${candidate}: ${what} failed — ${outcome.error}`);
  return outcome.result.outputs;
}

/**
 * Candidate orbit trade: each candidate altitude is evaluated with the
 * engine's own kinds (sun-synchronous inclination, nearest exact repeat,
 * local-time drift per 0.01° of inclination error, longest eclipse over a
 * year, drag lifetime and maintenance ΔV) so the table and the detail blocks
 * can never disagree.
 */
export const orbitTradeKind = defineKind({
  kind: 'orbit-trade',
  title: 'Candidate orbit trade table',
  summary:
    '2–8 sun-synchronous candidate altitudes side by side: inclination, period, nearest repeat, drift sensitivity, eclipse, lifetime, and maintenance ΔV for drag and for holding the inclination against solar gravity.',
  inputs: {
    candidateAltitudesKm: stringField('Candidate altitudes (km, comma-separated)', {
      maxLength: 200,
      help: 'e.g. 600, 650, 700',
    }),
    chosenIndex: integerField('Chosen candidate (1 = first)', null, { min: 1, max: MAX_CANDIDATES, default: 1 }),
    ltanHours: ltanHours(22.5),
    startEpoch: epoch('Start of the eclipse year (UTC)', '2027-01-01T00:00:00Z'),
    massKg: numberField('Mass', 'kg', { min: 0.1, max: 1e6, default: 300 }),
    areaM2: numberField('Mean drag area', 'm^2', { min: 0.001, max: 1e4, default: 1.5 }),
    dragCoefficient: numberField('Drag coefficient', null, { min: 1, max: 4, default: 2.2 }),
    solarActivity: enumField('Solar activity', ['low', 'moderate', 'high'] as const, 'moderate'),
    theory: theory(),
  },
  check(v): Record<string, string> {
    const parsed = parseCandidateAltitudes(v.candidateAltitudesKm);
    if (!parsed.ok) return { candidateAltitudesKm: `candidateAltitudesKm: ${parsed.message}` };
    if (v.chosenIndex > parsed.values.length)
      return { chosenIndex: `chosenIndex: there are only ${parsed.values.length} candidates` };
    return {};
  },
  outputs: [
    {
      ...rowsOut('candidates', 'Candidates', [
        { name: 'candidate', label: 'Candidate', unit: null, precision: 0, type: 'integer' },
        numOut('altitudeKm', 'Altitude', 'km', 1),
        numOut('inclinationDeg', 'Sun-synchronous inclination', 'deg', 3),
        numOut('nodalPeriodMin', 'Nodal period', 'min', 2),
        {
          name: 'nearestRepeat',
          label: `Nearest repeat within ±${REPEAT_SEARCH_KM} km (rev/days @ km)`,
          unit: null,
          precision: 0,
          type: 'string',
        },
        numOut('driftPerHundredthDegMinPerYear', 'Local-time drift per 0.01° inclination error', 'min/yr', 2),
        numOut('eclipseMaxMin', 'Longest eclipse in the year', 'min', 1),
        numOut('lifetimeDays', 'Lifetime to 200 km (order of magnitude)', 'd', 0),
        numOut('maintenanceDeltaVMpsPerYear', 'Drag make-up ΔV per year (altitude only)', 'm/s', 2),
        numOut('inclinationHoldDeltaVMpsPerYear', 'Inclination-hold ΔV per year (solar gravity)', 'm/s', 2),
        numOut('totalMaintenanceDeltaVMpsPerYear', 'Maintenance ΔV per year (drag + inclination hold)', 'm/s', 2),
        { name: 'chosen', label: 'Chosen', unit: null, precision: 0, type: 'boolean' },
      ]),
      display: 'columns',
    },
    numOut('chosenAltitudeKm', 'Chosen altitude', 'km', 3),
    numOut('chosenInclinationDeg', 'Chosen inclination', 'deg', 3),
    numOut('chosenNodalPeriodMin', 'Chosen nodal period', 'min', 3),
    THEORY_OUTPUT,
  ],
  model: {
    method:
      'Each candidate is computed by the engine’s own kinds: sso-inclination, repeat-options (nearest exact repeat within ±10 km), injection-sensitivity (0.01° inclination offset), sun-geometry (365 days in 5-day steps), drag-decay (drag make-up) and solar-inclination-drift (plane-change ΔV that holds the inclination against solar gravity at the chosen local time); the total maintenance ΔV is their sum.',
    assumptions: [
      'Circular sun-synchronous candidates; see each constituent kind for its model.',
      'Eclipse maximum sampled every 5 days over the year from the start epoch.',
      'Every constituent uses the same secular theory; valid where they are (candidates are limited to 200–1500 km).',
      'The inclination-hold ΔV assumes the inclination is corrected every year; injecting with a bias instead (see solar-inclination-drift) can keep the local time within tolerance without it, so the total is an upper bound for that strategy.',
    ],
    references: [REF.wertzOrbitDesign],
  },
  compute(v) {
    const parsed = parseCandidateAltitudes(v.candidateAltitudesKm);
    if (!parsed.ok) throw new CalcInputError('candidateAltitudesKm', parsed.message);
    const warnings = new Set<string>();
    const rows: OutputRow[] = parsed.values.map((alt, i) => {
      const n = i + 1;
      const sso = need(ssoInclinationKind.run({ altitudeKm: alt, theory: v.theory }), 'sun-synchronous inclination', n);
      const inc = sso.inclinationDeg as number;
      const drift = need(
        injectionSensitivityKind.run({
          altitudeKm: alt,
          inclinationDeg: inc,
          inclinationErrorDeg: DRIFT_PROBE_DEG,
          altitudeErrorKm: 0,
          theory: v.theory,
        }),
        'drift sensitivity',
        n,
      );
      const repeats = need(
        repeatOptionsKind.run({
          minAltitudeKm: Math.max(100, alt - REPEAT_SEARCH_KM),
          maxAltitudeKm: alt + REPEAT_SEARCH_KM,
          maxDays: 16,
          theory: v.theory,
        }),
        'repeat search',
        n,
      );
      const options = (repeats.options as OutputRow[]) ?? [];
      const nearest = [...options].sort(
        (a, b) => Math.abs((a.altitudeKm as number) - alt) - Math.abs((b.altitudeKm as number) - alt),
      )[0];
      const sun = sunGeometryKind.run({
        altitudeKm: alt,
        inclinationDeg: inc,
        ltanHours: v.ltanHours,
        startEpoch: v.startEpoch,
        days: 365,
        stepDays: 5,
        theory: v.theory,
      });
      const sunOut = need(sun, 'sun geometry', n);
      const dragRun = dragDecayKind.run({
        altitudeKm: alt,
        massKg: v.massKg,
        areaM2: v.areaM2,
        dragCoefficient: v.dragCoefficient,
        solarActivity: v.solarActivity,
        atmosphere: 'exponential',
      });
      const drag = need(dragRun, 'drag decay', n);
      const hold = need(
        solarInclinationDriftKind.run({
          altitudeKm: alt,
          inclinationDeg: inc,
          ltanHours: v.ltanHours,
          startEpoch: v.startEpoch,
          theory: v.theory,
        }),
        'inclination drift',
        n,
      );
      for (const out of [sun, dragRun])
        if (out.ok) out.result.warnings.forEach((w) => warnings.add(`Candidate ${n}: ${w}`));
      return {
        candidate: n,
        altitudeKm: alt,
        inclinationDeg: inc,
        nodalPeriodMin: sso.nodalPeriodMin as number,
        nearestRepeat: nearest
          ? `${nearest.revolutions}/${nearest.days} @ ${(nearest.altitudeKm as number).toFixed(1)}`
          : 'none',
        driftPerHundredthDegMinPerYear: drift.driftFromInclinationMinPerYear as number,
        eclipseMaxMin: sunOut.eclipseMaxMin as number,
        lifetimeDays: drag.lifetimeDays as number,
        maintenanceDeltaVMpsPerYear: drag.maintenanceDeltaVMpsPerYear as number,
        inclinationHoldDeltaVMpsPerYear: hold.inclinationHoldDeltaVMpsPerYear as number,
        totalMaintenanceDeltaVMpsPerYear:
          (drag.maintenanceDeltaVMpsPerYear as number) + (hold.inclinationHoldDeltaVMpsPerYear as number),
        chosen: n === v.chosenIndex,
      };
    });
    const chosen = rows[v.chosenIndex - 1];
    return {
      outputs: {
        candidates: rows,
        chosenAltitudeKm: chosen.altitudeKm as number,
        chosenInclinationDeg: chosen.inclinationDeg as number,
        chosenNodalPeriodMin: chosen.nodalPeriodMin as number,
        theory: v.theory,
      },
      warnings: [...warnings],
      modelNotes: theoryNotes(v.theory),
    };
  },
});
