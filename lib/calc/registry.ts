/**
 * Registry of calc kinds. A kind is defined once (inputs as zod fields with
 * metadata, outputs, model note, figures, compute); the registry turns raw
 * JSON into validated inputs, runs the compute function, checks every output
 * number is finite and never lets an exception escape.
 */
import { z } from 'zod';
import { engineVersion } from './constants';
import { readFieldMeta } from './fields';
import {
  CalcInputError,
  type CalcFigureSlot,
  type CalcInputField,
  type CalcKindDescriptor,
  type CalcOutcome,
  type CalcOutputField,
  type KindComputation,
  type ModelNote,
} from './types';

/** Caution carried by every model note. */
export const PRELIMINARY_DESIGN_NOTE = 'Preliminary-design model: verify final values with high-fidelity tools.';

export interface KindDefinition<Shape extends z.ZodRawShape> {
  kind: string;
  title: string;
  summary: string;
  inputs: Shape;
  /** cross-field checks after per-field validation: return field -> message for each problem */
  check?: (inputs: z.output<z.ZodObject<Shape>>) => Record<string, string>;
  outputs: CalcOutputField[];
  model: ModelNote;
  figures?: CalcFigureSlot[];
  /**
   * true for a kind whose one call can take seconds (numerical propagation,
   * lifetimes, Monte-Carlo): the server runs it in the worker pool, under the
   * per-user limit and the calculation time budget, never on the request thread.
   */
  heavy?: boolean;
  /** For a heavy kind: input name → what to change to make it cheaper, quoted when a call runs out of time. */
  costInputs?: Partial<Record<keyof Shape & string, string>>;
  compute: (inputs: z.output<z.ZodObject<Shape>>) => KindComputation;
}

export interface RegisteredKind {
  descriptor: CalcKindDescriptor;
  run(rawInputs: unknown): CalcOutcome;
}

/** What a field accepts, in words: "a number in km from 100 to 6000". */
function describeAccepted(field: CalcInputField): string {
  switch (field.type) {
    case 'number':
    case 'integer': {
      const unit = field.unit ? ` in ${field.unit}` : '';
      const range = field.min !== undefined && field.max !== undefined ? ` from ${field.min} to ${field.max}` : '';
      return `${field.type === 'integer' ? 'an integer' : 'a number'}${unit}${range}`;
    }
    case 'enum':
      return `one of ${(field.options ?? []).join(', ')}`;
    case 'epoch':
      return 'an ISO 8601 UTC date/time string (e.g. 2025-03-20T12:00:00Z)';
    case 'string':
      return 'a text string';
    case 'text':
      return `text of at most ${field.maxLength ?? '?'} characters`;
    case 'record':
      return 'an object of names to text values';
  }
}

/** The value a user sent, in words, for "(got ...)". */
function describeGiven(value: unknown): string {
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'a list';
  switch (typeof value) {
    case 'string':
      return `text ${JSON.stringify(value.length > 40 ? `${value.slice(0, 40)}…` : value)}`;
    case 'number':
      return String(value); // NaN, Infinity and -Infinity print as such
    case 'boolean':
      return `boolean ${String(value)}`;
    case 'object':
      return 'an object';
    default:
      return typeof value;
  }
}

/**
 * One message per problem: missing, wrong type, not finite, not an integer,
 * out of range, not one of the options. `given` is the raw value the user sent
 * (undefined when the field was left out), read from the raw inputs rather
 * than `issue.input`, which zod 4 fills only when asked to (`reportInput`).
 */
function describeIssue(issue: z.core.$ZodIssue, field: CalcInputField | undefined, given: unknown): string {
  const unit = field?.unit ? ` ${field.unit}` : '';
  const got = ` (got ${describeGiven(given)})`;
  switch (issue.code) {
    case 'invalid_type': {
      if (given === undefined) return field ? `is required: ${describeAccepted(field)}` : 'is required';
      if (typeof given === 'number' && !Number.isFinite(given))
        return `must be a finite number${field?.unit ? ` in ${field.unit}` : ''}${got}`;
      if (field) return `must be ${describeAccepted(field)}${got}`;
      return `must be ${issue.expected === 'int' ? 'an integer' : `a ${issue.expected}`}${got}`;
    }
    case 'too_small':
      if (issue.origin !== 'number') return `must have at least ${String(issue.minimum)} characters`;
      return `must be ${issue.inclusive ? 'at least' : 'greater than'} ${String(issue.minimum)}${unit}${got}`;
    case 'too_big':
      if (issue.origin !== 'number') return `must have at most ${String(issue.maximum)} characters`;
      return `must be ${issue.inclusive ? 'at most' : 'less than'} ${String(issue.maximum)}${unit}${got}`;
    case 'invalid_value':
      return `must be one of ${issue.values.map(String).join(', ')}${got}`;
    default:
      return issue.message;
  }
}

function collectIssues(
  issues: z.core.$ZodIssue[],
  fieldsByName: Map<string, CalcInputField>,
  raw: Record<string, unknown>,
): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of issues) {
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) out[key] = `unknown field "${key}" (known: ${[...fieldsByName.keys()].join(', ')})`;
      continue;
    }
    const name = issue.path.length > 0 ? String(issue.path[0]) : 'inputs';
    const nested = issue.path.length > 1;
    const sub = nested ? ` (${issue.path.slice(1).map(String).join('.')})` : '';
    // A nested issue is about an entry of the field, which the field's metadata does not describe.
    const field = nested ? undefined : fieldsByName.get(name);
    const given = nested ? issue.input : Object.hasOwn(raw, name) ? raw[name] : undefined;
    if (!(name in out)) out[name] = `${name}${sub}: ${describeIssue(issue, field, given)}`;
  }
  return out;
}

/** Path of the first non-finite number in an output tree, or undefined. */
function findNonFinite(value: unknown, path: string): string | undefined {
  if (typeof value === 'number') return Number.isFinite(value) ? undefined : path;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const p = findNonFinite(value[i], `${path}[${i}]`);
      if (p) return p;
    }
    return undefined;
  }
  if (value !== null && typeof value === 'object') {
    const rec = value as Record<string, unknown>;
    for (const k in rec) {
      const v = rec[k];
      if (typeof v === 'number' ? !Number.isFinite(v) : typeof v === 'object' && findNonFinite(v, ''))
        return `${path}.${k}`;
    }
  }
  return undefined;
}

function failure(fields: Record<string, string>): CalcOutcome {
  return { ok: false, error: `Invalid input: ${Object.values(fields).join('; ')}`, fields };
}

export function defineKind<Shape extends z.ZodRawShape>(def: KindDefinition<Shape>): RegisteredKind {
  const schema = z.strictObject(def.inputs);
  const inputFields: CalcInputField[] = Object.entries(def.inputs).map(([name, s]) => {
    const meta = readFieldMeta(s as z.ZodType);
    if (!meta) throw new Error(`calc kind ${def.kind}: field ${name} has no metadata`);
    return { name, ...meta };
  });
  const fieldsByName = new Map(inputFields.map((f) => [f.name, f]));
  const model: ModelNote = {
    method: def.model.method,
    assumptions: def.model.assumptions.includes(PRELIMINARY_DESIGN_NOTE)
      ? def.model.assumptions
      : [...def.model.assumptions, PRELIMINARY_DESIGN_NOTE],
    references: def.model.references,
  };
  const descriptor: CalcKindDescriptor = {
    kind: def.kind,
    title: def.title,
    summary: def.summary,
    inputs: inputFields,
    outputs: def.outputs,
    model,
    figures: def.figures ?? [],
    heavy: def.heavy === true,
    ...(def.costInputs ? { costInputs: { ...(def.costInputs as Record<string, string>) } } : {}),
  };

  function run(rawInputs: unknown): CalcOutcome {
    if (rawInputs === null || typeof rawInputs !== 'object' || Array.isArray(rawInputs)) {
      return failure({ inputs: 'inputs must be a JSON object of field values' });
    }
    const parsed = schema.safeParse(rawInputs, { reportInput: true });
    if (!parsed.success)
      return failure(collectIssues(parsed.error.issues, fieldsByName, rawInputs as Record<string, unknown>));
    const inputs = parsed.data;
    const problems = def.check ? def.check(inputs) : {};
    if (Object.keys(problems).length > 0) return failure(problems);
    let computed: KindComputation;
    try {
      computed = def.compute(inputs);
    } catch (err) {
      if (err instanceof CalcInputError) return failure({ [err.field]: `${err.field}: ${err.message}` });
      const message = err instanceof Error ? err.message : String(err);
      return { ok: false, error: `Calculation failed: ${message}`, fields: { calculation: message } };
    }
    const bad = findNonFinite(computed.outputs, 'outputs');
    if (bad) {
      const message = `${bad} is not a finite number; the inputs lie outside the range where the model gives a result`;
      return { ok: false, error: `Calculation failed: ${message}`, fields: { calculation: message } };
    }
    return {
      ok: true,
      result: {
        kind: def.kind,
        inputs: { ...inputs },
        outputs: computed.outputs,
        warnings: computed.warnings,
        model: computed.modelNotes?.length
          ? { ...model, assumptions: [...computed.modelNotes, ...model.assumptions] }
          : model,
        engineVersion,
      },
    };
  }

  return { descriptor, run };
}
