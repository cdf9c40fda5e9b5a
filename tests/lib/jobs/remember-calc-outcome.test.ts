/**
 * lib/jobs/remember-calc-outcome.ts: a light calculation is computed once
 * per (kind, inputs) and the same answer served again; inputs that JSON
 * would make look alike, and failed outcomes, are never served from memory.
 * Checked against the engine's own answer for a fresh run (runCalc), exactly.
 */
import { describe, expect, it } from 'vitest';
import { runCalc, type CalcOutcome } from '@/lib/calc';
import { rememberCalcOutcome } from '@/lib/jobs/remember-calc-outcome';

function counting(kind: string, inputs: unknown) {
  let runs = 0;
  const compute = (): CalcOutcome => {
    runs += 1;
    return runCalc(kind, inputs);
  };
  return { compute, runs: () => runs };
}

describe('rememberCalcOutcome', () => {
  it('computes the same kind and inputs once and answers as a fresh run would', () => {
    const inputs = { altitudeKm: 713 };
    const c = counting('sso-inclination', inputs);
    const first = rememberCalcOutcome('sso-inclination', inputs, c.compute);
    const again = rememberCalcOutcome('sso-inclination', { altitudeKm: 713 }, c.compute);
    expect(c.runs()).toBe(1);
    expect(again).toEqual(runCalc('sso-inclination', inputs));
    expect(again).toBe(first);
  });

  it('keeps different inputs and kinds apart', () => {
    const a = rememberCalcOutcome('sso-inclination', { altitudeKm: 500 }, () =>
      runCalc('sso-inclination', { altitudeKm: 500 }),
    );
    const b = rememberCalcOutcome('sso-inclination', { altitudeKm: 800 }, () =>
      runCalc('sso-inclination', { altitudeKm: 800 }),
    );
    expect(a).toEqual(runCalc('sso-inclination', { altitudeKm: 500 }));
    expect(b).toEqual(runCalc('sso-inclination', { altitudeKm: 800 }));
    expect(a).not.toEqual(b);
  });

  it('never serves a remembered answer for inputs JSON would write alike (Infinity as null, -0 as 0)', () => {
    const withNull = counting('sso-inclination', { altitudeKm: null });
    rememberCalcOutcome('sso-inclination', { altitudeKm: null }, withNull.compute);
    const infinite = counting('sso-inclination', { altitudeKm: Infinity });
    const out = rememberCalcOutcome('sso-inclination', { altitudeKm: Infinity }, infinite.compute);
    expect(infinite.runs()).toBe(1);
    expect(out).toEqual(runCalc('sso-inclination', { altitudeKm: Infinity }));
    const minusZero = counting('sso-inclination', { altitudeKm: -0 });
    rememberCalcOutcome('sso-inclination', { altitudeKm: -0 }, minusZero.compute);
    rememberCalcOutcome('sso-inclination', { altitudeKm: -0 }, minusZero.compute);
    expect(minusZero.runs()).toBe(2);
  });

  it('does not keep a refused calculation', () => {
    const bad = counting('sso-inclination', { altitudeKm: -5 });
    const first = rememberCalcOutcome('sso-inclination', { altitudeKm: -5 }, bad.compute);
    rememberCalcOutcome('sso-inclination', { altitudeKm: -5 }, bad.compute);
    expect(first.ok).toBe(false);
    expect(bad.runs()).toBe(2);
  });

  it('hands out a frozen result, so one caller cannot change what the next one is served', () => {
    const out = rememberCalcOutcome('sso-inclination', { altitudeKm: 601 }, () =>
      runCalc('sso-inclination', { altitudeKm: 601 }),
    );
    if (!out.ok) throw new Error(out.error);
    expect(() => {
      (out.result as { kind: string }).kind = 'changed';
    }).toThrow(TypeError);
    expect(Object.isFrozen(out.result.model.references)).toBe(true);
  });
});
