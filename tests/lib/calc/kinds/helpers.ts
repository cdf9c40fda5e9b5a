import { expect } from 'vitest';
import { runCalc, type CalcResult } from '../../../../lib/calc/index';

/** Run a kind that must succeed and return its outputs (typed loosely as numbers/rows). */
export function outputsOf(kind: string, inputs: Record<string, unknown>): Record<string, unknown> {
  return resultOf(kind, inputs).outputs;
}

export function resultOf(kind: string, inputs: Record<string, unknown>): CalcResult {
  const r = runCalc(kind, inputs);
  if (!r.ok) throw new Error(`${kind} failed: ${r.error}`);
  return r.result;
}

export function num(outputs: Record<string, unknown>, name: string): number {
  const v = outputs[name];
  if (typeof v !== 'number') throw new Error(`output ${name} is not a number`);
  return v;
}

export function rows(outputs: Record<string, unknown>, name: string): Record<string, number>[] {
  const v = outputs[name];
  if (!Array.isArray(v)) throw new Error(`output ${name} is not rows`);
  return v as Record<string, number>[];
}

/** Expect runCalc to fail and name `field`; returns the message. */
export function expectFieldError(kind: string, inputs: unknown, field: string): string {
  const r = runCalc(kind, inputs);
  expect(r.ok).toBe(false);
  if (r.ok) return '';
  expect(Object.keys(r.fields)).toContain(field);
  return r.fields[field];
}
