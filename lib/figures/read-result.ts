/** Typed reading of engine outputs for figures; a missing or mistyped output is a FigureDataError naming it. */
import type { CalcResult } from '@/lib/calc';
import { FigureDataError } from './figure-types';

export type Row = Record<string, unknown>;

export function readNumber(result: CalcResult, name: string, from: 'outputs' | 'inputs' = 'outputs'): number {
  const value = result[from][name];
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new FigureDataError(
      `the ${result.kind} result has no number ${from === 'outputs' ? 'output' : 'input'} "${name}"`,
    );
  }
  return value;
}

/** The first of `names` that the result has as a number input, else `fallback`. */
export function readOptionalInput(result: CalcResult, names: readonly string[], fallback: number): number {
  for (const name of names) {
    const value = result.inputs[name];
    if (typeof value === 'number' && Number.isFinite(value)) return value;
  }
  return fallback;
}

export function readRows(result: CalcResult, name: string): Row[] {
  const value = result.outputs[name];
  if (!Array.isArray(value)) throw new FigureDataError(`the ${result.kind} result has no rows output "${name}"`);
  return value.filter((r): r is Row => typeof r === 'object' && r !== null);
}

export function rowNumber(row: Row, column: string, what: string): number {
  const value = row[column];
  if (typeof value !== 'number' || !Number.isFinite(value))
    throw new FigureDataError(`${what}: a row has no number "${column}"`);
  return value;
}

/** The ISO date of a row's "date" column. */
export function rowDate(row: Row, what: string): string {
  const value = row.date;
  if (typeof value === 'string' && !Number.isNaN(Date.parse(value))) return value;
  throw new FigureDataError(`${what}: a row has no ISO date "date"`);
}
