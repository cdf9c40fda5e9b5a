import { engineVersion, type CalcOutcome } from '@/lib/calc';

/** Results kept per process; the oldest goes first. About 3 kB each for the light kinds. */
const REMEMBERED_MAX = 2000;
/** Inputs longer than this as JSON are computed every time (a key is kept as long as its result). */
const KEY_MAX_CHARS = 2048;

const remembered = new Map<string, CalcOutcome>();

function deepFreeze<T>(value: T): T {
  if (value && typeof value === 'object' && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const v of Object.values(value)) deepFreeze(v);
  }
  return value;
}

/**
 * The inputs as JSON, or null when JSON would make two different inputs
 * alike: a non-finite number (JSON.parse reads 1e400 as Infinity, which
 * JSON writes as null) or minus zero (written as 0); those, and long
 * inputs, are computed every time.
 */
function rememberingKey(kind: string, inputs: unknown): string | null {
  let alike = false;
  const json = JSON.stringify(inputs, (_name, value: unknown) => {
    if (typeof value === 'number' && (!Number.isFinite(value) || Object.is(value, -0))) alike = true;
    return value;
  });
  const key = `${engineVersion}\u0000${kind}\u0000${json}`;
  return alike || key.length > KEY_MAX_CHARS ? null : key;
}

/**
 * The outcome of `compute` for (kind, inputs) under this engine version,
 * computed once per process. A light calc kind is a pure function of its
 * kind and inputs (lib/calc is pure: no clock, no randomness, no data read),
 * and the engine changes only with a new build, hence a new process: nothing
 * saved or done elsewhere can make a remembered result stale, on any
 * instance. Only successful outcomes are kept; they are frozen, so a caller
 * that tried to change the shared object would throw instead of altering
 * another request's answer.
 */
export function rememberCalcOutcome(kind: string, inputs: unknown, compute: () => CalcOutcome): CalcOutcome {
  const key = rememberingKey(kind, inputs);
  if (key === null) return compute();
  const seen = remembered.get(key);
  if (seen) return seen;
  const outcome = compute();
  if (outcome.ok) {
    if (remembered.size >= REMEMBERED_MAX) remembered.delete(remembered.keys().next().value as string);
    remembered.set(key, deepFreeze(outcome));
  }
  return outcome;
}
