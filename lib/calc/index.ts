/**
 * Nodewright calc engine — public API. Pure TypeScript: zod, mathjs and node built-ins only.
 * Every number in a memo comes from runCalc; nothing outside lib/calc holds a formula.
 */
import { ALL_KINDS } from './kinds';
import type { RegisteredKind } from './registry';
import type { CalcKindDescriptor, CalcOutcome } from './types';

export { engineVersion, listConstants } from './constants';
export { ENGINE_CHANGES, explainMovedOutput, type EngineChange } from './engine-changes';
export type { ConstantEntry } from './constants';
export type {
  CalcFigureSlot,
  CalcInputField,
  CalcKindDescriptor,
  CalcOutcome,
  CalcOutputField,
  CalcResult,
  ModelNote,
} from './types';

const BY_KIND = new Map<string, RegisteredKind>(ALL_KINDS.map((k) => [k.descriptor.kind, k]));

/** JSON-serialisable metadata of every kind (for editor forms, PDF, docs). Returns copies. */
export function listCalcKinds(): CalcKindDescriptor[] {
  return ALL_KINDS.map((k) => structuredClone(k.descriptor));
}

/** Metadata of one kind, or undefined when the kind is unknown. */
export function getCalcKind(kind: string): CalcKindDescriptor | undefined {
  const k = typeof kind === 'string' ? BY_KIND.get(kind) : undefined;
  return k ? structuredClone(k.descriptor) : undefined;
}

/** True for a kind the server runs in its worker pool (registered with `heavy: true`); false for light and unknown kinds. */
export function isHeavyCalcKind(kind: string): boolean {
  return typeof kind === 'string' && BY_KIND.get(kind)?.descriptor.heavy === true;
}

/** Validate inputs and run one calculation. Never throws. */
export function runCalc(kind: string, rawInputs: unknown): CalcOutcome {
  try {
    const k = typeof kind === 'string' ? BY_KIND.get(kind) : undefined;
    if (!k) {
      const known = [...BY_KIND.keys()].join(', ');
      const message = `unknown calc kind "${String(kind)}" (known: ${known})`;
      return { ok: false, error: message, fields: { kind: message } };
    }
    // outputs and inputs are built afresh by every run; only the shared model note needs copying
    const outcome = k.run(rawInputs);
    if (outcome.ok) {
      const m = outcome.result.model;
      outcome.result.model = { method: m.method, assumptions: [...m.assumptions], references: [...m.references] };
    }
    return outcome;
  } catch (err) {
    const message = err instanceof Error ? err.message : String(err);
    return { ok: false, error: `Calculation failed: ${message}`, fields: { calculation: message } };
  }
}
